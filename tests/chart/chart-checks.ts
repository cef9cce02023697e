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
  expect(new Set(elements.filter((e) => 'data-bead' in e.attrs).map((e) => e.attrs['data-bead'])).size).toBe(expectedBeads);
  // Self-contained: nothing refers outside the file.
  expect(elements.some((e) => e.tag === 'foreignObject' || e.tag === 'image' || e.tag === 'use')).toBe(false);
  expect(svg).not.toMatch(/href=|url\((?!#|data:)/);
}

/** Every key letter against its own bead: WCAG 2.x asks 4.5:1 of normal text. */
export function checkLabelContrast(scene: Scene): void {
  for (const item of scene.items) {
    if (item.kind === 'bead' && item.label) expect(contrastRatio(item.label.color, item.fill)).toBeGreaterThanOrEqual(4.5);
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
 * Rasterised chart: each bead, sampled on its axis a quarter of its length from
 * the centre (clear of the key letter), shows its palette colour.
 */
export function checkRaster(model: Model, scene: Scene, png: Buffer, dpi: number, tolerance = 6): void {
  const image = PNG.sync.read(png);
  const px = dpi / 25.4;
  // resvg rounds the page size to whole pixels.
  expect(Math.abs(image.width - scene.width * px)).toBeLessThanOrEqual(1);
  const hex = new Map(model.palette.map((p) => [p.key, p.hex]));
  let checked = 0;
  for (const item of scene.items) {
    if (item.kind !== 'bead' || item.length < item.thickness * 1.3) continue;
    const rad = (item.angle * Math.PI) / 180;
    const off = item.length * 0.25;
    const x = Math.floor((item.x + Math.cos(rad) * off) * px);
    const y = Math.floor((item.y + Math.sin(rad) * off) * px);
    const i = (y * image.width + x) * 4;
    const got = [image.data[i]!, image.data[i + 1]!, image.data[i + 2]!];
    const want = parseHex(hex.get(model.beads[item.bead]!.color)!);
    const worst = Math.max(...got.map((g, k) => Math.abs(g - want[k]!)));
    if (worst > tolerance) expect.fail(`bead ${item.bead} at (${x}, ${y}) px: got rgb(${got.join(',')}), want ${hex.get(model.beads[item.bead]!.color)}`);
    checked++;
  }
  expect(checked).toBeGreaterThan(0);
}
