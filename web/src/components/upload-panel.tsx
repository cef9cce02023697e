/**
 * Drop or pick `.ffp` files, or paste a pattern; each is checked on the
 * server first and its diagnostics shown; saving is allowed with errors
 * (the library marks those patterns), because half-finished work is still work.
 */
import { useState } from 'react';
import { useDropzone } from 'react-dropzone';
import type { CheckedFile, UploadedItem } from '../api/types.js';
import { useCheck, useUploadPatterns } from '../queries/patterns.js';
import { countText, DiagnosticList } from './diagnostic-list.js';
import { FormError } from './field.js';

type Pending =
  { kind: 'files'; files: File[]; checked: CheckedFile[] } | { kind: 'paste'; source: string; checked: CheckedFile[] };

export function UploadPanel({ onSaved }: { onSaved(items: UploadedItem[]): void }) {
  const check = useCheck();
  const upload = useUploadPatterns();
  const [pending, setPending] = useState<Pending | null>(null);
  const [paste, setPaste] = useState('');

  const checkFiles = (files: File[]) => {
    if (files.length === 0) return;
    upload.reset();
    check.mutate({ files }, { onSuccess: (r) => setPending({ kind: 'files', files, checked: r.files }) });
  };
  const { getRootProps, getInputProps, isDragActive, fileRejections } = useDropzone({
    onDrop: checkFiles,
    accept: { 'text/plain': ['.ffp'] },
    maxSize: 1024 * 1024,
    maxFiles: 50,
    noClick: false,
  });

  const save = () => {
    if (!pending) return;
    const input = pending.kind === 'files' ? { files: pending.files } : { source: pending.source };
    upload.mutate(input, { onSuccess: (r) => onSaved(r.items) });
  };
  const withErrors = pending?.checked.filter((f) => !f.ok).length ?? 0;

  return (
    <div className="space-y-6">
      <div
        {...getRootProps({
          className: `card flex min-h-32 cursor-pointer flex-col items-center justify-center border-2 border-dashed border-slate-500 text-center dark:border-slate-400 ${isDragActive ? 'bg-teal-50 dark:bg-slate-800' : ''}`,
          'aria-label': 'Drop pattern files here, or press Enter to choose files',
        })}
      >
        <input {...getInputProps({ 'aria-label': 'Pattern files' })} />
        <p className="font-semibold">
          {isDragActive ? 'Drop the files to check them' : 'Drop .ffp files here, or click to choose'}
        </p>
        <p className="muted text-sm">Up to 50 files, 1 MiB each.</p>
      </div>
      {fileRejections.length > 0 && (
        <ul role="alert" className="error-text text-sm">
          {fileRejections.map((r) => (
            <li key={r.file.name}>
              {r.file.name}:{' '}
              {r.errors
                .map((e) =>
                  e.code === 'file-invalid-type'
                    ? 'not a .ffp file'
                    : e.code === 'file-too-large'
                      ? 'larger than 1 MiB'
                      : e.message,
                )
                .join('; ')}
            </li>
          ))}
        </ul>
      )}
      <form
        onSubmit={(e) => {
          e.preventDefault();
          const source = paste;
          upload.reset();
          check.mutate({ source }, { onSuccess: (r) => setPending({ kind: 'paste', source, checked: r.files }) });
        }}
      >
        <label className="label" htmlFor="paste-source">
          Or paste a pattern
        </label>
        <textarea
          id="paste-source"
          className="input min-h-40 font-mono text-sm"
          value={paste}
          onChange={(e) => setPaste(e.target.value)}
        />
        <button type="submit" className="btn mt-2" disabled={paste.trim() === '' || check.isPending}>
          Check the pasted pattern
        </button>
      </form>
      {check.isPending && <p role="status">Checking…</p>}
      <FormError error={check.error ?? upload.error} />
      {pending && (
        <section aria-labelledby="checked-title" className="space-y-4">
          <h2 id="checked-title">Checked</h2>
          {pending.checked.map((f, i) => (
            <article key={`${f.name}-${i}`} className="card" aria-label={f.name}>
              <h3 className="font-semibold">
                {f.title || f.name} <span className="muted font-mono text-sm">{f.name}</span>
              </h3>
              <p className={f.ok ? 'text-sm' : 'error-text text-sm font-semibold'}>
                {countText(f.diagnostics)}
                {f.tally ? ` · ${f.tally.beads.toLocaleString()} beads` : ''}
              </p>
              {f.diagnostics.length > 0 && (
                <div className="mt-2">
                  <DiagnosticList diagnostics={f.diagnostics} label={`Checks of ${f.name}`} />
                </div>
              )}
            </article>
          ))}
          {withErrors > 0 && (
            <p className="warning-text text-sm">
              {withErrors} of {pending.checked.length} {withErrors === 1 ? 'has' : 'have'} errors. You can save anyway;
              the library marks them.
            </p>
          )}
          <button
            type="button"
            className="btn btn-primary"
            onClick={save}
            disabled={upload.isPending || upload.isSuccess}
          >
            {upload.isSuccess
              ? 'Saved'
              : `Save ${pending.checked.length === 1 ? 'this pattern' : `these ${pending.checked.length} patterns`}`}
            {withErrors > 0 && !upload.isSuccess ? ' (with errors)' : ''}
          </button>
        </section>
      )}
    </div>
  );
}
