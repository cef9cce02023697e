/**
 * The parser's public API: text or bytes in, a pattern AST and every
 * diagnostic out. Nothing here throws on user input.
 */
import { fileStart, sortDiagnostics, type Diagnostic, type Result } from '../shared/diagnostic.js';
import type { PatternAst } from './ast.js';
import { checkPattern } from './checks.js';
import { parseTokens } from './grammar.js';
import { lex } from './lexer.js';
import {
  DiagnosticList,
  guardNesting,
  lineDiagnostics,
  MAX_BYTES,
  MAX_DIAGNOSTICS,
  sizeDiagnostic,
  unitLimitDiagnostic,
  utf8Length,
} from './limits.js';
import { LineIndex } from './positions.js';
import { toAst } from './to-ast.js';

export type * from './ast.js';
export { expandRow, type FlatItem } from './expand.js';
export { format } from './format.js';
export { countItems, MAX_BYTES, MAX_DIAGNOSTICS, MAX_LINE, UNIT_LIMIT } from './limits.js';
export { LineIndex } from './positions.js';

/** An AST with nothing in it, for input that is refused before it is read. */
export function emptyAst(): PatternAst {
  return {
    header: { title: '', beads: { size: '11/0', shape: 'round' }, layout: 'flat', order: 'pickup', entries: [] },
    colors: [],
    notes: [],
    rows: [],
    comments: [],
  };
}

export function parse(text: string): Result<PatternAst> {
  try {
    return parseText(text);
  } catch (e) {
    // A bug of ours, not the user's: say so plainly rather than crash the caller.
    return { value: emptyAst(), diagnostics: [internalError(e)] };
  }
}

function parseText(input: string): Result<PatternAst> {
  // A byte-order mark is not content; a space keeps every offset pointing at the caller's string.
  const text = input.charCodeAt(0) === 0xfeff ? ` ${input.slice(1)}` : input;
  const ix = new LineIndex(text);
  const size = text.length * 3 <= MAX_BYTES ? undefined : sizeDiagnostic(utf8Length(text), ix);
  const refused = size ? [size] : lineDiagnostics(text, ix);
  if (refused.length > 0) return { value: emptyAst(), diagnostics: refused };

  const lexed = lex(text, ix);
  const guarded = guardNesting(lexed.tokens, ix);
  const parsed = parseTokens(guarded.tokens);
  const strayLines = new Set(lexed.diagnostics.map((d) => d.range.line));
  const ast = toAst(parsed.cst, ix, lexed.comments, strayLines);
  const tooLarge = unitLimitDiagnostic(ast.value);
  const checked = tooLarge ? new DiagnosticList(tooLarge) : checkPattern(ast.value, ast.shape);
  const lookAlikeColon = (d: Diagnostic): boolean =>
    d.range.endOffset === d.range.offset + 1 && ast.shape.colonLookAlikes.has(d.range.offset);
  const diagnostics: Diagnostic[] = [
    ...lexed.diagnostics.filter((d) => !lookAlikeColon(d)),
    ...guarded.diagnostics,
    ...parsed.errors.map((e): Diagnostic => ({
      severity: 'error',
      id: 'syntax',
      message: `'${e.token.image}' was not expected here`,
      range: ix.range(e.token.startOffset, e.token.startOffset + e.token.image.length),
      hint: 'check the line against the notation: header lines, colour lines under colors:, then rows',
    })),
    ...ast.diagnostics,
    ...checked,
  ];
  return { value: ast.value, diagnostics: capped(diagnostics, ast.diagnostics.dropped + checked.dropped) };
}

function capped(all: Diagnostic[], dropped: number): Diagnostic[] {
  if (all.length <= MAX_DIAGNOSTICS && dropped === 0) return sortDiagnostics(all);
  // A numeric sort first: sorting a million diagnostics with the full comparison is slow.
  const byPlace = [...all].sort((a, b) => a.range.offset - b.range.offset || a.range.endOffset - b.range.endOffset);
  const kept = byPlace.slice(0, MAX_DIAGNOSTICS);
  const more = all.length - kept.length + dropped;
  const next = byPlace[kept.length] ?? kept[kept.length - 1]!;
  return sortDiagnostics([
    ...kept,
    {
      severity: 'info',
      id: 'too-many-problems',
      message: `${more.toLocaleString('en')} more problem${more === 1 ? '' : 's'} from here on are not listed`,
      range: next.range,
      hint: 'fix the problems above and check again',
    },
  ]);
}

export function parseBytes(bytes: Uint8Array): Result<PatternAst> {
  if (bytes.length > MAX_BYTES) {
    const d = sizeDiagnostic(bytes.length, new LineIndex(''))!;
    return { value: emptyAst(), diagnostics: [d] };
  }
  const nul = bytes.indexOf(0);
  if (nul !== -1) return notText(`this file holds binary data (a zero byte at byte ${nul + 1}), not a text pattern`);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return notText('this file is not UTF-8 text');
  }
  return parse(text);
}

const notText = (message: string): Result<PatternAst> => ({
  value: emptyAst(),
  diagnostics: [
    {
      severity: 'error',
      id: 'not-text',
      message,
      range: fileStart,
      hint: 'a pattern is a plain UTF-8 text file (.ffp); save it as UTF-8 from your editor',
    },
  ],
});

function internalError(e: unknown): Diagnostic {
  const what = e instanceof Error ? e.message : String(e);
  return {
    severity: 'error',
    id: 'internal',
    message: `Fourfold could not read this file because of a fault of its own (${what})`,
    range: fileStart,
    hint: 'please report this, with the file',
  };
}
