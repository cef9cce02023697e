/**
 * Coordinates for every junction, bead and unit, in unit sides, x right and
 * y up (row 1 at the bottom). Flat and tube pieces sit on a square grid (a
 * tube unrolled, its seam at x = 0, which is also x = circumference); rounds
 * sit on rings round an open centre, each unit over its base bead.
 */
import type { Result } from './diagnostic.js';
import type { LayoutInfo } from './model.js';
import { BASE, beadAt, cornerAt, type Weave, type WeaveUnit } from './weave-net.js';
import { beadSize, unitSideMm } from './bead-sizes.js';

export interface Geometry {
  jx: number[];
  jy: number[];
  bx: number[];
  by: number[];
  bAngle: number[];
  bLength: number[];
  bGap: boolean[];
  ux: number[];
  uy: number[];
  uAngle: number[];
  info: Omit<LayoutInfo, 'beadMm' | 'unitMm' | 'widthMm' | 'heightMm'>;
}

/** Drawn length of the short bead under a round increase. */
export const GAP_BEAD_LENGTH = 0.35;
const TAU = 2 * Math.PI;
const deg = (rad: number): number => ((((rad * 180) / Math.PI) % 360) + 360) % 360;
const ccw = (a: number, b: number): number => (((b - a) % TAU) + TAU) % TAU;
/** The angle midway between two, along the shorter way round (a bead spans less than half a ring). */
const between = (a: number, b: number): number => (ccw(a, b) <= Math.PI ? a + ccw(a, b) / 2 : b + ccw(b, a) / 2);

function blank(w: Weave): Geometry {
  const J = w.junctionCount;
  const B = w.beadOwner.length;
  const U = w.units.length;
  return {
    jx: new Array<number>(J).fill(NaN),
    jy: new Array<number>(J).fill(0),
    bx: new Array<number>(B).fill(0),
    by: new Array<number>(B).fill(0),
    bAngle: new Array<number>(B).fill(0),
    bLength: new Array<number>(B).fill(1),
    bGap: new Array<boolean>(B).fill(false),
    ux: new Array<number>(U).fill(0),
    uy: new Array<number>(U).fill(0),
    uAngle: new Array<number>(U).fill(0),
    info: { kind: w.layout, bounds: { minX: 0, minY: 0, maxX: 0, maxY: 0 } },
  };
}

/** The sides of a grid cell: x of the near and far sides, y of the base and top. */
function cell(u: WeaveUnit): [nearX: number, farX: number, y0: number] {
  return u.heading === 1 ? [u.col, u.col + 1, u.rowIndex] : [u.col + 1, u.col, u.rowIndex];
}

function gridLayout(w: Weave, g: Geometry): void {
  const circumference = w.layout === 'tube' ? Math.max(1, w.rows[0]?.units.length ?? 1) : 0;
  const wrap = (x: number): number => (circumference ? ((x % circumference) + circumference) % circumference : x);
  w.units.forEach((u, id) => {
    const [nearX, farX, y0] = cell(u);
    g.ux[id] = (nearX + farX) / 2;
    g.uy[id] = y0 + 0.5;
    if (u.failed) return;
    for (let k = 0; k < 4; k++) {
      const j = cornerAt(w, u.id, k);
      if (Number.isNaN(g.jx[j]!)) {
        // Corners 0 and 1 lie on the far side, 1 and 2 on the top.
        g.jx[j] = wrap(k < 2 ? farX : nearX);
        g.jy[j] = k === 1 || k === 2 ? y0 + 1 : y0;
      }
    }
    for (let p = 0; p < 4; p++) {
      const b = beadAt(w, u.id, p);
      if (w.beadOwner[b] !== id) continue;
      // Places 0 and 2 (base, top) run along x; 1 and 3 (far, near) up the sides.
      const across = p % 2 === 0;
      g.bx[b] = across ? (nearX + farX) / 2 : p === 1 ? farX : nearX;
      g.by[b] = p === 0 ? y0 : p === 2 ? y0 + 1 : y0 + 0.5;
      g.bAngle[b] = across ? 0 : 90;
    }
  });
  if (circumference) g.info.seamX = 0;
}

/** Each unit's angle round the centre: over its base bead, or spread evenly between its based neighbours. */
function unitAngles(w: Weave, ids: readonly number[], ja: readonly number[], k: number): number[] {
  const n = ids.length;
  const theta = new Array<number>(n).fill(NaN);
  if (k === 0) return theta.map((_, i) => (TAU * (i + 0.5)) / n);
  ids.forEach((id, i) => {
    const u = w.units[id]!;
    const b = beadAt(w, u.id, BASE);
    const a = w.beadEnds[2 * b]!;
    const z = w.beadEnds[2 * b + 1]!;
    if (b >= 0 && a !== z && !Number.isNaN(ja[a]!) && !Number.isNaN(ja[z]!)) theta[i] = between(ja[a]!, ja[z]!);
  });
  const based = theta.map((t, i) => (Number.isNaN(t) ? -1 : i)).filter((i) => i >= 0);
  if (based.length === 0) return theta.map((_, i) => (TAU * (i + 0.5)) / n);
  for (let bi = 0; bi < based.length; bi++) {
    const from = based[bi]!;
    const to = based[(bi + 1) % based.length]!;
    const gap = (to - from + n) % n || n;
    const span = to === from ? TAU : ccw(theta[from]!, theta[to]!);
    for (let s = 1; s < gap; s++) theta[(from + s) % n] = theta[from]! + (span * s) / gap;
  }
  return theta;
}

