/**
 * The row stepper's arithmetic: a reader's place is a row and a unit's
 * 1-based position in that row (what a beader says: "row 4, unit 3"), and
 * stepping walks every unit in the order of work, row after row.
 */
import type { Model, Unit } from '../../../shared/model.js';

export interface StepPlace {
  row: number;
  unit: number;
}

/** A place as it is stored: either part may be missing. */
export interface SavedPlace {
  row?: number | null;
  unit?: number | null;
}

/** Unit ids in the order of work. */
export const workOrder = (model: Model): number[] => model.rows.flatMap((r) => r.units);

export function unitAt(model: Model, place: StepPlace): Unit | undefined {
  const id = model.rows.find((r) => r.row === place.row)?.units[place.unit - 1];
  return id === undefined ? undefined : model.units[id];
}

export const placeOf = (unit: Unit): StepPlace => ({ row: unit.row, unit: unit.index });

/** The first unit, or undefined for a pattern with no units at all. */
export function firstPlace(model: Model): StepPlace | undefined {
  const id = workOrder(model)[0];
  const unit = id === undefined ? undefined : model.units[id];
  return unit ? placeOf(unit) : undefined;
}

/** A saved place that no longer exists in this version falls back to the start of its row, then to the first unit. */
export function validPlace(model: Model, place: SavedPlace | null | undefined): StepPlace | undefined {
  if (place?.row != null) {
    if (place.unit != null && unitAt(model, { row: place.row, unit: place.unit }))
      return { row: place.row, unit: place.unit };
    if (unitAt(model, { row: place.row, unit: 1 })) return { row: place.row, unit: 1 };
  }
  return firstPlace(model);
}

/** One unit on (delta 1) or back (delta -1); stays put at either end. */
export function step(model: Model, place: StepPlace, delta: number): StepPlace {
  const order = workOrder(model);
  const current = unitAt(model, place);
  const at = current ? order.indexOf(current.id) : -1;
  const next = order[Math.min(order.length - 1, Math.max(0, at + delta))];
  const unit = next === undefined ? undefined : model.units[next];
  return unit ? placeOf(unit) : place;
}

export function rowRange(model: Model): { first: number; last: number } {
  const rows = model.rows.filter((r) => r.units.length > 0).map((r) => r.row);
  return { first: Math.min(...rows), last: Math.max(...rows) };
}

/** Beads picked up in this unit, and the beads it passes through to close and to move on. */
export function unitBeads(model: Model, unitId: number): { picked: number[]; passed: number[]; moveOn: number[] } {
  const s = model.steps.find((st) => st.unit === unitId);
  if (!s) return { picked: [], passed: [], moveOn: [] };
  return {
    picked: s.actions.filter((a) => a.kind === 'pickup').map((a) => a.bead),
    passed: s.actions.filter((a) => a.kind === 'pass').map((a) => a.bead),
    moveOn: s.moveOn,
  };
}
