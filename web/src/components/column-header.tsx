/** Table column headers in one style, so every table in the app reads alike. */
import type { ReactNode } from 'react';

// Whole class names, so Tailwind's scanner finds them.
const ALIGN = { left: 'p-2 text-left', right: 'p-2 text-right' } as const;

export interface Column {
  label: ReactNode;
  align?: keyof typeof ALIGN;
}

export function ColumnHeader({ label, align = 'left' }: Column) {
  return (
    <th scope="col" className={ALIGN[align]}>
      {label}
    </th>
  );
}

/** A header row of plain columns, for tables that sort nothing. */
export function TableHead({ columns }: { columns: Column[] }) {
  return (
    <thead className="border-b border-slate-400">
      <tr>
        {columns.map((c, i) => (
          <ColumnHeader key={i} {...c} />
        ))}
      </tr>
    </thead>
  );
}
