/** Diagnostics as the CLI words them (line:column, severity, id, message, hint), optionally linked to the source. */
import type { Diagnostic } from '../../../shared/diagnostic.js';

const severityClass = { error: 'error-text', warning: 'warning-text', info: 'muted' } as const;

export function countText(diagnostics: readonly Diagnostic[]): string {
  const errors = diagnostics.filter((d) => d.severity === 'error').length;
  const warnings = diagnostics.filter((d) => d.severity === 'warning').length;
  if (errors === 0 && warnings === 0) return 'No problems found';
  const part = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return [errors && part(errors, 'error'), warnings && part(warnings, 'warning')].filter(Boolean).join(', ');
}

export function DiagnosticList({
  diagnostics,
  onSelect,
  label = 'Checks',
}: {
  diagnostics: readonly Diagnostic[];
  onSelect?(d: Diagnostic): void;
  label?: string;
}) {
  if (diagnostics.length === 0) return <p className="text-sm">No problems found.</p>;
  return (
    <ul aria-label={label} className="space-y-2 text-sm">
      {diagnostics.map((d, i) => {
        const where = `${d.range.line}:${d.range.column}`;
        return (
          <li key={`${d.range.offset}-${d.id}-${i}`} className="font-mono">
            {onSelect ? (
              <button
                type="button"
                className="link"
                onClick={() => onSelect(d)}
                aria-label={`Go to line ${d.range.line}, column ${d.range.column}`}
              >
                {where}
              </button>
            ) : (
              <span>{where}</span>
            )}{' '}
            <span className={`font-semibold ${severityClass[d.severity]}`}>
              {d.severity}[{d.id}]
            </span>
            : <span className="font-sans">{d.message}</span>
            {d.hint && <p className="muted ml-4 font-sans">{d.hint}</p>}
          </li>
        );
      })}
    </ul>
  );
}
