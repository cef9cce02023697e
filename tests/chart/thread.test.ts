/**
 * The thread overlay's pass numbers on a real example: each stands off the
 * middle of its bead (where the key letter is) and no two numbers overlap,
 * even where the thread passes a bead again; and each has a halo in the
 * page's colour, so it reads on a dark bead as on a light one.
 */
import { expect, test } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { XMLParser } from 'fast-xml-parser';
import { contrastRatio } from '../../shared/chart/contrast.js';
import { buildScene } from '../../shared/chart/scene.js';
import type { BeadPrim, TextPrim } from '../../shared/chart/scene-types.js';
import { sceneToSvg } from '../../shared/chart/svg-text.js';
import { themes } from '../../shared/chart/themes.js';
import { compile } from '../../shared/compile.js';

const modelOf = (name: string) => compile(readFileSync(`examples/${name}.ffp`, 'utf8')).value.model;

/** Every row of every example: flat, tube and round, where beads meet at angles and numbers crowd. */
const everyRow = readdirSync('examples')
  .filter((f) => f.endsWith('.ffp'))
  .sort()
  .flatMap((f) => {
    const name = f.slice(0, -'.ffp'.length);
    return modelOf(name).rows.map((r): [string, number] => [name, r.row]);
  });

test.each(everyRow)('%s row %i: pass numbers clear of the key letters and of each other', (name, row) => {
  const scene = buildScene(modelOf(name), { thread: row }).value;
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

test.each(Object.values(themes))('$name theme: each pass number has a halo that reads against it', (theme) => {
  const scene = buildScene(modelOf('tern-panel'), { thread: 2, theme: theme.name }).value;
  const numbers = scene.items.filter((i): i is TextPrim => i.kind === 'text' && i.role === 'thread-number');
  expect(numbers.length).toBeGreaterThan(4);
  for (const n of numbers) {
    // The numbers cross beads of every colour (this row runs over jet and bone alike), so the halo, not
    // the bead, is what a number is read against: WCAG 2.x asks 4.5:1 of text (success criterion 1.4.3).
    expect(n.halo?.color).toBe(theme.halo);
    expect(contrastRatio(n.color, n.halo!.color), n.id).toBeGreaterThanOrEqual(4.5);
    expect(n.halo!.width).toBeGreaterThan(0);
  }
  // A painted page and the halo are one colour, so the halo never shows as a box on the page itself.
  if (theme.background !== null) expect(theme.halo).toBe(theme.background);
  // In the SVG (read with a reference XML parser), the outline is painted under the glyphs, not over them.
  const svg = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' }).parse(sceneToSvg(scene)) as {
    svg: { text: Array<Record<string, string>> };
  };
  const drawn = svg.svg.text.filter((t) => t.class === 'ff-thread-number');
  expect(drawn).toHaveLength(numbers.length);
  for (const t of drawn) expect([t.stroke, t['paint-order']]).toEqual([theme.halo, 'stroke']);
});
