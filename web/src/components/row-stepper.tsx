/**
 * Previous and next unit (buttons, and the arrow keys anywhere on the page
 * except while typing), a jump to any row, and the current unit's step text
 * in the words of the written steps.
 */
import { useEffect, useId, useState, type FormEvent } from 'react';
import type { Model } from '../../../shared/model.js';
import type { StepsDoc } from '../../../shared/steps.js';
import { rowHeading, unitHeading, unitSentences } from '../../../shared/steps-render.js';
import { rowRange, step, unitAt, type StepPlace } from '../lib/stepper.js';

const typing = (target: EventTarget | null): boolean =>
  target instanceof HTMLElement &&
  (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

export function RowStepper({
  model,
  steps,
  place,
  onPlace,
}: {
  model: Model;
  steps: StepsDoc;
  place: StepPlace;
  onPlace(p: StepPlace): void;
}) {
  const jumpId = useId();
  const [jump, setJump] = useState(String(place.row));
  const { first, last } = rowRange(model);
  const row = steps.rows.find((r) => r.row === place.row);
  const unitStep = row?.steps.find((s) => s.number === place.unit);
  const unitsInRow = model.rows.find((r) => r.row === place.row)?.units.length ?? 0;

  useEffect(() => setJump(String(place.row)), [place.row]);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typing(e.target) || e.altKey || e.ctrlKey || e.metaKey) return;
      if (e.key === 'ArrowRight' || e.key === 'ArrowLeft') {
        e.preventDefault();
        onPlace(step(model, place, e.key === 'ArrowRight' ? 1 : -1));
      }
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [model, place, onPlace]);

  const submitJump = (e: FormEvent) => {
    e.preventDefault();
    const n = Number(jump);
    if (Number.isInteger(n) && unitAt(model, { row: n, unit: 1 })) onPlace({ row: n, unit: 1 });
  };
  const jumpValid = Number.isInteger(Number(jump)) && unitAt(model, { row: Number(jump), unit: 1 }) !== undefined;
  const word = row?.word === 'round' ? 'Round' : 'Row';

  return (
    <section aria-label="Row stepper" className="card space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        <button
          type="button"
          className="btn"
          onClick={() => onPlace(step(model, place, -1))}
          aria-keyshortcuts="ArrowLeft"
        >
          ← Previous unit
        </button>
        <p aria-live="polite" className="font-mono font-semibold" data-testid="stepper-place">
          {word} {place.row}, unit {place.unit} of {unitsInRow}
        </p>
        <button
          type="button"
          className="btn"
          onClick={() => onPlace(step(model, place, 1))}
          aria-keyshortcuts="ArrowRight"
        >
          Next unit →
        </button>
      </div>
      <form onSubmit={submitJump} className="flex items-end gap-2">
        <div>
          <label htmlFor={jumpId} className="label">
            Jump to {word.toLowerCase()}
          </label>
          <input
            id={jumpId}
            className="input w-24 font-mono"
            type="number"
            min={first}
            max={last}
            value={jump}
            aria-invalid={!jumpValid}
            onChange={(e) => setJump(e.target.value)}
          />
        </div>
        <button type="submit" className="btn" disabled={!jumpValid}>
          Go
        </button>
      </form>
      {row && <p className="muted text-sm">{rowHeading(row)}</p>}
      {row?.notes.map((n) => (
        <p key={n} className="text-sm italic">
          {n}
        </p>
      ))}
      {unitStep ? (
        <div data-testid="step-text">
          <h3 className="font-semibold">{unitHeading(unitStep)}</h3>
          <ol className="mt-1 list-decimal space-y-1 pl-5 text-sm">
            {unitSentences(unitStep, row!.word).map((s, i) => (
              <li key={i}>{s}</li>
            ))}
          </ol>
        </div>
      ) : (
        <p className="text-sm">This unit could not be built; see the checks.</p>
      )}
      <p className="muted text-xs">Arrow keys ← → step through the units.</p>
    </section>
  );
}
