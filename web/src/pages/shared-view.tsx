/** What a share link opens: read-only chart, stepper, tally and steps, no sign-in; the place is kept in this browser. */
import { useMemo } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useLoaderData, type LoaderFunctionArgs } from 'react-router-dom';
import type { PatternDetail } from '../api/types.js';
import { sharedQuery, sharedTallyQuery } from '../queries/shared.js';
import { useCompiled } from '../lib/compiled.js';
import { localPlace, usePlace } from '../lib/use-place.js';
import { PatternViewer } from '../components/pattern-viewer.js';
import { TallyQueryPanel } from '../components/tally-panel.js';
import { DownloadsPanel, sharedDownloads } from '../components/downloads-panel.js';
import { QueryError } from '../components/query-error.js';
import { Section } from '../components/section.js';

export const sharedLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const token = params.token ?? '';
    void queryClient.prefetchQuery(sharedTallyQuery(token));
    await queryClient.ensureQueryData(sharedQuery(token));
    return { token };
  };

export function SharedViewPage() {
  const { token } = useLoaderData() as { token: string };
  const pattern = useQuery(sharedQuery(token));
  if (pattern.isError) return <QueryError error={pattern.error} />;
  if (!pattern.data) return <p role="status">Loading the pattern…</p>;
  return <SharedBody token={token} detail={pattern.data} />;
}

function SharedBody({ token, detail }: { token: string; detail: PatternDetail }) {
  const { model } = useCompiled(detail.source).value;
  // The key holds only part of the token: enough to tell links apart, not enough to use one.
  const stored = useMemo(() => localPlace(`fourfold.place.s.${token.slice(0, 12)}`), [token]);
  const [place, setPlace] = usePlace(model, stored.saved, stored.save);
  const tally = useQuery(sharedTallyQuery(token));
  return (
    <article aria-labelledby="shared-title" className="space-y-8">
      <header>
        <h1 id="shared-title">{detail.title}</h1>
        <p className="muted text-sm">
          Shared by {detail.owner.name} · version {detail.viewing.version} · read-only
        </p>
      </header>
      <Section title="Chart and steps">
        <PatternViewer model={model} place={place} onPlace={setPlace} />
      </Section>
      <Section title="Tally and kit">
        <TallyQueryPanel query={tally} beadSize={model.header.beads.size} />
      </Section>
      <Section title="Downloads">
        <DownloadsPanel items={sharedDownloads(token)} title={detail.title} anonymous />
      </Section>
    </article>
  );
}
