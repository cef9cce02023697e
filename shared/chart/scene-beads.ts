/**
 * The piece itself: unit cells, bead capsules with their key letters, cue
 * arrowheads, failed-unit marks and unit numbers.
 */
import type { Bead, Model, Unit, UnitStep } from '../model.js';
import { labelColors } from './contrast.js';
import {
  arrowhead,
  cellOutline,
  cornerJunction,
  nearImage,
  pointPath,
  round2,
  roundPoints,
  toPage,
  unitVector,
  type PageTransform,
} from './geometry.js';
import type { Box } from './clearance.js';
import type { BeadPrim, PathPrim, PolygonPrim, TextPrim } from './scene-types.js';
import type { Theme } from './themes.js';

/** Capsule thickness as a share of a unit side: thin enough to leave the cell's hole open. */
export const BEAD_THICKNESS = 0.36;
/** Cap height of the font as a share of its size (JetBrains Mono: 730/1000, from memory). */
export const CAP_HEIGHT = 0.73;
/** Mono advance as a share of the font size (JetBrains Mono: 600/1000, from memory). */
export const ADVANCE = 0.6;

export function cells(model: Model, t: PageTransform, theme: Theme): PolygonPrim[] {
  const fill = theme.cell;
  if (fill === null) return [];
  return model.units.map((unit) => ({
    kind: 'polygon',
    id: `ff-cell-${unit.id}`,
    role: 'cell',
    points: roundPoints(cellOutline(model, unit, t)),
    fill,
    data: { unit: unit.id, row: unit.row },
  }));
}

export function beads(model: Model, t: PageTransform, theme: Theme): BeadPrim[] {
  const hex = new Map(model.palette.map((p) => [p.key, p.hex]));
  const ink = labelColors([...hex.values(), '#808080']);
  const thickness = round2(BEAD_THICKNESS * t.scale);
  const size = round2(thickness * 0.8);
  const toPrim = (bead: Bead): BeadPrim => {
    const fill = hex.get(bead.color) ?? '#808080';
    const centre = toPage(t, bead);
    const length = round2(bead.length * t.scale);
    const unit = model.units[bead.units[0] ?? 0];
    const x = round2(centre.x);
    // The label is in the literal, even when absent: added afterwards, it would give every bead a second object to hold it.
    return {
      kind: 'bead',
      id: `ff-bead-${bead.id}`,
      bead: bead.id,
      unit: unit?.id ?? 0,
      row: unit?.row ?? 0,
      x,
      y: round2(centre.y),
      // The model turns counter-clockwise with y up; the page has y down.
      angle: round2(-bead.angle),
      length,
      thickness,
      fill,
      stroke: theme.beadStroke,
      strokeWidth: theme.beadStrokeWidth,
      gap: bead.gap === true,
      // A letter needs about one em along the bead; gap beads are often shorter.
      label:
        length >= thickness * 1.3
          ? { text: bead.color, color: ink.get(fill)!, size, x, y: round2(centre.y + (size * CAP_HEIGHT) / 2) }
          : undefined,
    };
  };
  // Gap beads go last: they are short and sit where other beads' ends meet, which would hide them.
  const out: BeadPrim[] = [];
  for (const bead of model.beads) if (!bead.gap) out.push(toPrim(bead));
  for (const bead of model.beads) if (bead.gap) out.push(toPrim(bead));
  return out;
}

