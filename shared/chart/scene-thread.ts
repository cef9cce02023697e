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

export function threadOverlay(model: Model, row: number, t: PageTransform, theme: Theme): Result<Primitive[]> {
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
    const slot = k % 2 === 0 ? NUMBER_SLOT : 1 - NUMBER_SLOT;
    const side = { x: -(p1.y - p0.y) / len, y: (p1.x - p0.x) / len };
    const box = Math.abs(side.x) * digits * ADVANCE * size + Math.abs(side.y) * CAP_HEIGHT * size + 0.3;
    const aside = Math.floor(k / 2) * box;
    out.push({
      kind: 'text',
      id: `ff-thread-${i + 1}-n`,
      role: 'thread-number',
      x: round2(p0.x + (p1.x - p0.x) * slot + side.x * aside),
      y: round2(p0.y + (p1.y - p0.y) * slot + side.y * aside + (size * CAP_HEIGHT) / 2),
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
