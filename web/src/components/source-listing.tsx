/** The pattern text with line numbers; a check's link brings its line into view and marks it. */
import { useEffect, useRef } from 'react';

export function SourceListing({ source, line }: { source: string; line?: number }) {
  const box = useRef<HTMLOListElement>(null);
  const lines = source.split(/\r?\n/);
  useEffect(() => {
    if (line) box.current?.children[line - 1]?.scrollIntoView({ block: 'center', behavior: 'smooth' });
  }, [line]);
  return (
    <div className="max-h-96 overflow-auto rounded border border-slate-300 dark:border-slate-600">
      <ol ref={box} className="font-mono text-sm" aria-label="Source lines">
        {lines.map((text, i) => (
          <li
            key={i}
            className={`flex ${line === i + 1 ? 'bg-amber-100 dark:bg-slate-700' : ''}`}
            aria-current={line === i + 1 ? 'location' : undefined}
          >
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
