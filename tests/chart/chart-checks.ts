/**
 * The checks every rendered chart must pass, for the hand-made models and
 * for every example alike.
 */
import { expect } from 'vitest';
import { PNG } from 'pngjs';
import { contrastRatio, parseHex } from '../../shared/chart/contrast.js';
import type { EmbeddedFont } from '../../shared/chart/elements.js';
import type { Scene } from '../../shared/chart/scene-types.js';
import type { Model } from '../../shared/model.js';
import { flatten, isWellFormed } from './svg-tree.js';
import { drawOnSvgdom } from './parity.js';

export function checkSvg(svg: string, expectedBeads: number): void {
  expect(isWellFormed(svg)).toBe(true);
  const elements = flatten(svg);
  const root = elements[0]!;
  expect(root.tag).toBe('svg');
  expect(root.attrs.viewBox).toMatch(/^0 0 \d+(\.\d+)? \d+(\.\d+)?$/);
  expect(root.attrs.width).toMatch(/mm$/);
  expect(root.attrs.height).toMatch(/mm$/);
  expect(elements.find((e) => e.tag === 'title')?.text.length).toBeGreaterThan(0);
  expect(elements.filter((e) => 'data-bead' in e.attrs)).toHaveLength(expectedBeads);
  expect(new Set(elements.filter((e) => 'data-bead' in e.attrs).map((e) => e.attrs['data-bead'])).size).toBe(
    expectedBeads,
  );
  // Self-contained: nothing refers outside the file.
  expect(elements.some((e) => e.tag === 'foreignObject' || e.tag === 'image' || e.tag === 'use')).toBe(false);
  expect(svg).not.toMatch(/href=|url\((?!#|data:)/);
}

/** Every key letter against what is behind it (its bead, or its legend swatch): WCAG 2.x asks 4.5:1 of normal text. */
export function checkLabelContrast(scene: Scene): void {
  const swatches = new Map<string, string>();
  for (const item of scene.items) {
    if (item.kind === 'bead' && item.label)
      expect(contrastRatio(item.label.color, item.fill)).toBeGreaterThanOrEqual(4.5);
    if (item.kind === 'rect' && item.role === 'legend-swatch' && typeof item.fill === 'string')
      swatches.set(item.data.key!, item.fill);
  }
  for (const item of scene.items) {
    if (item.kind !== 'text' || item.role !== 'legend-key') continue;
    // In print the letter stands beside its hatched swatch, on the paper.
    const behind = scene.theme === 'print' ? '#ffffff' : swatches.get(item.data.key!)!;
    expect(contrastRatio(item.color, behind)).toBeGreaterThanOrEqual(4.5);
  }
}

/** Both emitters give the same elements, in the same order, with the same attributes and text. */
export function checkParity(scene: Scene, svg: string, fonts: readonly EmbeddedFont[] = []): void {
  const { markup, handle } = drawOnSvgdom(scene, fonts);
  try {
    const drawn = flatten(markup);
    const written = flatten(svg);
    // The text output declares the SVG namespace itself; svgdom keeps it on the node instead.
    delete written[0]!.attrs.xmlns;
    delete drawn[0]!.attrs.xmlns;
    expect(drawn).toEqual(written);
  } finally {
    handle.remove();
  }
}

/**
 * Rasterised chart: each bead, sampled on its axis just clear of its key
 * letter on either side (the centre, for a bead without one), shows its
 * palette colour.
 * Nearer the ends beads meet at junctions, where neighbours may cover them.
 */
export function checkRaster(model: Model, scene: Scene, png: Buffer, dpi: number, tolerance = 6): void {
  const image = PNG.sync.read(png);
  const px = dpi / 25.4;
  // resvg rounds the page size to whole pixels.
  expect(Math.abs(image.width - scene.width * px)).toBeLessThanOrEqual(1);
  const hex = new Map(model.palette.map((p) => [p.key, p.hex]));
  let checked = 0;
  for (const item of scene.items) {
    if (item.kind !== 'bead') continue;
    const rad = (item.angle * Math.PI) / 180;
    // The letter stands upright, so half its diagonal clears it at any angle; 0.25 mm more clears its anti-aliasing.
    const off = item.label ? Math.hypot(0.3 * item.label.size, 0.4 * item.label.size) + 0.25 : 0;
    const want = parseHex(hex.get(model.beads[item.bead]!.color)!);
    // Either side of the letter will do: in a tight round a neighbour's edge may come close to one of them.
    const samples = [off, -off].map((d) => {
      const x = Math.floor((item.x + Math.cos(rad) * d) * px);
      const y = Math.floor((item.y + Math.sin(rad) * d) * px);
      const i = (y * image.width + x) * 4;
      const got = [image.data[i]!, image.data[i + 1]!, image.data[i + 2]!];
      return { x, y, got, worst: Math.max(...got.map((g, k) => Math.abs(g - want[k]!))) };
    });
    const best = samples.reduce((a, b) => (b.worst < a.worst ? b : a));
    if (best.worst > tolerance)
      expect.fail(
        `bead ${item.bead} at (${best.x}, ${best.y}) px: got rgb(${best.got.join(',')}), want ${hex.get(model.beads[item.bead]!.color)}`,
      );
    checked++;
  }
  expect(checked).toBeGreaterThan(0);
}
