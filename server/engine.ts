/**
 * The one place the server calls the pure core: it turns a pattern's text
 * into what a version stores (diagnostics, model, counts for the library).
 */
import { createHash } from 'node:crypto';
import { fileStart, sortDiagnostics, type Diagnostic, type Result } from '../shared/diagnostic.js';
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

type Compile = (text: string) => Result<{ ast: PatternAst; model: Model | null }>;
type Parse = (text: string) => Result<PatternAst>;

// The engine and parser modules are loaded by name so the server runs (storing
// the parser's diagnostics only) while the engine is not yet part of the build.
async function optional<T>(specifier: string, name: string): Promise<T | null> {
  try {
    const mod = (await import(specifier)) as Record<string, unknown>;
    return typeof mod[name] === 'function' ? (mod[name] as T) : null;
  } catch (error) {
    if ((error as { code?: string }).code === 'ERR_MODULE_NOT_FOUND') return null;
    throw error;
  }
}

let loaded: Promise<{ compile: Compile | null; parse: Parse | null }> | undefined;
const core = () =>
  (loaded ??= (async () => ({
    compile: await optional<Compile>('../shared/compile.js', 'compile'),
    parse: await optional<Parse>('../parser/index.js', 'parse'),
  }))());

export const contentHash = (source: string): string => createHash('sha256').update(source, 'utf8').digest('hex');

const rowCount = (ast: PatternAst): number => ast.rows.reduce((most, row) => Math.max(most, row.to), 0);

export async function analyse(source: string): Promise<Analysis> {
  const { compile, parse } = await core();
  if (compile) {
    const { value, diagnostics } = compile(source);
    const { ast, model } = value;
    return {
      title: ast.header.title || 'Untitled',
      layout: ast.header.layout,
      rows: model ? model.rows.length : rowCount(ast),
      units: model ? model.units.length : null,
      beads: model ? model.beads.length : null,
      colors: model
        ? model.palette.map(({ key, hex, name }) => ({ key, hex, name }))
        : ast.colors.map((c) => ({ key: c.key, hex: c.hex ?? '#000000', name: c.name })),
      diagnostics: sortDiagnostics(diagnostics),
      model,
    };
  }
  if (parse) {
    const { value: ast, diagnostics } = parse(source);
    return {
      title: ast.header.title || 'Untitled',
      layout: ast.header.layout,
      rows: rowCount(ast),
      units: null,
      beads: null,
      colors: ast.colors.map((c) => ({ key: c.key, hex: c.hex ?? '#000000', name: c.name })),
      diagnostics: sortDiagnostics(diagnostics),
      model: null,
    };
  }
  const unavailable: Diagnostic = {
    severity: 'info',
    id: 'not-checked',
    message: 'This server has no pattern checker installed; the text was stored unchecked.',
    range: fileStart,
  };
  return { title: 'Untitled', layout: 'flat', rows: 0, units: null, beads: null, colors: [], diagnostics: [unavailable], model: null };
}

export const countSeverity = (diagnostics: readonly Diagnostic[], severity: Diagnostic['severity']): number =>
  diagnostics.filter((d) => d.severity === severity).length;
