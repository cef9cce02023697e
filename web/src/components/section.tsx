import { useId, type ReactNode } from 'react';

/** A titled part of a page, labelled by its heading for screen readers' landmarks list. */
export function Section({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id}>
      <h2 id={id} className="mb-3 border-b border-slate-300 pb-1 dark:border-slate-600">
        {title}
      </h2>
      {children}
    </section>
  );
}
