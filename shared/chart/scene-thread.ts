/**
 * The thread path of one row, drawn over the beads: one segment per bead
 * pass, told apart by line style (pick-up solid, closing dashed, positioning
 * dotted) as well as colour so the print theme keeps them apart, and
 * numbered in the order the thread makes them.
 */
import type { Diagnostic, Result } from '../diagnostic.js';
import { fileStart } from '../diagnostic.js';
import type { Model, PassKind, Point } from '../model.js';
import { pointPath, round2, toPage, type PageTransform } from './geometry.js';
import { ADVANCE, CAP_HEIGHT } from './scene-beads.js';
import type { Primitive } from './scene-types.js';
import type { Theme } from './themes.js';

const dashFor = (kind: PassKind, scale: number): string | undefined =>
  kind === 'pickup'
    ? undefined
    : kind === 'close'
      ? `${round2(0.1 * scale)} ${round2(0.05 * scale)}`
      : `${round2(0.03 * scale)} ${round2(0.05 * scale)}`;

/** Where along a bead its passes' numbers go: off the middle, where the bead's key letter is. */
const NUMBER_SLOT = 0.2;
/** The halo's stroke width for a number of font size 1: half of it shows outside the glyphs. */
const HALO = 0.3;

interface Extent {
  halfWidth: number;
  halfHeight: number;
}
/** A pass number's glyph box on the page, by its centre. */
export type NumberBox = Point & Extent;

const overlaps = (a: NumberBox, b: NumberBox, gap: number): boolean =>
  Math.abs(a.x - b.x) < a.halfWidth + b.halfWidth + gap && Math.abs(a.y - b.y) < a.halfHeight + b.halfHeight + gap;

const NO_BOXES: readonly NumberBox[] = [];

/**
 * The boxes a number must keep clear of, filed by square cells of the page
 * so that a look-up reads only the boxes near it: a round of 5,000 beads
 * has as many key letters, and a row's hundreds of numbers each try
 * several places. Two cells may share a key far off the page; that only
 * adds boxes to compare, never hides one.
 */
class BoxGrid {
  private readonly cells = new Map<number, NumberBox[]>();

  constructor(
    private readonly cell: number,
    private readonly gap: number,
  ) {}

  /** Calls `f` with each cell that the box, widened by the gap, touches; stops when `f` says so. */
  private each(b: NumberBox, f: (key: number) => boolean): boolean {
    const c = this.cell;
    const [x0, x1] = [Math.floor((b.x - b.halfWidth - this.gap) / c), Math.floor((b.x + b.halfWidth + this.gap) / c)];
    const [y0, y1] = [Math.floor((b.y - b.halfHeight - this.gap) / c), Math.floor((b.y + b.halfHeight + this.gap) / c)];
    for (let ix = x0; ix <= x1; ix++) for (let iy = y0; iy <= y1; iy++) if (!f(ix * 65536 + iy)) return false;
    return true;
  }

  add(b: NumberBox): void {
    this.each(b, (key) => {
      const list = this.cells.get(key);
      if (list) list.push(b);
      else this.cells.set(key, [b]);
      return true;
    });
  }

  isClear(b: NumberBox): boolean {
    return this.each(b, (key) => (this.cells.get(key) ?? NO_BOXES).every((o) => !overlaps(b, o, this.gap)));
  }
}

/**
 * Where the number of a bead's `k`-th pass goes (its centre): its own place
 * first (the k-th of near one end, near the other, then a box aside), and
 * where that would cover a key letter or a number already placed, as on a
 * round where beads meet at angles, the first clear one of the places one
 * to three boxes further aside, then the same at the bead's other end,
 * nearer its ends, and nearer its middle. If none is clear, its own place.
 */
function numberSpot(
  p0: Point,
  p1: Point,
  side: Point,
  k: number,
  box: number,
  extent: Extent,
  placed: BoxGrid,
): NumberBox {
  const own = k % 2 === 0 ? NUMBER_SLOT : 1 - NUMBER_SLOT;
  const aside = Math.floor(k / 2) * box;
  let first: NumberBox | undefined;
  for (const slot of [own, 1 - own, own / 2, 1 - own / 2, 0.35, 0.65])
    for (const shift of [0, box, -box, 2 * box, -2 * box, 3 * box, -3 * box]) {
      const spot = {
        x: p0.x + (p1.x - p0.x) * slot + side.x * (aside + shift),
        y: p0.y + (p1.y - p0.y) * slot + side.y * (aside + shift),
        ...extent,
      };
      first ??= spot;
      if (placed.isClear(spot)) return spot;
    }
  return first!;
}