/** An arrowhead inside the cell by the start corner, pointing along the first new bead. */
function cue(model: Model, unit: Unit, step: UnitStep, t: PageTransform, theme: Theme): PolygonPrim | null {
  const junction = cornerJunction(model, unit, step.startCorner);
  const first = unit.places[step.firstPlace];
  if (junction === null || first === null) return null;
  const bead = model.beads[first];
  const corner = model.junctions[junction];
  if (!bead || !corner) return null;
  const other = model.junctions[bead.junctions[0] === junction ? bead.junctions[1] : bead.junctions[0]];
  if (!other) return null;
  const c = toPage(t, nearImage(model, corner, unit));
  const along = unitVector(c, toPage(t, nearImage(model, other, unit)));
  // Step off the bead toward the cell's middle, so the mark never covers a bead.
  const midX = t.left + (unit.x - t.minX) * t.scale - c.x;
  const midY = t.top + (t.maxY - unit.y) * t.scale - c.y;
  const dot = midX * along.x + midY * along.y;
  const inX = midX - dot * along.x;
  const inY = midY - dot * along.y;
  const inLength = Math.hypot(inX, inY);
  const ix = inLength === 0 ? 1 : inX / inLength;
  const iy = inLength === 0 ? 0 : inY / inLength;
  const size = 0.17 * t.scale;
  const tip = {
    x: c.x + ix * 0.3 * t.scale + along.x * (0.2 * t.scale + size),
    y: c.y + iy * 0.3 * t.scale + along.y * (0.2 * t.scale + size),
  };
  return {
    kind: 'polygon',
    id: `ff-cue-${unit.id}`,
    role: 'cue',
    points: roundPoints(arrowhead(tip, along, size)),
    fill: theme.cue,
    data: { unit: unit.id, row: unit.row },
  };
}

export function cues(model: Model, t: PageTransform, theme: Theme): PolygonPrim[] {
  const out: PolygonPrim[] = [];
  for (const step of model.steps) {
    const unit = model.units[step.unit];
    if (!step.cue || !unit || unit.failed) continue;
    const prim = cue(model, unit, step, t, theme);
    if (prim) out.push(prim);
  }
  return out;
}

/** A failed unit: its cell outlined and crossed in the failure colour. */
export function failures(model: Model, t: PageTransform, theme: Theme): PathPrim[] {
  return model.units
    .filter((unit) => unit.failed)
    .map((unit) => {
      const [ax, ay, bx, by, cx, cy, dx, dy] = cellOutline(model, unit, t) as [
        number,
        number,
        number,
        number,
        number,
        number,
        number,
        number,
      ];
      return {
        kind: 'path',
        id: `ff-failed-${unit.id}`,
        role: 'failed',
        d: `${pointPath([ax, ay, bx, by, cx, cy, dx, dy], true)} ${pointPath([ax, ay, cx, cy], false)} ${pointPath([bx, by, dx, dy], false)}`,
        fill: null,
        stroke: theme.failed,
        strokeWidth: round2(Math.max(0.3, 0.06 * t.scale)),
        dash: `${round2(0.12 * t.scale)} ${round2(0.06 * t.scale)}`,
        data: { unit: unit.id, row: unit.row },
      };
    });
}

/**
 * Unit numbers (1-based in the row) in each cell's hole; `skipFirst` leaves
 * room for a round's number. A number that would touch a bead (in a narrow
 * increase cell of a round) is left out rather than printed over the bead.
 */
export function unitNumbers(
  model: Model,
  t: PageTransform,
  theme: Theme,
  skipFirst: boolean,
  isClear: (box: Box) => boolean,
): TextPrim[] {
  const size = round2(0.24 * t.scale);
  const out: TextPrim[] = [];
  for (const unit of model.units) {
    if (skipFirst && unit.index === 1) continue;
    // The middle of the cell's corners: in a round the unit's own point can sit on its inner bead.
    const c = cellOutline(model, unit, t);
    const p = { x: (c[0]! + c[2]! + c[4]! + c[6]!) / 4, y: (c[1]! + c[3]! + c[5]! + c[7]!) / 4 };
    const text = String(unit.index);
    const y = round2(p.y + (size * CAP_HEIGHT) / 2);
    const half = (text.length * ADVANCE * size) / 2;
    if (!isClear({ left: p.x - half, right: p.x + half, top: y - size * CAP_HEIGHT, bottom: y })) continue;
    out.push({
      kind: 'text',
      id: `ff-unit-${unit.id}`,
      role: 'unit-number',
      x: round2(p.x),
      y,
      size,
      text,
      color: theme.muted,
      anchor: 'middle',
      bold: false,
      data: { unit: unit.id, row: unit.row },
    });
  }
  return out;
}
