/**
 * The reader's place in the stepper, restored from wherever it is kept (the
 * server for a signed-in reader, localStorage for share links and the
 * preview) and written back a moment after it stops changing.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import type { Model } from '../../../shared/model.js';
import { validPlace, type SavedPlace, type StepPlace } from './stepper.js';

export function usePlace(
  model: Model,
  saved: SavedPlace | null | undefined,
  save: ((place: StepPlace) => void) | undefined,
): [StepPlace | undefined, (place: StepPlace) => void] {
  const [place, setPlace] = useState<StepPlace | undefined>(() => validPlace(model, saved));
  const touched = useRef(false);
  // The saved place may arrive after the first render (a query); take it unless the reader has moved already.
  useEffect(() => {
    if (!touched.current) setPlace(validPlace(model, saved));
  }, [model, saved?.row, saved?.unit]);
  useEffect(() => {
    setPlace((p) => validPlace(model, p));
  }, [model]);
  useEffect(() => {
    if (!touched.current || !place || !save) return;
    const t = setTimeout(() => save(place), 400);
    return () => clearTimeout(t);
  }, [place?.row, place?.unit]);
  const move = useCallback((p: StepPlace) => {
    touched.current = true;
    setPlace(p);
  }, []);
  return [place, move];
}

/** A place kept in this browser only. */
export function localPlace(key: string): { saved: StepPlace | null; save(place: StepPlace): void } {
  let saved: StepPlace | null = null;
  try {
    saved = JSON.parse(localStorage.getItem(key) ?? 'null') as StepPlace | null;
  } catch {
    saved = null;
  }
  return { saved, save: (place) => localStorage.setItem(key, JSON.stringify(place)) };
}
