/**
 * The one place the server calls the pure core: it turns a pattern's text
 * into what a version stores (diagnostics, model, counts for the library).
 * Built from dist/, the work runs on worker threads (piscina), so a 1 MiB
 * upload does not stall every other request; from the TypeScript sources
 * (tests) there is no compiled worker, and it runs in this thread.
 */
import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { compile } from '../shared/compile.js';
import { hasErrors, sortDiagnostics, type Diagnostic } from '../shared/diagnostic.js';
import type { Model } from '../shared/model.js';
import { tally, type Tally } from '../shared/tally.js';
import type { PatternAst } from '../parser/ast.js';
import type { PatternColor } from './models/pattern.js';

export interface Analysis {
  title: string;
  layout: string;
  rows: number;
  units: number | null;
  beads: number | null;
  colors: PatternColor[];
  diagnostics: Diagnostic[];
  /** The `fourfold.model/1` JSON text, as a version stores it (made on the worker, so this thread never stringifies a big model). */
  modelJson: string | null;
  /** The tally of an error-free pattern, else null. */
  tally: Tally | null;
}

export const contentHash = (source: string): string => createHash('sha256').update(source, 'utf8').digest('hex');

const rowCount = (ast: PatternAst): number => ast.rows.reduce((most, row) => Math.max(most, row.to), 0);

/** The tally of an error-free model, or null: like the CLI, no material list for a pattern that does not build. */
export function tallyOf(model: Model): Tally | null {
  if (hasErrors(model.diagnostics)) return null;
  const result = tally(model, {});
  return hasErrors(result.diagnostics) ? null : result.value;
}

/** Parses and simulates a pattern; never throws on user input (the engine's promise), so a version is always stored. */
export function analyseNow(source: string): Analysis {
  const { value, diagnostics } = compile(source);
  const { ast, model } = value;
  return {
    title: ast.header.title || 'Untitled',
    layout: ast.header.layout,
    // A pattern with errors still has the rows that could be built; the library shows what was written.
    rows: Math.max(model.rows.length, rowCount(ast)),
    units: model.units.length,
    beads: model.beads.length,
    colors: model.palette.map(({ key, hex, name }) => ({ key, hex, name })),
    diagnostics: sortDiagnostics(diagnostics),
    modelJson: JSON.stringify(model),
    tally: tallyOf(model),
  };
}

const workerFile = fileURLToPath(new URL('./engine-worker.js', import.meta.url));
let pool: Piscina<string, Analysis> | null | undefined;

export function analyse(source: string): Promise<Analysis> {
  pool ??= existsSync(workerFile)
    ? new Piscina<string, Analysis>({
        filename: workerFile,
        maxThreads: Math.max(1, availableParallelism() - 1),
        idleTimeout: 30_000,
      })
    : null;
  return pool ? pool.run(source) : Promise.resolve().then(() => analyseNow(source));
}

/** Stops the worker threads (the server calls this when it stops). */
export async function closeEngine(): Promise<void> {
  const running = pool;
  pool = undefined;
  await running?.destroy();
}

export const countSeverity = (diagnostics: readonly Diagnostic[], severity: Diagnostic['severity']): number =>
  diagnostics.filter((d) => d.severity === severity).length;
