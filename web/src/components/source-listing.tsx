/** The pattern text with line numbers; each line is a link target (#L12) that checks point at. */
export const lineAnchor = (line: number) => `L${line}`;

export function SourceListing({ source }: { source: string }) {
  const lines = source.split(/\r?\n/);
  return (
    <div className="max-h-96 overflow-auto rounded border border-slate-300 dark:border-slate-600">
      <ol className="font-mono text-sm">
        {lines.map((text, i) => (
          <li key={i} id={lineAnchor(i + 1)} className="flex target:bg-amber-100 dark:target:bg-slate-700">
            <span className="muted w-12 shrink-0 select-none pr-3 text-right" aria-hidden="true">
              {i + 1}
            </span>
            <span className="whitespace-pre">{text}</span>
          </li>
        ))}
      </ol>
    </div>
  );
}
