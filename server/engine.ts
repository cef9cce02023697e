/**
 * The one place the server calls the pure core: it turns a pattern's text
 * into what a version stores (diagnostics, model, counts for the library).
 */
import { createHash } from 'node:crypto';
import { compile } from '../shared/compile.js';
import { sortDiagnostics, type Diagnostic } from '../shared/diagnostic.js';
import type { Model } from '../shared/model.js';
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
  model: Model | null;
}

export const contentHash = (source: string): string => createHash('sha256').update(source, 'utf8').digest('hex');

const rowCount = (ast: PatternAst): number => ast.rows.reduce((most, row) => Math.max(most, row.to), 0);

/** Parses and simulates a pattern; never throws on user input (the engine's promise), so a version is always stored. */
export async function analyse(source: string): Promise<Analysis> {
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
    model,
  };
}

export const countSeverity = (diagnostics: readonly Diagnostic[], severity: Diagnostic['severity']): number =>
  diagnostics.filter((d) => d.severity === severity).length;
