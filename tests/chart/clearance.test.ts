/**
 * Unit numbers stay off beads: the clearance test against closed-form
 * distances, and every example's numbered chart checked by sampling each
 * number's box against every capsule with a separate, brute-force distance.
 */
import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { beadClearance } from '../../shared/chart/clearance.js';
import { buildScene } from '../../shared/chart/scene.js';
import type { BeadPrim, TextPrim } from '../../shared/chart/scene-types.js';
import { compile } from '../../shared/compile.js';

const bead = (x: number, y: number, angle: number): BeadPrim => ({
  kind: 'bead',
  id: 'ff-bead-0',
  bead: 0,
  unit: 0,
  row: 1,
  x,
  y,
  angle,
  length: 6,
  thickness: 2,
  fill: '#000000',
  stroke: '#000000',
  strokeWidth: 0,
  gap: false,
});

describe('clearance against closed forms', () => {
  // A horizontal capsule 6 long, 2 thick at (10, 10): its axis runs from x 8 to x 12, radius 1.
  const clear = beadClearance([bead(10, 10, 0)], 8);
  test('a box across the capsule touches it, one beside it does not', () => {
    expect(clear({ left: 9, right: 11, top: 9.5, bottom: 10.5 })).toBe(false);
    expect(clear({ left: 9, right: 11, top: 11.1, bottom: 12 })).toBe(true);
    expect(clear({ left: 9, right: 11, top: 10.9, bottom: 12 })).toBe(false);
  });
  test('past a round end, the distance is to the end centre (Pythagoras: 3-4-5)', () => {
    // Corner (15, 14) is 5 from the end centre (12, 10); the radius is 1.
    expect(clear({ left: 15, right: 16, top: 14, bottom: 15 })).toBe(true);
    // Corner (12.6, 10.6) is about 0.85 from (12, 10): inside the round end.
    expect(clear({ left: 12.6, right: 13, top: 10.6, bottom: 11 })).toBe(false);
  });
  test('a turned capsule: at 90 degrees it stands upright', () => {
    const upright = beadClearance([bead(10, 10, 90)], 8);
    expect(upright({ left: 9.5, right: 10.5, top: 7.5, bottom: 8 })).toBe(false);
    expect(upright({ left: 12, right: 13, top: 9, bottom: 11 })).toBe(true);
  });
});

/** Brute force: the least distance from sample points of the box to the capsule's axis. */
function touches(text: TextPrim, b: BeadPrim): boolean {
  const width = text.text.length * 0.6 * text.size;
  const height = text.size * 0.73;
  const rad = (b.angle * Math.PI) / 180;
  const half = (b.length - b.thickness) / 2;
  for (let i = 0; i <= 20; i++)
    for (let j = 0; j <= 20; j++) {
      const px = text.x - width / 2 + (width * i) / 20;
      const py = text.y - height + (height * j) / 20;
      // Position along the axis, clamped to the segment.
      const along = Math.max(-half, Math.min(half, (px - b.x) * Math.cos(rad) + (py - b.y) * Math.sin(rad)));
      const d = Math.hypot(px - (b.x + along * Math.cos(rad)), py - (b.y + along * Math.sin(rad)));
      if (d < (b.thickness + b.strokeWidth) / 2 - 0.01) return true;
    }
  return false;
}

describe.each(['heron-band', 'sea-pink-doily', 'moss-coaster'])('%s with unit numbers', (name) => {
  const model = compile(readFileSync(`examples/${name}.ffp`, 'utf8')).value.model;
  const scene = buildScene(model, { numbers: true }).value;
  const beads = scene.items.filter((i): i is BeadPrim => i.kind === 'bead');
  const numbers = scene.items.filter((i): i is TextPrim => i.kind === 'text' && i.role === 'unit-number');

  test('no number touches a bead', () => {
    expect(numbers.length).toBeGreaterThan(0);
    for (const n of numbers) expect(beads.filter((b) => touches(n, b)).map((b) => [n.id, b.id])).toEqual([]);
  });

  test('a flat piece keeps every number; a round leaves out only the first units and a few narrow cells', () => {
    const units = model.units.length;
    if (model.layout.kind === 'flat') expect(numbers).toHaveLength(units);
    else {
      expect(numbers.length).toBeLessThan(units - model.rows.length + 1);
      expect(numbers.length).toBeGreaterThan((units - model.rows.length) * 0.6);
    }
  });
});
