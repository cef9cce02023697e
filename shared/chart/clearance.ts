/**
 * Whether a small label would touch a bead. In a round the cells of an
 * increase are narrow and beads of the next round can cross them, so a
 * number set at a cell's centre may land on a bead, where it can be read
 * neither as a number nor as the bead's letter. Beads are kept in a grid of
 * one unit side, so a chart of thousands of beads asks only a few of them.
 */
import type { BeadPrim } from './scene-types.js';

export interface Box {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

interface Capsule {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  /** Half the thickness plus half the outline. */
  radius: number;
}

function capsuleOf(bead: BeadPrim): Capsule {
  const rad = (bead.angle * Math.PI) / 180;
  // The axis between the centres of the two round ends.
  const half = Math.max(0, bead.length - bead.thickness) / 2;
  const dx = Math.cos(rad) * half;
  const dy = Math.sin(rad) * half;
  return {
    ax: bead.x - dx,
    ay: bead.y - dy,
    bx: bead.x + dx,
    by: bead.y + dy,
    radius: (bead.thickness + bead.strokeWidth) / 2,
  };
}

const clamp = (v: number, lo: number, hi: number): number => Math.min(hi, Math.max(lo, v));

function pointToSegment(px: number, py: number, c: Capsule): number {
  const vx = c.bx - c.ax;
  const vy = c.by - c.ay;
  const len2 = vx * vx + vy * vy;
  const s = len2 === 0 ? 0 : clamp(((px - c.ax) * vx + (py - c.ay) * vy) / len2, 0, 1);
  return Math.hypot(px - (c.ax + s * vx), py - (c.ay + s * vy));
}

const pointToBox = (x: number, y: number, b: Box): number =>
  Math.hypot(x - clamp(x, b.left, b.right), y - clamp(y, b.top, b.bottom));

/** Whether the segment a-b crosses the box (Liang-Barsky clipping). */
function crossesBox(c: Capsule, b: Box): boolean {
  let lo = 0;
  let hi = 1;
  const dx = c.bx - c.ax;
  const dy = c.by - c.ay;
  for (const [p, q] of [
    [-dx, c.ax - b.left],
    [dx, b.right - c.ax],
    [-dy, c.ay - b.top],
    [dy, b.bottom - c.ay],
  ] as const) {
    if (p === 0) {
      if (q < 0) return false;
    } else if (p < 0) lo = Math.max(lo, q / p);
    else hi = Math.min(hi, q / p);
  }
  return lo <= hi;
}

/** Shortest distance between the capsule's axis and the box. */
function axisToBox(c: Capsule, b: Box): number {
  if (crossesBox(c, b)) return 0;
  return Math.min(
    pointToBox(c.ax, c.ay, b),
    pointToBox(c.bx, c.by, b),
    ...[
      [b.left, b.top],
      [b.right, b.top],
      [b.left, b.bottom],
      [b.right, b.bottom],
    ].map(([x, y]) => pointToSegment(x!, y!, c)),
  );
}

/** A test of boxes against every bead, through a grid of `cell`-sized squares. */
export function beadClearance(beads: readonly BeadPrim[], cell: number): (box: Box) => boolean {
  const grid = new Map<string, Capsule[]>();
  const cellsOf = (b: Box): string[] => {
    const keys: string[] = [];
    for (let i = Math.floor(b.left / cell); i <= Math.floor(b.right / cell); i++)
      for (let j = Math.floor(b.top / cell); j <= Math.floor(b.bottom / cell); j++) keys.push(`${i},${j}`);
    return keys;
  };
  for (const bead of beads) {
    const c = capsuleOf(bead);
    const r = c.radius;
    const around = {
      left: Math.min(c.ax, c.bx) - r,
      right: Math.max(c.ax, c.bx) + r,
      top: Math.min(c.ay, c.by) - r,
      bottom: Math.max(c.ay, c.by) + r,
    };
    for (const key of cellsOf(around)) {
      const list = grid.get(key);
      if (list) list.push(c);
      else grid.set(key, [c]);
    }
  }
  /** True when the box stays clear of every bead. */
  return (box) => cellsOf(box).every((key) => (grid.get(key) ?? []).every((c) => axisToBox(c, box) >= c.radius));
}