/** The bead's two ends on the page, the `from` end first. */
function ends(model: Model, beadId: number, from: number, t: PageTransform): [Point, Point] | null {
  const bead = model.beads[beadId];
  const start = model.junctions[from];
  if (!bead || !start) return null;
  const rad = (bead.angle * Math.PI) / 180;
  const half = bead.length / 2;
  const a = { x: bead.x - Math.cos(rad) * half, y: bead.y - Math.sin(rad) * half };
  const b = { x: bead.x + Math.cos(rad) * half, y: bead.y + Math.sin(rad) * half };
  const nearA = Math.hypot(a.x - start.x, a.y - start.y) <= Math.hypot(b.x - start.x, b.y - start.y);
  return nearA ? [toPage(t, a), toPage(t, b)] : [toPage(t, b), toPage(t, a)];
}

/** The key letters' glyph boxes, which pass numbers keep clear of. */
export function letterBoxes(items: readonly Primitive[]): NumberBox[] {
  const boxes: NumberBox[] = [];
  for (const p of items) {
    if (p.kind !== 'bead' || !p.label) continue;
    const { x, y, size, text } = p.label;
    const halfHeight = (CAP_HEIGHT * size) / 2;
    boxes.push({ x, y: y - halfHeight, halfWidth: (text.length * ADVANCE * size) / 2, halfHeight });
  }
  return boxes;
}

export function threadOverlay(
  model: Model,
  row: number,
  t: PageTransform,
  theme: Theme,
  letters: readonly NumberBox[],
): Result<Primitive[]> {
  const info = model.rows.find((r) => r.row === row);
  if (!info) {
    const diagnostic: Diagnostic = {
      severity: 'error',
      id: 'thread-row',
      message: `--thread ${row}: the pattern has no row ${row} (it has rows 1 to ${model.rows.length}).`,
      range: fileStart,
    };
    return { value: [], diagnostics: [diagnostic] };
  }
  const units = new Set(info.units);
  const passes = model.thread.filter((p) => units.has(p.unit));
  const seen = new Map<number, number>();
  const width = round2(Math.max(0.25, 0.05 * t.scale));
  const size = round2(Math.max(1.2, 0.16 * t.scale));
  const digits = String(passes.length).length;
  const out: Primitive[] = [];
  const placed = new BoxGrid(4 * size, HALO * size);
  for (const l of letters) placed.add(l);
  passes.forEach((pass, i) => {
    const e = ends(model, pass.bead, pass.from, t);
    if (!e) return;
    // A bead passed more than once gets each later pass beside the earlier ones.
    const k = seen.get(pass.bead) ?? 0;
    seen.set(pass.bead, k + 1);
    const [a, b] = e;
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    const shift = (k % 2 === 0 ? 1 : -1) * Math.ceil(k / 2) * 0.08 * t.scale;
    const n = { x: (-(b.y - a.y) / len) * shift, y: ((b.x - a.x) / len) * shift };
    const from = { x: a.x + n.x, y: a.y + n.y };
    const to = { x: b.x + n.x, y: b.y + n.y };
    const data = { unit: pass.unit, pass: i + 1, kind: pass.kind };
    const dash = dashFor(pass.kind, t.scale);
    out.push({
      kind: 'path',
      id: `ff-thread-${i + 1}`,
      role: 'thread',
      d: pointPath([from.x, from.y, to.x, to.y], false),
      fill: null,
      stroke: theme.thread[pass.kind],
      strokeWidth: width,
      ...(dash === undefined ? {} : { dash }),
      data,
    });
    // Measured from the same end of the bead whichever way the thread goes, so the passes of one bead
    // get different places: near one end, near the other, then the same a number's box aside, and so on.
    const [p0, p1] = Math.abs(b.x - a.x) > 1e-6 ? (a.x < b.x ? [a, b] : [b, a]) : a.y < b.y ? [a, b] : [b, a];
    const side = { x: -(p1.y - p0.y) / len, y: (p1.x - p0.x) / len };
    const box = Math.abs(side.x) * digits * ADVANCE * size + Math.abs(side.y) * CAP_HEIGHT * size + 0.3;
    const extent = { halfWidth: (String(i + 1).length * ADVANCE * size) / 2, halfHeight: (CAP_HEIGHT * size) / 2 };
    const spot = numberSpot(p0, p1, side, k, box, extent, placed);
    placed.add(spot);
    out.push({
      kind: 'text',
      id: `ff-thread-${i + 1}-n`,
      role: 'thread-number',
      x: round2(spot.x),
      y: round2(spot.y + extent.halfHeight),
      size,
      text: String(i + 1),
      color: theme.thread[pass.kind],
      anchor: 'middle',
      bold: true,
      halo: { color: theme.halo, width: round2(size * HALO) },
      data,
    });
  });
  return { value: out, diagnostics: [] };
}
