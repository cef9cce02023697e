/**
 * One pattern: chart and stepper, notes, tally and kit, checks linked to the
 * source, versions, downloads and sharing. Everything is for the version in
 * the URL (`?version=N`), the current one when absent.
 */
import { useMemo, useState } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Link, useLoaderData, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { getSession, useSession } from '../api/session.js';
import type { PatternDetail } from '../api/types.js';
import { patternQuery, tallyQuery, useDeletePattern } from '../queries/patterns.js';
import { placeQuery, useSavePlace } from '../queries/place.js';
import { feedbackQuery } from '../queries/feedback.js';
import { useCompiled } from '../lib/compiled.js';
import { patternParams } from '../lib/route-params.js';
import { usePlace } from '../lib/use-place.js';
import { unitAt, validPlace, type StepPlace } from '../lib/stepper.js';
import { PatternViewer } from '../components/pattern-viewer.js';
import { TallyQueryPanel } from '../components/tally-panel.js';
import { DiagnosticList, countText } from '../components/diagnostic-list.js';
import { VersionsPanel } from '../components/versions-panel.js';
import { DownloadsPanel, patternDownloads } from '../components/downloads-panel.js';
import { SharingPanel } from '../components/sharing-panel.js';
import { FeedbackPanel } from '../components/feedback-panel.js';
import { SourceListing } from '../components/source-listing.js';
import { QueryError } from '../components/query-error.js';
import { Section } from '../components/section.js';

export const patternLoader = (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
  const { id, version } = patternParams(args);
  void queryClient.prefetchQuery(tallyQuery(id, version));
  // The reader's place comes with the page, so the stepper does not jump once it arrives.
  const place = getSession()?.user.role === 'admin' ? null : queryClient.ensureQueryData(placeQuery(id));
  await Promise.all([queryClient.ensureQueryData(patternQuery(id, version)), place]);
  return { id, version };
};

export function PatternPage() {
  const { id, version } = useLoaderData() as { id: number; version?: number };
  const pattern = useQuery(patternQuery(id, version));
  if (pattern.isError) return <QueryError error={pattern.error} retry={() => pattern.refetch()} />;
  if (!pattern.data) return <p role="status">Loading the pattern…</p>;
  return <PatternBody detail={pattern.data} version={version} />;
}

function PatternBody({ detail, version }: { detail: PatternDetail; version?: number }) {
  const session = useSession();
  const navigate = useNavigate();
  const { model } = useCompiled(detail.source).value;
  const keepsPlace = session?.user.role !== 'admin';
  const saved = useQuery({ ...placeQuery(detail.id), enabled: keepsPlace });
  const savePlace = useSavePlace(detail.id);
  const [place, setPlace] = usePlace(model, saved.data, keepsPlace ? (p) => savePlace.mutate(p) : undefined);
  // The note's place is chosen apart from the stepper: reading on does not move a note half written.
  const [notePlace, setNotePlace] = useState<StepPlace | undefined>(place);
  const tally = useQuery(tallyQuery(detail.id, version));
  const remove = useDeletePattern(detail.id);
  const viewing = detail.viewing.version;
  const notes = useQuery(feedbackQuery(detail.id, viewing));
  const [line, setLine] = useState<number | undefined>();
  const noted = useMemo(
    () =>
      (notes.data?.items ?? [])
        .filter((n) => n.status === 'open')
        .map((n) => unitAt(model, { row: n.row, unit: n.unit ?? 1 })?.id)
        .filter((u): u is number => u !== undefined),
    [notes.data, model],
  );
  const versionQuery = version ? `?version=${version}` : '';

  return (
    <article aria-labelledby="pattern-title" className="space-y-8">
      <header className="flex flex-wrap items-start gap-4">
        <div>
          <h1 id="pattern-title">{detail.title}</h1>
          <p className="muted text-sm">
            Version {viewing}
            {viewing !== detail.version ? ` (current is ${detail.version})` : ''} · {detail.layout} · by{' '}
            {detail.owner.name} · {countText(detail.diagnostics)}
          </p>
        </div>
        <nav aria-label="Pattern actions" className="no-print ml-auto flex flex-wrap gap-2">
          {detail.can.edit && (
            <Link className="btn" to={`/patterns/${detail.id}/edit`}>
              Edit source
            </Link>
          )}
          <Link className="btn" to={`/patterns/${detail.id}/print${versionQuery}`}>
            Print
          </Link>
        </nav>
      </header>
      {viewing !== detail.version && (
        <p role="note" className="card warning-text">
          You are looking at an older version.{' '}
          <Link className="link" to={`/patterns/${detail.id}`}>
            Show the current version
          </Link>
          .
        </p>
      )}
      <Section title="Chart and steps">
        <PatternViewer
          model={model}
          place={place}
          onPlace={setPlace}
          onPick={detail.can.feedback ? setNotePlace : undefined}
          noted={noted}
        />
      </Section>
      {place && (
        <Section title="Notes">
          <FeedbackPanel
            patternId={detail.id}
            version={viewing}
            picked={validPlace(model, notePlace) ?? place}
            current={place}
            onPick={setNotePlace}
            canWrite={detail.can.feedback}
            canResolve={detail.can.resolve}
            onShow={setPlace}
          />
        </Section>
      )}
      <Section title="Tally and kit">
        <TallyQueryPanel query={tally} beadSize={model.header.beads.size} />
      </Section>
      <Section title="Checks">
        <DiagnosticList diagnostics={detail.diagnostics} onSelect={(d) => setLine(d.range.line)} />
        <h3 className="mt-4 mb-2 font-semibold">Source</h3>
        <SourceListing source={detail.source} line={line} />
      </Section>
      <Section title="Versions">
        <VersionsPanel patternId={detail.id} viewing={viewing} current={detail.version} />
      </Section>
      <Section title="Downloads">
        <DownloadsPanel items={patternDownloads(detail.id)} title={detail.title} version={version} />
      </Section>
      {detail.can.share && (
        <Section title="Sharing">
          <SharingPanel patternId={detail.id} />
        </Section>
      )}
      {detail.can.edit && (
        <Section title="Delete">
          <button
            type="button"
            className="btn"
            onClick={() =>
              window.confirm(`Delete “${detail.title}” and all its versions?`) &&
              remove.mutate(undefined, { onSuccess: () => navigate('/library') })
            }
          >
            Delete this pattern
          </button>
        </Section>
      )}
    </article>
  );
}
