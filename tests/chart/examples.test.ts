/**
 * Every example pattern in examples/: its chart is well-formed, self-contained
 * SVG with as many bead elements as the tally counts beads, byte-identical
 * when drawn twice and equal to its golden file (tests/chart/golden/, through
 * expectGolden: UPDATE_GOLDEN=1 rewrites them, a missing one fails in CI);
 * the svg.js drawing matches the text; every label reads at 4.5:1; and the
 * rasterised chart shows each bead's colour.
 */
import { describe, expect, test } from 'vitest';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { renderChartSvg } from '../../bin/render/chart-files.js';
import { svgToPng } from '../../bin/render/png.js';
import { embeddedFonts } from '../../bin/render/font.js';
import { buildScene } from '../../shared/chart/scene.js';
import { sceneToSvg } from '../../shared/chart/svg-text.js';
import { compile } from '../../shared/compile.js';
import { tally } from '../../shared/tally.js';
import { expectGolden } from '../golden.js';
import { checkLabelContrast, checkParity, checkRaster, checkSvg } from './chart-checks.js';

const examplesDir = 'examples';
const goldenDir = join('tests', 'chart', 'golden');
const examples = existsSync(examplesDir)
  ? readdirSync(examplesDir, { recursive: true, encoding: 'utf8' })
      .filter((f) => f.endsWith('.ffp'))
      .sort()
  : [];

test('there are examples to check', () => {
  expect(examples.length).toBeGreaterThan(0);
});

describe.each(examples)('%s', (file) => {
  const model = compile(readFileSync(join(examplesDir, file), 'utf8')).value.model;
  const name = basename(file, '.ffp');

  test('well-formed, self-contained, one data-bead per bead the tally counts; the same bytes twice and as the golden file', async () => {
    const bytes = (await renderChartSvg(model, { numbers: true })).svg;
    const svg = bytes.toString('utf8');
    checkSvg(svg, tally(model, {}).value.beads);
    expect((await renderChartSvg(model, { numbers: true })).svg.equals(bytes)).toBe(true);
    expectGolden(join(goldenDir, `${name}.svg`), svg);
  });

  test('every theme and option: labels at 4.5:1, svg.js on svgdom draws the same elements', async () => {
    for (const options of [
      {},
      { theme: 'dark' as const, numbers: true },
      { theme: 'print' as const, scale: 'mm' as const, thread: 1 },
    ]) {
      const scene = buildScene(model, options).value;
      checkLabelContrast(scene);
      const fonts = await embeddedFonts(scene.glyphs);
      checkParity(scene, sceneToSvg(scene, fonts), fonts);
    }
  });

  test('rasterised with resvg, each bead shows its palette colour', async () => {
    const scene = buildScene(model).value;
    const dpi = 192;
    const png = await svgToPng(sceneToSvg(scene, await embeddedFonts(scene.glyphs)), dpi);
    checkRaster(model, scene, png, dpi);
  });
});
