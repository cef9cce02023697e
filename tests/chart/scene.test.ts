import { describe, expect, test } from 'vitest';
import { renderChartFiles, renderChartSvg } from '../../bin/render/chart-files.js';
import { buildScene } from '../../shared/chart/scene.js';
import { sceneToSvg } from '../../shared/chart/svg-text.js';
import { HIGHLIGHT_CLASS } from '../../shared/chart/svg-dom.js';
import { drawOnSvgdom } from './parity.js';
import { checkLabelContrast, checkParity, checkRaster, checkSvg } from './chart-checks.js';
import { stripModel } from './fixture.js';
import { flatten } from './svg-tree.js';

describe('chart of a hand-made strip', () => {
  // Closed form (NOTATION.md section 8): a flat strip of n units has 3n + 1 beads.
  test('one data-bead element per bead, well-formed, with viewBox and title', async () => {
    const model = stripModel(5);
    expect(model.beads).toHaveLength(16);
    const { svg } = await renderChartSvg(model);
    checkSvg(svg.toString('utf8'), 16);
  });

  test('the same model renders to the same bytes', async () => {
    const a = await renderChartSvg(stripModel(4), { numbers: true, thread: 1 });
    const b = await renderChartSvg(stripModel(4), { numbers: true, thread: 1 });
    expect(a.svg.equals(b.svg)).toBe(true);
  });

  test('every number is rounded to at most 2 decimals', () => {
    const svg = sceneToSvg(buildScene(stripModel(3), { scale: 'mm', thread: 1 }).value);
    expect(svg).not.toMatch(/\d\.\d{3,}/);
  });

  test('labels meet 4.5:1 in every theme, with dark and light beads', () => {
    const model = stripModel(6, [
      ['A', '#000000', 'jet'],
      ['B', '#ffffff', 'snow'],
      ['C', '#767676', 'pewter'],
      ['D', '#ffcc00', 'sun'],
    ]);
    for (const theme of ['light', 'dark', 'print'] as const) checkLabelContrast(buildScene(model, { theme }).value);
  });

  test('a failed unit is marked on its cell', () => {
    const model = stripModel(3);
    model.units[2]!.failed = true;
    const marks = flatten(sceneToSvg(buildScene(model).value)).filter((e) => e.attrs.class === 'ff-failed');
    expect(marks.map((e) => e.attrs['data-unit'])).toEqual(['2']);
  });

  test('cues only where the step says colour order matters', () => {
    const model = stripModel(3);
    model.steps[1]!.cue = false;
    const cues = flatten(sceneToSvg(buildScene(model).value)).filter((e) => e.attrs.id?.startsWith('ff-cue-'));
    expect(cues.map((e) => e.attrs['data-unit'])).toEqual(['0', '2']);
  });

  test('the thread overlay numbers every pass of the row in order and keeps the kinds apart', () => {
    const model = stripModel(2);
    const elements = flatten(sceneToSvg(buildScene(model, { thread: 1 }).value));
    const passes = elements.filter((e) => e.attrs.class === 'ff-thread');
    expect(passes.map((e) => e.attrs['data-pass'])).toEqual(model.thread.map((_, i) => String(i + 1)));
    expect(passes.map((e) => e.attrs['data-kind'])).toEqual(model.thread.map((p) => p.kind));
    const dash = (kind: string) =>
      new Set(passes.filter((e) => e.attrs['data-kind'] === kind).map((e) => e.attrs['stroke-dasharray'] ?? 'solid'));
    expect([...dash('pickup')]).toEqual(['solid']);
    expect([...dash('close')]).not.toContain('solid');
    expect(elements.filter((e) => e.attrs.class === 'ff-thread-number').map((e) => e.text)).toEqual(
      model.thread.map((_, i) => String(i + 1)),
    );
  });

  test('a thread row that does not exist is a diagnostic, not a crash', () => {
    const result = buildScene(stripModel(2), { thread: 7 });
    expect(result.diagnostics.map((d) => d.id)).toEqual(['thread-row']);
    expect(result.diagnostics[0]!.message).toContain('no row 7');
  });

  test('true size: one unit side is the bead size in mm, and a 1 cm scale bar', () => {
    const model = stripModel(10);
    const big = buildScene(model).value;
    const real = buildScene(model, { scale: 'mm' }).value;
    const sideGap = (scene: typeof big): number => {
      const xs = scene.items.flatMap((p) => (p.kind === 'bead' && Math.abs(p.angle) === 90 ? [p.x] : []));
      return xs[1]! - xs[0]!;
    };
    expect(sideGap(real)).toBeCloseTo(model.layout.unitMm, 2);
    expect(sideGap(big)).toBeCloseTo(8, 2);
    expect(real.width).toBeLessThan(big.width);
    const bar = flatten(sceneToSvg(real)).find((e) => e.attrs.id === 'ff-scale-bar');
    const [, start, end] = /^M(\d+(?:\.\d+)?) .* H(\d+(?:\.\d+)?)/.exec(bar?.attrs.d ?? '') ?? [];
    expect(Number(end) - Number(start)).toBe(10);
    expect(flatten(sceneToSvg(big)).some((e) => e.attrs.id === 'ff-scale-bar')).toBe(false);
  });

  test('print theme: no page fill, a distinct hatch on every legend swatch after the first', () => {
    const model = stripModel(3, [
      ['A', '#111111', 'a'],
      ['B', '#222222', 'b'],
      ['C', '#333333', 'c'],
    ]);
    const elements = flatten(sceneToSvg(buildScene(model, { theme: 'print' }).value));
    expect(elements.some((e) => e.attrs.class === 'ff-background')).toBe(false);
    const hatches = elements.filter((e) => e.tag === 'pattern').map((p) => elements[elements.indexOf(p) + 1]!.attrs.d);
    expect(new Set(hatches).size).toBe(3);
  });

  test('svg.js on svgdom draws the same elements as the text emitter', () => {
    const model = stripModel(4);
    model.units[3]!.failed = true;
    for (const options of [{}, { numbers: true, thread: 1, theme: 'print' as const, scale: 'mm' as const }]) {
      const scene = buildScene(model, options).value;
      checkParity(scene, sceneToSvg(scene));
    }
  });

  test('the drawing finds beads and highlights one unit at a time', () => {
    const model = stripModel(3);
    const { handle } = drawOnSvgdom(buildScene(model, { numbers: true }).value);
    try {
      expect(handle.bead(5)?.attr('data-bead')).toBe(5);
      expect(handle.bead(99)).toBeNull();
      const classed = () => handle.svg.find(`.${HIGHLIGHT_CLASS}`).map((el) => String(el.attr('id')));
      handle.highlightUnit(1);
      // The unit's cell, the beads it picked up, its cue and its number.
      expect(classed().sort()).toEqual(['ff-bead-4', 'ff-bead-5', 'ff-bead-6', 'ff-cell-1', 'ff-cue-1', 'ff-unit-1']);
      handle.highlightUnit(2);
      expect(classed()).toContain('ff-cell-2');
      expect(classed()).not.toContain('ff-cell-1');
      handle.highlightUnit(null);
      expect(classed()).toEqual([]);
    } finally {
      handle.remove();
    }
  });

  test('rasterised with resvg, every bead shows its palette colour', async () => {
    const model = stripModel(5);
    const dpi = 192;
    const { png } = await renderChartFiles(model, { png: true, dpi });
    const scene = buildScene(model).value;
    checkRaster(model, scene, png!, dpi);
    // The check itself can fail: against another palette the same picture is wrong.
    const other = { ...model, palette: model.palette.map((p) => ({ ...p, hex: p.key === 'B' ? '#ff00ff' : p.hex })) };
    expect(() => checkRaster(other, scene, png!, dpi)).toThrow(/bead \d+/);
  });
});
