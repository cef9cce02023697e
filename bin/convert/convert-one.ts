/**
 * One pattern file to its outputs under --out: the unit of work a worker
 * thread runs. Skips the file when the stamp beside its outputs says the
 * same content was already converted with the same options.
 */
import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { compile } from '../../shared/compile.js';
import type { Diagnostic } from '../../shared/diagnostic.js';
import { hasErrors } from '../../shared/diagnostic.js';
import type { Model } from '../../shared/model.js';
import { buildSteps } from '../../shared/steps.js';
import { renderStepsMarkdown } from '../../shared/steps-render.js';
import { cannotRead, decodePattern } from '../read-input.js';
import { renderChartFiles } from '../render/chart-files.js';
import { FontCacheError } from '../render/font.js';
import { DEFAULT_DPI } from '../render/png.js';
import { writeFileAtomic } from './atomic-write.js';
import { PATTERN_EXT } from './find-inputs.js';

import { OUTPUT_FORMATS, type OutputFormat } from './formats.js';

export { OUTPUT_FORMATS, type OutputFormat };

export interface ConvertTask {
  file: string;
  rel: string;
  outDir: string;
  formats: OutputFormat[];
  force: boolean;
}

export interface FileResult {
  rel: string;
  /** converted; skipped (up to date); failed (the pattern has errors); io-error (cannot read or write). */
  status: 'converted' | 'skipped' | 'failed' | 'io-error';
  /** For failed: its first error as `file:line:col: error[id]: message`; for io-error: why. */
  message?: string;
  /** A failed file whose stamp says nothing changed since it failed. */
  unchanged?: boolean;
}

/** Bump when the stamp's meaning changes; a new release of the tool also makes old stamps stop matching. */
const STAMP_VERSION = 1;

/** The version in the nearest package.json above this file (the same from the sources and from dist/). */
function toolVersion(): string {
  for (let dir = dirname(fileURLToPath(import.meta.url)); ; dir = dirname(dir)) {
    const file = join(dir, 'package.json');
    if (existsSync(file)) return String((JSON.parse(readFileSync(file, 'utf8')) as { version?: unknown }).version);
    if (dirname(dir) === dir) return 'unknown';
  }
}
const TOOL_VERSION = toolVersion();

interface Stamp {
  schema: 'fourfold.convert-stamp/1';
  hash: string;
  outputs: string[];
  /** First error of a pattern with errors, so a skipped run still reports it. */
  error?: string;
}

export const stampPath = (outDir: string, rel: string): string => `${outBase(outDir, rel)}.hash`;
const outBase = (outDir: string, rel: string): string =>
  join(outDir, rel.endsWith(PATTERN_EXT) ? rel.slice(0, -PATTERN_EXT.length) : rel);

const errorLine = (rel: string, d: Diagnostic): string =>
  `${rel}:${d.range.line}:${d.range.column}: error[${d.id}]: ${d.message}`;

function upToDate(task: ConvertTask, hash: string): Stamp | null {
  let stamp: Stamp;
  try {
    stamp = JSON.parse(readFileSync(stampPath(task.outDir, task.rel), 'utf8')) as Stamp;
  } catch {
    return null;
  }
  if (stamp.hash !== hash) return null;
  const dir = dirname(stampPath(task.outDir, task.rel));
  return stamp.outputs.every((o) => existsSync(join(dir, o))) ? stamp : null;
}

async function outputsOf(
  model: Model,
  formats: readonly OutputFormat[],
): Promise<Array<[OutputFormat, string | Uint8Array]>> {
  const out: Array<[OutputFormat, string | Uint8Array]> = [];
  if (formats.includes('svg') || formats.includes('png')) {
    const chart = await renderChartFiles(model, { png: formats.includes('png'), dpi: DEFAULT_DPI });
    if (formats.includes('svg')) out.push(['svg', chart.svg]);
    if (chart.png) out.push(['png', chart.png]);
  }
  if (formats.includes('md')) out.push(['md', renderStepsMarkdown(buildSteps(model))]);
  if (formats.includes('json')) out.push(['json', `${JSON.stringify(model, null, 2)}\n`]);
  return out;
}

export async function convertOne(task: ConvertTask): Promise<FileResult> {
  let bytes: Buffer;
  try {
    bytes = readFileSync(task.file);
  } catch (error) {
    return { rel: task.rel, status: 'io-error', message: cannotRead(task.rel, error).replace(/^fourfold: /, '') };
  }
  const formats = OUTPUT_FORMATS.filter((f) => task.formats.includes(f));
  const hash = createHash('sha256')
    .update(`${STAMP_VERSION}\0${TOOL_VERSION}\0${formats.join(',')}\0${DEFAULT_DPI}\0`)
    .update(bytes)
    .digest('hex');
  if (!task.force) {
    const stamp = upToDate(task, hash);
    if (stamp?.error !== undefined) return { rel: task.rel, status: 'failed', message: stamp.error, unchanged: true };
    if (stamp) return { rel: task.rel, status: 'skipped' };
  }

  // Decoded as `check` decodes, so a file that is not text is called the same thing by both.
  const { text, diagnostics: notText } = await decodePattern({ file: task.rel, bytes });
  if (notText[0]) return { rel: task.rel, status: 'failed', message: errorLine(task.rel, notText[0]) };
  let compiled: ReturnType<typeof compile>;
  let outputs: Array<[OutputFormat, string | Uint8Array]>;
  try {
    compiled = compile(text);
    outputs = await outputsOf(compiled.value.model, formats);
  } catch (error) {
    if (error instanceof FontCacheError)
      return { rel: task.rel, status: 'io-error', message: `${task.rel}: ${error.message}` };
    // A bug in the engine or a renderer, not the user's: say so, and go on with the other files.
    return {
      rel: task.rel,
      status: 'failed',
      message: `${task.rel}: internal error: ${(error as Error).message}`,
    };
  }
  const { diagnostics } = compiled;
  const firstError = diagnostics.find((d) => d.severity === 'error');
  const base = outBase(task.outDir, task.rel);
  try {
    for (const [format, data] of outputs) writeFileAtomic(`${base}.${format}`, data);
    const stamp: Stamp = {
      schema: 'fourfold.convert-stamp/1',
      hash,
      outputs: outputs.map(([format]) => `${base.slice(dirname(base).length + 1)}.${format}`),
      ...(firstError ? { error: errorLine(task.rel, firstError) } : {}),
    };
    // The stamp goes last: a run cut short before it simply converts the file again.
    writeFileAtomic(stampPath(task.outDir, task.rel), `${JSON.stringify(stamp)}\n`);
  } catch (error) {
    return {
      rel: task.rel,
      status: 'io-error',
      message: `cannot write outputs of '${task.rel}': ${(error as Error).message}`,
    };
  }
  return hasErrors(diagnostics) && firstError
    ? { rel: task.rel, status: 'failed', message: errorLine(task.rel, firstError) }
    : { rel: task.rel, status: 'converted' };
}
