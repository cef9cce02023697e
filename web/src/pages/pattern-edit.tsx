/**
 * The source in a code editor with live checks as you type and the chart
 * redrawn from the same text; saving makes a new version on the server.
 * This page (and CodeMirror with it) is loaded only when opened.
 */
import { useEffect, useRef, useState } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import CodeMirror, { EditorView } from '@uiw/react-codemirror';
import { Link, useLoaderData, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import type { PatternDetail } from '../api/types.js';
import { patternQuery, useSaveVersion } from '../queries/patterns.js';
import { useCompiled } from '../lib/compiled.js';
import { patternParams } from '../lib/route-params.js';
import { useDark } from '../lib/use-dark.js';
import { checkMarks, goTo, lineOffset, showChecks } from '../lib/editor-marks.js';
import { ffpHighlighting } from '../lib/ffp-language.js';
import { ChartView } from '../components/chart-view.js';
import { DiagnosticList, countText } from '../components/diagnostic-list.js';
import { FormError } from '../components/field.js';
import { QueryError } from '../components/query-error.js';
import { ShadowHost } from '../components/shadow-host.js';
import { NotFoundPage } from './not-found.js';

export const patternEditLoader = (queryClient: QueryClient) => async (args: LoaderFunctionArgs) => {
  const { id } = patternParams(args);
  await queryClient.ensureQueryData(patternQuery(id));
  return { id };
};

export function PatternEditPage() {
  const { id } = useLoaderData() as { id: number };
  const pattern = useQuery(patternQuery(id));
  if (pattern.isError) return <QueryError error={pattern.error} retry={() => pattern.refetch()} />;
  if (!pattern.data) return <p role="status">Loading the pattern…</p>;
  if (!pattern.data.can.edit) return <NotFoundPage />;
  return <Editor detail={pattern.data} />;
}

/** How long typing must pause before the checks and the chart catch up. */
const SETTLE_MS = 250;

function Editor({ detail }: { detail: PatternDetail }) {
  const [text, setText] = useState(detail.source);
  const [settled, setSettled] = useState(detail.source);
  const view = useRef<EditorView | null>(null);
  const dark = useDark();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const save = useSaveVersion(detail.id);
  const compiled = useCompiled(settled);
  const diagnostics = compiled.diagnostics;

  useEffect(() => {
    const t = setTimeout(() => setSettled(text), SETTLE_MS);
    return () => clearTimeout(t);
  }, [text]);
  useEffect(() => {
    if (view.current) showChecks(view.current, diagnostics);
  }, [diagnostics]);

  const doSave = () =>
    save.mutate(text, {
      onSuccess: (r) => navigate(`/patterns/${detail.id}`, { state: { saved: r.created } }),
    });
  const onKeyDown = (e: React.KeyboardEvent) => {
    if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === 's') {
      e.preventDefault();
      doSave();
    }
  };

  return (
    <div className="space-y-4" onKeyDown={onKeyDown}>
      <header className="flex flex-wrap items-center gap-3">
        <h1>Edit {detail.title}</h1>
        <span className="muted text-sm">version {detail.version}</span>
        <div className="ml-auto flex gap-2">
          <Link className="btn" to={`/patterns/${detail.id}`}>
            Cancel
          </Link>
          <button
            type="button"
            className="btn btn-primary"
            onClick={doSave}
            disabled={save.isPending || text === detail.source}
            aria-keyshortcuts="Control+S"
          >
            {save.isPending ? 'Saving…' : 'Save as a new version'}
          </button>
        </div>
      </header>
      <FormError error={save.error} />
      <div className="grid gap-4 lg:grid-cols-2">
        <div>
          <label id="editor-label" className="label">
            Pattern source
          </label>
          <ShadowHost className="overflow-hidden rounded border border-slate-400 font-mono text-sm">
            {(root) => (
              <CodeMirror
                root={root}
                value={text}
                onChange={setText}
                height="60vh"
                theme={dark ? 'dark' : 'light'}
                extensions={[
                  ffpHighlighting(dark),
                  checkMarks,
                  EditorView.contentAttributes.of({ 'aria-labelledby': 'editor-label' }),
                ]}
                basicSetup={{ lineNumbers: true, foldGutter: false, autocompletion: false }}
                onCreateEditor={(v) => {
                  view.current = v;
                  showChecks(v, diagnostics);
                  const line = Number(params.get('line'));
                  if (line > 0) goTo(v, lineOffset(v, line));
                }}
              />
            )}
          </ShadowHost>
        </div>
        <div className="space-y-4">
          <section aria-labelledby="live-checks-title" aria-live="polite">
            <h2 id="live-checks-title" className="mb-2">
              Checks: {countText(diagnostics)}
            </h2>
            <DiagnosticList
              diagnostics={diagnostics}
              onSelect={(d) => view.current && goTo(view.current, d.range.offset)}
            />
          </section>
          <ChartView model={compiled.value.model} dark={dark} />
        </div>
      </div>
    </div>
  );
}
