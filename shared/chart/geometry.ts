/**
 * Model coordinates (unit sides, y up) to page millimetres (y down), the
 * fixed rounding every number in the scene goes through, and unit corners
 * found from the beads that meet there.
 */
import type { Corner, Model, Place, Point, Unit } from '../model.js';

/** Two decimals: 0.01 mm is far below what a printer or a screen shows. */
export const round2 = (n: number): number => {
  const r = Math.round(n * 100) / 100;
  return Object.is(r, -0) ? 0 : r;
};

const FRACTIONS = Array.from({ length: 100 }, (_, f) =>
  f === 0 ? '' : `.${f < 10 ? `0${f}` : f % 10 === 0 ? f / 10 : f}`,
);

/**
 * `String(round2(n))`, built from whole hundredths: formatting a small
 * integer is several times faster than formatting a double, and a chart
 * has tens of thousands of numbers.
 */
export function round2Text(n: number): string {
  const cents = Math.round(n * 100);
  if (!Number.isSafeInteger(cents)) return String(round2(n));
  const abs = Math.abs(cents);
  return `${cents < 0 ? '-' : ''}${Math.floor(abs / 100)}${FRACTIONS[abs % 100]!}`;
}

export interface PageTransform {
  /** mm per unit side. */
  scale: number;
  /** Page position of the model's (minX, maxY) corner. */
  left: number;
  top: number;
  minX: number;
  maxY: number;
}

export const toPage = (t: PageTransform, p: Point): Point => ({
  x: t.left + (p.x - t.minX) * t.scale,
  y: t.top + (t.maxY - p.y) * t.scale,
});

export function pointPath(points: readonly Point[], closed: boolean): string {
  // Joined rather than appended: the scene keeps every path, and a string built with `+=` is kept as a rope.
  const parts = points.map((p, i) => `${i === 0 ? 'M' : 'L'}${round2Text(p.x)} ${round2Text(p.y)}`);
  if (closed) parts.push('Z');
  return parts.join(' ');
}

const CORNER_PLACES: Record<Corner, [Place, Place]> = {
  'base|far': ['base', 'far'],
  'far|top': ['far', 'top'],
  'top|near': ['top', 'near'],
  'near|base': ['near', 'base'],
};

export const corners: readonly Corner[] = ['base|far', 'far|top', 'top|near', 'near|base'];

/** The junction where the unit's beads at the corner's two places meet, if both are there. */
export function cornerJunction(model: Model, unit: Unit, corner: Corner): number | null {
  const [pa, pb] = CORNER_PLACES[corner];
  const a = unit.places[pa];
  const b = unit.places[pb];
  if (a === null || a === undefined || b === null || b === undefined) return null;
  const ja = model.beads[a]?.junctions;
  const jb = model.beads[b]?.junctions;
  if (!ja || !jb) return null;
  for (const j of ja) if (jb.includes(j)) return j;
  return null;
}

/**
 * The cell outline on the page. In a round, cells are not squares, so the
 * four corner junctions give the outline when every place is built;
 * elsewhere (and for a failed unit) it is the unit square turned by the
 * unit's angle, which also keeps a tube's closing unit from reaching across
 * the unrolled chart to its far bead at the seam.
 */
export function cellOutline(model: Model, unit: Unit, t: PageTransform): Point[] {
  if (model.layout.kind === 'round') {
    const found = corners.map((c) => cornerJunction(model, unit, c));
    if (found.every((j) => j !== null)) return found.map((j) => toPage(t, model.junctions[j as number]!));
  }
  const rad = (unit.angle * Math.PI) / 180;
  const cos = Math.cos(rad) * 0.5;
  const sin = Math.sin(rad) * 0.5;
  return [
    toPage(t, { x: unit.x + cos + sin, y: unit.y + sin - cos }),
    toPage(t, { x: unit.x + cos - sin, y: unit.y + sin + cos }),
    toPage(t, { x: unit.x - cos - sin, y: unit.y - sin + cos }),
    toPage(t, { x: unit.x - cos + sin, y: unit.y - sin - cos }),
  ];
}

export const unitVector = (from: Point, to: Point): Point => {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const len = Math.hypot(dx, dy);
  return len === 0 ? { x: 1, y: 0 } : { x: dx / len, y: dy / len };
};

/** A triangle with its tip at `tip`, pointing along the unit vector `dir`. */
export function arrowhead(tip: Point, dir: Point, size: number): string {
  const back = { x: tip.x - dir.x * size, y: tip.y - dir.y * size };
  const half = size * 0.55;
  return pointPath(
    [
      tip,
      { x: back.x - dir.y * half, y: back.y + dir.x * half },
      { x: back.x + dir.y * half, y: back.y - dir.x * half },
    ],
    true,
  );
}

/**
 * On an unrolled tube the closing unit's far side is drawn at the seam, a
 * whole circumference away; this gives the copy of `p` next to `ref`.
 */
export function nearImage(model: Model, p: Point, ref: Point): Point {
  if (model.layout.kind !== 'tube') return p;
  const width = model.layout.bounds.maxX - model.layout.bounds.minX;
  if (p.x - ref.x > 0.75) return { x: p.x - width, y: p.y };
  if (ref.x - p.x > 0.75) return { x: p.x + width, y: p.y };
  return p;
}
