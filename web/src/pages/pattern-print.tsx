/** A print layout: chart, legend (in the chart), tally and steps on paper; the tally's kit part carries the small-parts caution. */
import { useMemo } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs } from 'react-router-dom';
import { buildSteps } from '../../../shared/steps.js';
import { rowHeading, unitHeading, unitSentences } from '../../../shared/steps-render.js';
import { patternQuery, tallyQuery } from '../queries/patterns.js';
import { useCompiled } from '../lib/compiled.js';
import { patternParams } from '../lib/route-params.js';
import { ChartView } from '../components/chart-view.js';
import { TallyPanel } from '../components/tally-panel.js';
import { QueryError } from '../components/query-error.js';

export const patternPrintLoader = (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
  const { id, version } = patternParams(args);
  await Promise.all([
    queryClient.ensureQueryData(patternQuery(id, version)),
    queryClient.ensureQueryData(tallyQuery(id, version)),
  ]);
  return { id, version };
};

export function PatternPrintPage() {
  const { id, version } = useLoaderData() as { id: number; version?: number };
  const pattern = useQuery(patternQuery(id, version));
  const tally = useQuery(tallyQuery(id, version));
  const source = pattern.data?.source ?? '';
  const { model } = useCompiled(source).value;
  const steps = useMemo(() => buildSteps(model), [model]);
  if (pattern.isError || tally.isError) return <QueryError error={pattern.error ?? tally.error} />;
  if (!pattern.data || !tally.data) return <p role="status">Preparing the print layout…</p>;
  return (
    <article className="space-y-6 print:text-black">
      <div className="no-print flex gap-2">
        <button type="button" className="btn btn-primary" onClick={() => window.print()}>
          Print
        </button>
      </div>
      <h1>{pattern.data.title}</h1>
      <p>
        by {pattern.data.owner.name} · version {pattern.data.viewing.version}
      </p>
      <ChartView model={model} dark={false} />
      <TallyPanel tally={tally.data} beadSize={model.header.beads.size} />
      <section>
        <h2>Steps</h2>
        {steps.rows.map((row) => (
          <div key={row.row} className="mt-3 break-inside-avoid">
            <h3 className="font-semibold">{rowHeading(row)}</h3>
            {row.notes.map((n) => (
              <p key={n} className="italic">
                {n}
              </p>
            ))}
            <ol className="list-decimal pl-6 text-sm">
              {row.steps.map((s) => (
                <li key={s.number}>
                  <strong>{unitHeading(s)}.</strong> {unitSentences(s, row.word).join(' ')}
                </li>
              ))}
            </ol>
          </div>
        ))}
      </section>
    </article>
  );
}
