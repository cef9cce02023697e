/**
 * Model to chart files, shared by `fourfold chart`, `fourfold convert` and
 * the server's /chart.svg and /chart.png, so all three give the same bytes.
 */
import type { Diagnostic } from '../../shared/diagnostic.js';
import type { Model } from '../../shared/model.js';
import { buildScene } from '../../shared/chart/scene.js';
import type { SceneOptions } from '../../shared/chart/scene-types.js';
import { sceneToSvgBytes } from '../../shared/chart/svg-text.js';
import { embeddedFonts } from './font.js';
import { DEFAULT_DPI, svgToPng } from './png.js';

export interface ChartFileOptions extends SceneOptions {
  png?: boolean;
  dpi?: number;
}

export interface ChartFiles {
  /** UTF-8 bytes, as written to a file or sent. */
  svg: Buffer;
  png?: Buffer;
  /** Problems with the options (a `--thread` row that does not exist); the model's own are in `model.diagnostics`. */
  diagnostics: Diagnostic[];
}

export async function renderChartSvg(
  model: Model,
  options: SceneOptions = {},
): Promise<{ svg: Buffer; diagnostics: Diagnostic[] }> {
  const scene = buildScene(model, options);
  const bytes = sceneToSvgBytes(scene.value, await embeddedFonts(scene.value.glyphs));
  return { svg: Buffer.from(bytes.buffer, bytes.byteOffset, bytes.length), diagnostics: scene.diagnostics };
}

export async function renderChartFiles(model: Model, options: ChartFileOptions = {}): Promise<ChartFiles> {
  const { svg, diagnostics } = await renderChartSvg(model, options);
  if (!options.png) return { svg, diagnostics };
  return { svg, png: await svgToPng(svg, options.dpi ?? DEFAULT_DPI), diagnostics };
}
