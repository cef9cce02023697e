/**
 * The local preview (`fourfold preview FILE`): the pattern view fed by the
 * preview server's event stream. A save with errors keeps the last good chart
 * and shows the new diagnostics on top of it.
 */
import { useEffect, useMemo, useState } from 'react';
import type { PreviewState } from '../../../bin/preview/preview-state.js';
import { localTally } from '../lib/compiled.js';
import { localPlace, usePlace } from '../lib/use-place.js';
import type { Model } from '../../../shared/model.js';
import { PatternViewer } from '../components/pattern-viewer.js';
import { TallyPanel } from '../components/tally-panel.js';
import { DiagnosticList, countText } from '../components/diagnostic-list.js';
import { Section } from '../components/section.js';

export function PreviewPage() {
  const [state, setState] = useState<PreviewState | null>(null);
  const [connected, setConnected] = useState(false);
  useEffect(() => {
    const events = new EventSource('/api/preview/events');
    events.addEventListener('state', (e) => {
      setConnected(true);
      setState(JSON.parse((e as MessageEvent<string>).data) as PreviewState);
    });
    events.onerror = () => setConnected(false);
    return () => events.close();
  }, []);
  if (!state) return <p role="status">Waiting for the preview…</p>;
  return (
    <article aria-labelledby="preview-title" className="space-y-6" data-revision={state.revision}>
      <header>
        <h1 id="preview-title">{state.model?.header.title ?? state.file}</h1>
        <p className="muted text-sm">
          Live preview of {state.file} · {connected ? 'redraws on every save' : 'reconnecting to the preview…'}
        </p>
      </header>
      {state.diagnostics.length > 0 && (
        <div
          role="alert"
          className={`card ${state.stale ? 'border-red-700 dark:border-red-300' : ''}`}
          data-testid="preview-diagnostics"
        >
          <p className="mb-2 font-semibold">
            {countText(state.diagnostics)}
            {state.stale ? ' – the chart shows the last save without errors.' : ''}
          </p>
          <DiagnosticList diagnostics={state.diagnostics} />
        </div>
      )}
      {state.model ? <PreviewBody model={state.model} file={state.file} /> : <p>No chart yet: the file has errors.</p>}
    </article>
  );
}

function PreviewBody({ model, file }: { model: Model; file: string }) {
  const stored = useMemo(() => localPlace(`fourfold.place.preview.${file}`), [file]);
  const [place, setPlace] = usePlace(model, stored.saved, stored.save);
  const tally = useMemo(() => localTally(model), [model]);
  return (
    <>
      <Section title="Chart and steps">
        <PatternViewer model={model} place={place} onPlace={setPlace} />
      </Section>
      <Section title="Tally and kit">
        <TallyPanel tally={tally} beadSize={model.header.beads.size} />
      </Section>
    </>
  );
}
