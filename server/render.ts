/**
 * Charts, tally, steps, kit and model of a stored version, through the same
 * public functions the CLI uses, so downloads match the CLI byte for byte.
 */
import { createHash } from 'node:crypto';
import { z } from 'zod';
import { renderChartSvg } from '../bin/render/chart-files.js';
import { sceneOptions } from '../bin/commands/chart.js';
// The CLI's --dpi default is this same constant.
import { DEFAULT_DPI, svgToPng } from '../bin/render/png.js';
import { FontCacheError } from '../bin/render/font.js';
import { hasErrors } from '../shared/diagnostic.js';
import { renderKitHtml, renderKitMarkdown } from '../shared/kit.js';
import type { Model } from '../shared/model.js';
import { buildSteps } from '../shared/steps.js';
import { renderStepsHtml, renderStepsMarkdown, renderStepsText } from '../shared/steps-render.js';
import { DEFAULT_TAIL_MM, DEFAULT_WORKING_LENGTH_MM } from '../shared/tally.js';
import { tallyOf } from './engine.js';
import { HttpError } from './errors.js';
import { check } from './validate.js';

export interface Rendered {
  type: string;
  body: string | Buffer;
  /** Set on cached charts, so a repeat is not hashed again for its ETag. */
  etag?: string;
}

export type ViewKind = 'chart.svg' | 'chart.png' | 'tally' | 'steps' | 'kit' | 'model';

const flag = z.enum(['1', 'true', '0', 'false']).transform((v) => v === '1' || v === 'true');
const chartQuery = z.object({
  theme: z.enum(['light', 'dark', 'print']).optional(),
  numbers: flag.optional(),
  thread: z.coerce.number().int().min(1).max(1_000_000).optional(),
  scale: z.literal('mm').optional(),
  dpi: z.coerce.number().int().min(24).max(600).optional(),
});
const stepsQuery = z.object({ format: z.enum(['json', 'text', 'md', 'html']).default('json') });
const kitQuery = z.object({ format: z.enum(['md', 'html']).default('md') });

const json = (value: unknown): Rendered => ({
  type: 'application/json; charset=utf-8',
  body: `${JSON.stringify(value, null, 2)}\n`,
});

function needsClean(model: Model): void {
  if (hasErrors(model.diagnostics)) {
    throw new HttpError(422, 'has-errors', 'This version has errors; fix them first, a partial list would mislead.');
  }
}

export type Render = (
  kind: ViewKind,
  versionId: number,
  loadModel: () => Promise<Model | null>,
  query: Record<string, unknown>,
) => Promise<Rendered>;

/**
 * renderView behind a small LRU of charts by version and options, for one
 * app: a version never changes and the chart is byte-identical for the same
 * input, so a cached chart is the chart. Other views are cheap and not kept.
 */
export function cachedRenderer(max = 64): Render {
  const cache = new Map<string, Rendered>();
  return async (kind, versionId, loadModel, query) => {
    const key = kind.startsWith('chart.') ? `${versionId}:${kind}:${JSON.stringify(check(chartQuery, query))}` : null;
    const hit = key ? cache.get(key) : undefined;
    if (key && hit) {
      cache.delete(key);
      cache.set(key, hit);
      return hit;
    }
    const rendered = await renderView(kind, await loadModel(), query);
    if (!key) return rendered;
    const body = typeof rendered.body === 'string' ? Buffer.from(rendered.body, 'utf8') : rendered.body;
    const out = { ...rendered, body, etag: `"${createHash('sha1').update(body).digest('base64url')}"` };
    cache.set(key, out);
    if (cache.size > max) cache.delete(cache.keys().next().value!);
    return out;
  };
}

/**
 * The rasteriser's font files go to the server's cache folder; when it cannot
 * be written, PNG is out of order until an operator fixes it, while SVG and
 * everything else still work. The folder's path goes to the log only.
 */
async function pngOf(svg: string | Buffer, dpi: number): Promise<Buffer> {
  try {
    return await svgToPng(svg, dpi);
  } catch (error) {
    if (!(error instanceof FontCacheError)) throw error;
    const message = 'PNG charts cannot be made on this server just now; the SVG chart and the other views still work.';
    throw new HttpError(503, 'png-unavailable', message, undefined, error);
  }
}

export async function renderView(
  kind: ViewKind,
  model: Model | null,
  query: Record<string, unknown>,
): Promise<Rendered> {
  if (!model)
    throw new HttpError(422, 'no-model', 'This version could not be built, so there is nothing to draw or count.');
  switch (kind) {
    case 'model':
      return json(model);
    case 'chart.svg':
    case 'chart.png': {
      const { dpi, ...given } = check(chartQuery, query);
      // The CLI's own option mapping and defaults, so a download is the bytes `fourfold chart` writes.
      const { svg, diagnostics } = await renderChartSvg(model, sceneOptions(given));
      if (hasErrors(diagnostics)) throw new HttpError(400, 'invalid-input', diagnostics[0]!.message, diagnostics);
      return kind === 'chart.svg'
        ? { type: 'image/svg+xml; charset=utf-8', body: svg }
        : { type: 'image/png', body: await pngOf(svg, dpi ?? DEFAULT_DPI) };
    }
    case 'tally': {
      needsClean(model);
      const t = tallyOf(model);
      if (!t) throw new HttpError(422, 'has-errors', 'The tally could not be made for this version.');
      return json(t);
    }
    case 'steps': {
      needsClean(model);
      const { format } = check(stepsQuery, query);
      const doc = buildSteps(model);
      if (format === 'json') return json(doc);
      if (format === 'md') return { type: 'text/markdown; charset=utf-8', body: renderStepsMarkdown(doc) };
      if (format === 'html') return { type: 'text/html; charset=utf-8', body: renderStepsHtml(doc) };
      return { type: 'text/plain; charset=utf-8', body: renderStepsText(doc) };
    }
    case 'kit': {
      needsClean(model);
      const { format } = check(kitQuery, query);
      const t = tallyOf(model);
      if (!t) throw new HttpError(422, 'has-errors', 'The kit sheet could not be made for this version.');
      const options = { workingLengthMm: DEFAULT_WORKING_LENGTH_MM, tailMm: DEFAULT_TAIL_MM };
      return format === 'html'
        ? { type: 'text/html; charset=utf-8', body: renderKitHtml(model, t, options) }
        : { type: 'text/markdown; charset=utf-8', body: renderKitMarkdown(model, t, options) };
    }
  }
}
