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

/** Points as a flat list (x0, y0, x1, y1, ...): what the polygons of a scene hold, with no object per point. */
export type FlatPoints = number[];

/** The list rounded in place, as every number of a scene is. */
export function roundPoints(points: FlatPoints): FlatPoints {
  for (let i = 0; i < points.length; i++) points[i] = round2(points[i]!);
  return points;
}

export function pointPath(points: FlatPoints, closed: boolean): string {
  // Joined rather than appended: the scene keeps every path, and a string built with `+=` is kept as a rope.
  const parts: string[] = [];
  for (let i = 0; i < points.length; i += 2)
    parts.push(`${i === 0 ? 'M' : 'L'}${round2Text(points[i]!)} ${round2Text(points[i + 1]!)}`);
  if (closed) parts.push('Z');
  return parts.join(' ');
}

/** The two places whose beads meet at each corner, in the order of `corners`. */
const CORNER_PLACES: ReadonlyArray<readonly [Place, Place]> = [
  ['base', 'far'],
  ['far', 'top'],
  ['top', 'near'],
  ['near', 'base'],
];

export const corners: readonly Corner[] = ['base|far', 'far|top', 'top|near', 'near|base'];

function junctionAt(model: Model, unit: Unit, corner: number): number | null {
  const [pa, pb] = CORNER_PLACES[corner]!;
  const a = unit.places[pa];
  const b = unit.places[pb];
  if (a === null || a === undefined || b === null || b === undefined) return null;
  const ja = model.beads[a]?.junctions;
  const jb = model.beads[b]?.junctions;
  if (!ja || !jb) return null;
  if (ja[0] === jb[0] || ja[0] === jb[1]) return ja[0];
  if (ja[1] === jb[0] || ja[1] === jb[1]) return ja[1];
  return null;
}

/** The junction where the unit's beads at the corner's two places meet, if both are there. */
export const cornerJunction = (model: Model, unit: Unit, corner: Corner): number | null =>
  junctionAt(model, unit, corners.indexOf(corner));

/**
 * The cell outline on the page, corner by corner as a flat list. In a
 * round, cells are not squares, so the four corner junctions give the
 * outline when every place is built; elsewhere (and for a failed unit) it
 * is the unit square turned by the unit's angle, which also keeps a tube's
 * closing unit from reaching across the unrolled chart to its far bead at
 * the seam.
 */
export function cellOutline(model: Model, unit: Unit, t: PageTransform): FlatPoints {
  if (model.layout.kind === 'round') {
    const out: FlatPoints = [];
    for (let c = 0; c < 4; c++) {
      const j = junctionAt(model, unit, c);
      const p = j === null ? undefined : model.junctions[j];
      if (p === undefined) break;
      out.push(t.left + (p.x - t.minX) * t.scale, t.top + (t.maxY - p.y) * t.scale);
    }
    if (out.length === 8) return out;
  }
  const rad = (unit.angle * Math.PI) / 180;
  const cos = Math.cos(rad) * 0.5;
  const sin = Math.sin(rad) * 0.5;
  const x = (dx: number): number => t.left + (unit.x + dx - t.minX) * t.scale;
  const y = (dy: number): number => t.top + (t.maxY - unit.y - dy) * t.scale;
  return [
    x(cos + sin),
    y(sin - cos),
    x(cos - sin),
    y(sin + cos),
    x(-cos - sin),
    y(-sin + cos),
    x(-cos + sin),
    y(-sin - cos),
  ];
}

export const unitVector = (from: Point, to: Point): Point => {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const len = Math.hypot(dx, dy);
  return len === 0 ? { x: 1, y: 0 } : { x: dx / len, y: dy / len };
};

/** A triangle with its tip at `tip`, pointing along the unit vector `dir`. */
export function arrowhead(tip: Point, dir: Point, size: number): FlatPoints {
  const bx = tip.x - dir.x * size;
  const by = tip.y - dir.y * size;
  const half = size * 0.55;
  return [tip.x, tip.y, bx - dir.y * half, by + dir.x * half, bx + dir.y * half, by - dir.x * half];
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