function roundLayout(w: Weave, g: Geometry): void {
  const first = w.rows[0]?.units.length ?? 0;
  const r0 = Math.max(0.5, first / TAU);
  g.info.centerRadius = r0;
  const ja = new Array<number>(w.junctionCount).fill(NaN);
  const jr = new Array<number>(w.junctionCount).fill(0);
  const set = (j: number, angle: number, radius: number): void => {
    if (j >= 0 && Number.isNaN(ja[j]!)) {
      ja[j] = angle;
      jr[j] = radius;
    }
  };
  w.rows.forEach((row, k) => {
    const ids = row.units;
    const theta = unitAngles(w, ids, ja, k);
    const n = ids.length;
    const closed = n > 1 && ids.every((id) => !w.units[id]!.failed);
    ids.forEach((id, i) => {
      const u = w.units[id]!;
      const t = theta[i]!;
      const next = i + 1 < n ? theta[i + 1]! : closed ? theta[0]! + TAU : t + TAU / Math.max(n, 1);
      const prev = i > 0 ? theta[i - 1]! : closed ? theta[n - 1]! - TAU : t - TAU / Math.max(n, 1);
      const rm = k + 0.5 + r0;
      g.ux[id] = rm * Math.cos(t);
      g.uy[id] = rm * Math.sin(t);
      g.uAngle[id] = deg(t + Math.PI / 2);
      if (u.failed) return;
      const lo = k + r0;
      const hi = k + 1 + r0;
      const after = k === 0 ? (TAU * (i + 1)) / n : t + ccw(t, next) / 2;
      const before = k === 0 ? (TAU * i) / n : prev + ccw(prev, t) / 2;
      set(cornerAt(w, u.id, 3), before, lo);
      set(cornerAt(w, u.id, 0), after, lo);
      set(cornerAt(w, u.id, 1), after, hi);
      set(cornerAt(w, u.id, 2), before, hi);
    });
  });
  for (let j = 0; j < w.junctionCount; j++) {
    g.jx[j] = jr[j]! * Math.cos(ja[j]!);
    g.jy[j] = jr[j]! * Math.sin(ja[j]!);
  }
  for (let b = 0; b < w.beadOwner.length; b++) {
    const a = w.beadEnds[2 * b]!;
    const z = w.beadEnds[2 * b + 1]!;
    if (a === z) {
      g.bx[b] = g.jx[a]!;
      g.by[b] = g.jy[a]!;
      g.bAngle[b] = deg(ja[a]! + Math.PI / 2);
      g.bLength[b] = GAP_BEAD_LENGTH;
      g.bGap[b] = true;
      continue;
    }
    const dx = g.jx[z]! - g.jx[a]!;
    const dy = g.jy[z]! - g.jy[a]!;
    g.bx[b] = (g.jx[a]! + g.jx[z]!) / 2;
    g.by[b] = (g.jy[a]! + g.jy[z]!) / 2;
    g.bAngle[b] = deg(Math.atan2(dy, dx)) % 180;
    g.bLength[b] = Math.hypot(dx, dy);
  }
}

function bounds(w: Weave, g: Geometry): void {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let j = 0; j < g.jx.length; j++) {
    minX = Math.min(minX, g.jx[j]!);
    maxX = Math.max(maxX, g.jx[j]!);
    minY = Math.min(minY, g.jy[j]!);
    maxY = Math.max(maxY, g.jy[j]!);
  }
  if (g.jx.length === 0) minX = minY = maxX = maxY = 0;
  if (w.layout === 'tube') maxX = Math.max(maxX, w.rows[0]?.units.length ?? 0);
  g.info.bounds = { minX, minY, maxX, maxY };
}

/**
 * Finished size: the span of the junctions in unit sides times one unit side
 * in mm, plus one bead diameter for the outer beads' thickness. A tube's width
 * is its circumference unrolled (no outer bead on the seam: it wraps round).
 */
export function sizeInMm(
  info: Geometry['info'],
  layout: Weave['layout'],
  beads: { size: string; shape: 'round' | 'cylinder' },
): LayoutInfo {
  const b = beadSize(beads.size, beads.shape);
  const unitMm = unitSideMm(b);
  const { minX, minY, maxX, maxY } = info.bounds;
  const tenth = (mm: number): number => Math.round(mm * 10) / 10;
  const widthMm = layout === 'tube' ? (maxX - minX) * unitMm : (maxX - minX) * unitMm + b.diameterMm;
  const heightMm = (maxY - minY) * unitMm + b.diameterMm;
  return {
    ...info,
    beadMm: { diameter: b.diameterMm, length: b.lengthMm },
    unitMm,
    widthMm: tenth(widthMm),
    heightMm: tenth(heightMm),
  };
}

/** Lays out the net. Pure arithmetic on the weave; every junction and bead of a built unit gets a place. */
export function layout(
  w: Weave,
  beads: { size: string; shape: 'round' | 'cylinder' },
): Result<Geometry & { size: LayoutInfo }> {
  const g = blank(w);
  if (w.layout === 'round') roundLayout(w, g);
  else gridLayout(w, g);
  for (let j = 0; j < g.jx.length; j++) if (Number.isNaN(g.jx[j]!)) g.jx[j] = 0;
  bounds(w, g);
  return { value: { ...g, size: sizeInMm(g.info, w.layout, beads) }, diagnostics: [] };
}
