import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { formatNumber } from '../../shared/chart/elements.js';
import { round2, round2Text } from '../../shared/chart/geometry.js';
import { buildScene } from '../../shared/chart/scene.js';
import { sceneToSvg } from '../../shared/chart/svg-text.js';
import { stripModel } from './fixture.js';
import { flatten, isWellFormed } from './svg-tree.js';

describe('numbers and text in the SVG emitter', () => {
  // Reference: the engine's own number-to-string (ECMA-262, Number::toString), which the goldens were written with.
  test('round2Text gives String(round2(n)) for any number', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (n) => {
        expect(round2Text(n)).toBe(String(round2(n)));
      }),
    );
    for (const n of [0, -0, -0.004, -0.005, 0.005, 0.015, 1.005, -1.5, 99.99, 100, 1e-7, -123.456])
      expect(round2Text(n)).toBe(String(round2(n)));
  });

  test('formatNumber keeps numbers that are not on a hundredth as String(n) gives them', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1e8, max: 1e8 }), (cents) => {
        expect(formatNumber(cents / 100)).toBe(String(cents / 100));
      }),
    );
    expect(formatNumber(0.123)).toBe('0.123');
    expect(formatNumber(1e21)).toBe('1e+21');
  });

  test('every scene number comes out as the emitter of the svg.js side writes it', () => {
    const scene = buildScene(stripModel(3), { scale: 'mm', thread: 1 }).value;
    const written = flatten(sceneToSvg(scene));
    const bead = scene.items.find((p) => p.kind === 'bead')!;
    const el = written.find((e) => e.attrs.id === bead.id)!;
    expect(el.attrs.width).toBe(formatNumber(bead.length));
    expect(el.attrs['data-bead']).toBe(String(bead.bead));
  });

  test('reserved characters and text outside ASCII survive as the same text', () => {
    const model = stripModel(2);
    model.header.title = 'Fern & "Moss" <draft> · café 🌿';
    model.header.designer = 'Ida Þórs';
    const svg = sceneToSvg(buildScene(model).value);
    expect(isWellFormed(svg)).toBe(true);
    const elements = flatten(svg);
    expect(elements.find((e) => e.tag === 'title')!.text).toBe(model.header.title);
    expect(elements.find((e) => e.attrs.id === 'ff-designer')!.text).toBe('by Ida Þórs');
    expect(svg).toContain('Fern &amp; &quot;Moss&quot; &lt;draft&gt; · café 🌿');
  });
});
