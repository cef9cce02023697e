/**
 * The legend: a colour's name as the designer wrote it, else as CSS Color 4
 * names it, else its hex; and columns laid out from the font's advance, so
 * counts end on one line and never touch the longest name.
 */
import { describe, expect, test } from 'vitest';
import { buildScene } from '../../shared/chart/scene.js';
import type { Scene } from '../../shared/chart/scene.js';
import type { TextPrim } from '../../shared/chart/scene-types.js';
import { textWidth } from '../../shared/chart/scene-margin.js';
import { stripModel } from './fixture.js';

const texts = (scene: Scene, role: TextPrim['role']): TextPrim[] =>
  scene.items.filter((i): i is TextPrim => i.kind === 'text' && i.role === role);

const named = (scene: Scene, key: string): string =>
  texts(scene, 'legend-name').find((t) => t.id === `ff-legend-${key}-name`)!.text;

describe('legend names', () => {
  test('designer name first, then the CSS Color 4 name, then the hex', () => {
    const model = stripModel(4, [
      ['A', '#2e6f8e', 'deep teal'],
      // Source: CSS Color Module Level 4, section 6.1 (named colors): darkolivegreen is #556b2f (from memory).
      ['B', '#556b2f', ''],
      ['C', '#123457', ''],
    ]);
    const scene = buildScene(model).value;
    expect(named(scene, 'A')).toBe('deep teal');
    expect(named(scene, 'B')).toBe('darkolivegreen');
    expect(named(scene, 'C')).toBe('#123457');
  });
});

describe('legend columns', () => {
  const model = stripModel(12, [
    ['A', '#f4f1ea', 'chalk'],
    ['B', '#2e6f8e', 'sea lavender'],
    ['C', '#c98b2b', 'honey'],
    ['D', '#6b2d5c', 'plum'],
  ]);
  // 0.6 em per character: JetBrains Mono's fixed advance (600 of its 1000 units per em), at the legend's 3 mm.
  const cell = 0.6 * 3;

  for (const theme of ['light', 'print'] as const) {
    test(`${theme}: counts end on one line per column, two cells clear of the longest name, columns apart`, () => {
      const scene = buildScene(model, { theme }).value;
      const names = texts(scene, 'legend-name');
      const counts = texts(scene, 'legend-count');
      const columns = [...new Set(names.map((n) => n.x))].sort((a, b) => a - b);
      expect(columns.length).toBeGreaterThan(1);
      expect(columns.length).toBeLessThan(4);
      const rights = [...new Set(counts.map((c) => c.x))].sort((a, b) => a - b);
      // One right edge per column: the counts line up.
      expect(rights).toHaveLength(columns.length);
      const longestName = Math.max(...names.map((n) => textWidth(n.text, n.size)));
      const longestCount = Math.max(...counts.map((c) => textWidth(c.text, c.size)));
      columns.forEach((left, i) => {
        expect(rights[i]! - longestCount - (left + longestName)).toBeGreaterThanOrEqual(2 * cell - 0.01);
      });
      const swatchX = scene.items.flatMap((s) => (s.kind === 'rect' && s.role === 'legend-swatch' ? [s.x] : []));
      const nextSwatch = Math.min(...swatchX.filter((x) => x > columns[0]!));
      expect(nextSwatch - rights[0]!).toBeGreaterThanOrEqual(4);
      // Nothing of the legend reaches into the page's right margin.
      expect(rights.at(-1)!).toBeLessThanOrEqual(scene.width - 6 + 0.01);
    });
  }
});
