/**
 * Notes from testers on a row or unit. The reader picks the place on the
 * chart (or with the stepper); the designer sees open notes and resolves them.
 */
import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { FeedbackNote } from '../api/types.js';
import { feedbackQuery, useAddNote, useResolveNote } from '../queries/feedback.js';
import type { StepPlace } from '../lib/stepper.js';
import { FormError } from './field.js';
import { QueryError } from './query-error.js';

export const noteWhere = (n: Pick<FeedbackNote, 'row' | 'unit'>) =>
  `row ${n.row}${n.unit !== null ? `, unit ${n.unit}` : ''}`;

const samePlace = (a: StepPlace, b: StepPlace) => a.row === b.row && a.unit === b.unit;

export function FeedbackPanel(props: {
  patternId: number;
  version: number;
  /** Where the next note goes: the last bead clicked on the chart, or the stepper's unit when asked for. */
  picked: StepPlace;
  /** The stepper's unit, which a keyboard reader reaches with the arrow keys. */
  current: StepPlace;
  onPick(place: StepPlace): void;
  canWrite: boolean;
  canResolve: boolean;
  onShow(place: StepPlace): void;
}) {
  const notes = useQuery(feedbackQuery(props.patternId, props.version));
  const add = useAddNote(props.patternId);
  const resolve = useResolveNote(props.patternId);
  const [text, setText] = useState('');
  const [whole, setWhole] = useState(false);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const note = { row: props.picked.row, text, version: props.version, ...(whole ? {} : { unit: props.picked.unit }) };
    add.mutate(note, { onSuccess: () => setText('') });
  };
  const open = notes.data?.items.filter((n) => n.status === 'open') ?? [];
  const resolved = notes.data?.items.filter((n) => n.status === 'resolved') ?? [];

  return (
    <div className="space-y-4">
      {props.canWrite && (
        <form onSubmit={submit} aria-labelledby="note-title">
          <h3 id="note-title" className="font-semibold">
            Leave a note on row {props.picked.row}
            {whole ? '' : `, unit ${props.picked.unit}`}
          </h3>
          <div className="mb-2 flex flex-wrap items-center gap-x-3 gap-y-2 text-sm">
            <p className="muted">Click a bead on the chart, or step to a unit and use it.</p>
            <button
              type="button"
              className="btn"
              disabled={samePlace(props.picked, props.current)}
              onClick={() => props.onPick(props.current)}
            >
              Use current unit ({noteWhere(props.current)})
            </button>
          </div>
          <FormError error={add.error} />
          <label className="mb-2 flex items-center gap-2 text-sm">
            <input type="checkbox" checked={whole} onChange={(e) => setWhole(e.target.checked)} /> About the whole row
          </label>
          <label className="label" htmlFor="note-text">
            Note
          </label>
          <textarea
            id="note-text"
            className="input min-h-24"
            required
            maxLength={4000}
            value={text}
            onChange={(e) => setText(e.target.value)}
          />
          <button type="submit" className="btn btn-primary mt-2" disabled={add.isPending || text.trim() === ''}>
            Add note
          </button>
        </form>
      )}
      {notes.isPending && <p role="status">Loading notes…</p>}
      {notes.isError && <QueryError error={notes.error} retry={() => notes.refetch()} />}
      <FormError error={resolve.error} />
      {notes.data && (
        <>
          <h3 className="font-semibold">Open notes ({open.length})</h3>
          <NoteList
            notes={open}
            version={props.version}
            onShow={props.onShow}
            onResolve={props.canResolve ? (id) => resolve.mutate(id) : undefined}
          />
          {resolved.length > 0 && (
            <details>
              <summary className="cursor-pointer font-semibold">Resolved notes ({resolved.length})</summary>
              <NoteList notes={resolved} version={props.version} onShow={props.onShow} />
            </details>
          )}
        </>
      )}
    </div>
  );
}

function NoteList({
  notes,
  version,
  onShow,
  onResolve,
}: {
  notes: FeedbackNote[];
  version: number;
  onShow(p: StepPlace): void;
  onResolve?(id: number): void;
}) {
  if (notes.length === 0) return <p className="muted text-sm">None.</p>;
  return (
    <ul className="space-y-2" aria-label="Notes">
      {notes.map((n) => (
        <li key={n.id} className="card text-sm" data-testid="feedback-note">
          <p className="flex flex-wrap items-center gap-2">
            <button
              type="button"
              className="link font-semibold"
              onClick={() => onShow({ row: n.row, unit: n.unit ?? 1 })}
            >
              {noteWhere(n)}
            </button>
            <span className="muted">
              {n.author.name}, {new Date(n.createdAt).toLocaleDateString()}
              {n.version !== version ? ` · written on version ${n.version}` : ''}
            </span>
          </p>
          <p className="mt-1 whitespace-pre-wrap">{n.text}</p>
          {onResolve && (
            <button type="button" className="btn mt-2" onClick={() => onResolve(n.id)}>
              Resolve
            </button>
          )}
        </li>
      ))}
    </ul>
  );
}
