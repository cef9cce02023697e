/**
 * The library table. Sorting and paging happen on the server; this component
 * only says which column and page the reader asked for.
 */
import { Link } from 'react-router-dom';
import type { PatternSummary } from '../api/types.js';
import type { ListParams, SortKey } from '../queries/patterns.js';
import { ColumnHeader } from './column-header.js';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function SortHeader({
  label,
  sort,
  params,
  onSort,
}: {
  label: string;
  sort: SortKey;
  params: ListParams;
  onSort(p: ListParams): void;
}) {
  const active = params.sort === sort;
  const nextDir = active ? (params.dir === 'asc' ? 'desc' : 'asc') : sort === 'title' ? 'asc' : 'desc';
  return (
    <th
      scope="col"
      aria-sort={active ? (params.dir === 'asc' ? 'ascending' : 'descending') : 'none'}
      className="p-2 text-left"
    >
      <button
        type="button"
        className="font-semibold hover:underline"
        onClick={() => onSort({ ...params, sort, dir: nextDir, page: 1 })}
      >
        {label}
        <span aria-hidden="true">{active ? (params.dir === 'asc' ? ' ▲' : ' ▼') : ''}</span>
      </button>
    </th>
  );
}

export function Swatches({ colors }: { colors: PatternSummary['colors'] }) {
  return (
    <ul className="flex flex-wrap gap-1" aria-label={`Colours: ${colors.map((c) => c.name || c.key).join(', ')}`}>
      {colors.map((c) => (
        <li
          key={c.key}
          title={`${c.key} ${c.name}`}
          className="h-4 w-4 rounded-full border border-slate-500"
          style={{ backgroundColor: c.hex }}
        />
      ))}
    </ul>
  );
}

const num = (n: number | null) => (n === null ? '–' : n.toLocaleString());

export function PatternTable({
  items,
  params,
  onChange,
}: {
  items: PatternSummary[];
  params: ListParams;
  onChange(p: ListParams): void;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[40rem] border-collapse text-sm">
        <caption className="sr-only">Your patterns</caption>
        <thead className="border-b border-slate-400">
          <tr>
            <SortHeader label="Title" sort="title" params={params} onSort={onChange} />
            <ColumnHeader label="Layout" />
            <ColumnHeader label="Rows" align="right" />
            <ColumnHeader label="Units" align="right" />
            <SortHeader label="Beads" sort="beads" params={params} onSort={onChange} />
            <ColumnHeader label="Colours" />
            <SortHeader label="Updated" sort="updated" params={params} onSort={onChange} />
            <ColumnHeader label="Sharing" />
          </tr>
        </thead>
        <tbody>
          {items.map((p) => (
            <tr key={p.id} className="border-b border-slate-200 dark:border-slate-700">
              <td className="p-2">
                <Link className="link font-semibold" to={`/patterns/${p.id}`}>
                  {p.title}
                </Link>
                {p.errors > 0 && (
                  <span className="error-text ml-2 text-xs font-semibold">
                    {p.errors} error{p.errors === 1 ? '' : 's'}
                  </span>
                )}
              </td>
              <td className="p-2">{p.layout}</td>
              <td className="p-2 text-right font-mono">{num(p.rows)}</td>
              <td className="p-2 text-right font-mono">{num(p.units)}</td>
              <td className="p-2 text-right font-mono">{num(p.beads)}</td>
              <td className="p-2">
                <Swatches colors={p.colors} />
              </td>
              <td className="p-2 whitespace-nowrap">{dateFormat.format(new Date(p.updatedAt))}</td>
              <td className="p-2">{sharingText(p.sharing)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function sharingText(s: PatternSummary['sharing']): string {
  if (s.links === 0 && s.testers === 0) return 'Private';
  const parts = [];
  if (s.links > 0) parts.push(`${s.links} link${s.links === 1 ? '' : 's'}`);
  if (s.testers > 0) parts.push(`${s.testers} tester${s.testers === 1 ? '' : 's'}`);
  return parts.join(', ');
}

export function Pager({
  total,
  params,
  onChange,
}: {
  total: number;
  params: ListParams;
  onChange(p: ListParams): void;
}) {
  const pages = Math.max(1, Math.ceil(total / params.pageSize));
  return (
    // On a phone the count takes its own line above the buttons, so no label breaks in two.
    <nav aria-label="Pages" className="mt-4 flex flex-wrap items-center gap-3 text-sm whitespace-nowrap">
      <button
        type="button"
        className="btn"
        disabled={params.page <= 1}
        onClick={() => onChange({ ...params, page: params.page - 1 })}
      >
        Previous page
      </button>
      <span className="order-first w-full sm:order-none sm:w-auto">
        Page {params.page} of {pages} ({total} pattern{total === 1 ? '' : 's'})
      </span>
      <button
        type="button"
        className="btn"
        disabled={params.page >= pages}
        onClick={() => onChange({ ...params, page: params.page + 1 })}
      >
        Next page
      </button>
    </nav>
  );
}
