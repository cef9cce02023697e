/**
 * The thread overlay's pass numbers on a real example: each stands off the
 * middle of its bead (where the key letter is) and no two numbers overlap,
 * even where the thread passes a bead again.
 */
import { expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { buildScene } from '../../shared/chart/scene.js';
import type { BeadPrim, TextPrim } from '../../shared/chart/scene-types.js';
import { compile } from '../../shared/compile.js';

test.each([
  ['heron-band', 2],
  ['kestrel-fan', 4],
  ['reed-tube', 3],
])('%s row %i: pass numbers clear of the key letters and of each other', (name, row) => {
  const model = compile(readFileSync(`examples/${name}.ffp`, 'utf8')).value.model;
  const scene = buildScene(model, { thread: row }).value;
  const numbers = scene.items.filter((i): i is TextPrim => i.kind === 'text' && i.role === 'thread-number');
  const letters = scene.items.flatMap((i) => (i.kind === 'bead' && i.label ? [(i as BeadPrim).label!] : []));
  expect(numbers.length).toBeGreaterThan(4);
  // Centres of the glyph boxes: a number and a letter closer than half their widths added overlap.
  const centre = (t: { x: number; y: number; size: number }) => ({ x: t.x, y: t.y - (t.size * 0.73) / 2 });
  for (const n of numbers) {
    const c = centre(n);
    const halfWidth = (n.text.length * 0.6 * n.size) / 2;
    for (const l of letters) {
      const d = centre(l);
      const apart =
        Math.abs(c.x - d.x) >= halfWidth + 0.3 * l.size || Math.abs(c.y - d.y) >= (0.73 * (n.size + l.size)) / 2;
      expect(apart, `${n.id} on the letter at ${l.x},${l.y}`).toBe(true);
    }
  }
  // No two numbers' boxes overlap.
  for (const [i, n] of numbers.entries()) {
    for (const m of numbers.slice(i + 1)) {
      const apartX = Math.abs(n.x - m.x) >= (0.6 * (n.text.length * n.size + m.text.length * m.size)) / 2;
      const apartY = Math.abs(n.y - m.y) >= (0.73 * (n.size + m.size)) / 2;
      expect(apartX || apartY, `${n.id} on ${m.id}`).toBe(true);
    }
  }
});
