/** The tally (per colour with grams and buy amounts, per row) and the kit sheet's tools and caution. */
import { SMALL_PARTS_CAUTION } from '../../../shared/caution.js';
import { toolSuggestion } from '../../../shared/kit.js';
import type { UseQueryResult } from '@tanstack/react-query';
import type { TallyJson } from '../api/types.js';
import { QueryError } from './query-error.js';
import { TableHead } from './column-header.js';

const mmToCm = (mm: number) => `${(mm / 10).toLocaleString(undefined, { maximumFractionDigits: 1 })} cm`;

export function TallyPanel({ tally, beadSize }: { tally: TallyJson; beadSize: string }) {
  const tools = toolSuggestion(beadSize);
  let running = 0;
  return (
    <div className="space-y-6">
      <p>
        <strong data-testid="tally-beads">{tally.beads.toLocaleString()}</strong> beads in{' '}
        {tally.units.toLocaleString()} units · finished size {tally.size.widthMm} × {tally.size.heightMm} mm · thread{' '}
        {mmToCm(tally.thread.mm)} ({tally.thread.threads} thread
        {tally.thread.threads === 1 ? '' : 's'})
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="mb-1 text-left font-semibold">
            Beads per colour (buy amounts include a {Math.round(tally.spare * 100)}% spare)
          </caption>
          <TableHead
            columns={[
              { label: 'Colour' },
              { label: 'Beads', align: 'right' },
              { label: 'Grams', align: 'right' },
              { label: 'Buy', align: 'right' },
            ]}
          />
          <tbody>
            {tally.colors.map((c) => (
              <tr key={c.key} className="border-b border-slate-200 dark:border-slate-700">
                <td className="p-2">
                  <span
                    className="mr-2 inline-block h-4 w-4 rounded-full border border-slate-500 align-middle"
                    style={{ backgroundColor: c.hex }}
                  />
                  <span className="font-mono font-semibold">{c.key}</span> {c.name}
                </td>
                <td className="p-2 text-right font-mono">{c.count.toLocaleString()}</td>
                <td className="p-2 text-right font-mono">
                  {c.grams.low}–{c.grams.high} g
                </td>
                <td className="p-2 text-right font-mono">{c.buyGrams} g</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <details>
        <summary className="cursor-pointer font-semibold">Beads per row</summary>
        <table className="mt-2 border-collapse text-sm">
          <TableHead
            columns={[
              { label: 'Row', align: 'right' },
              { label: 'Units', align: 'right' },
              { label: 'Beads', align: 'right' },
              { label: 'Running total', align: 'right' },
            ]}
          />
          <tbody className="font-mono">
            {tally.rows.map((r) => {
              running += r.beads;
              return (
                <tr key={r.row}>
                  <td className="p-1 text-right">{r.row}</td>
                  <td className="p-1 text-right">{r.units}</td>
                  <td className="p-1 text-right">{r.beads}</td>
                  <td className="p-1 text-right">{running}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </details>
      <section aria-labelledby="kit-title">
        <h3 id="kit-title" className="font-semibold">
          Kit sheet
        </h3>
        {tools && (
          <p className="text-sm">
            For {beadSize} beads: {tools.needle}; {tools.thread}.
          </p>
        )}
        <p
          className="mt-2 rounded border-l-4 border-amber-600 bg-amber-50 p-2 text-sm text-slate-900 dark:bg-slate-800 dark:text-slate-100"
          role="note"
        >
          {SMALL_PARTS_CAUTION}
        </p>
      </section>
    </div>
  );
}

/** The tally as a query's result: loading, failed with a retry, or shown. */
export function TallyQueryPanel({ query, beadSize }: { query: UseQueryResult<TallyJson>; beadSize: string }) {
  if (query.isPending) return <p role="status">Counting…</p>;
  if (query.isError) return <QueryError error={query.error} retry={() => void query.refetch()} />;
  return <TallyPanel tally={query.data} beadSize={beadSize} />;
}
