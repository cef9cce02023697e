/**
 * The lexer: text to tokens plus the comments, with stray characters turned
 * into diagnostics a designer can act on.
 */
import { createTokenInstance, Lexer, type IToken } from './chevrotain.js';
import type { Diagnostic } from '../shared/diagnostic.js';
import { lookAlike, MAX_QUOTED } from './characters.js';
import type { LineIndex } from './positions.js';
import { ColorKey, HeaderKey, lexerDefinition, LineEnd } from './tokens.js';

const lexer = new Lexer(lexerDefinition, { positionTracking: 'onlyOffset', ensureOptimizations: true });

export interface Lexed {
  tokens: IToken[];
  comments: IToken[];
  diagnostics: Diagnostic[];
}

/** Past this many, further stray characters add nothing a designer can use. */
const MAX_LEXING_ERRORS = 1000;

const ROW_LINE = /^[ \t]*(?:rows?|rounds?|[A-Za-z]{2,}[ \t]*\d)/i;

export function lex(text: string, index: LineIndex): Lexed {
  const result = lexer.tokenize(text);
  const tokens = result.tokens;
  // A row ends with a LineEnd; a file that ends inside a row without a final newline gets an empty one.
  const last = tokens[tokens.length - 1];
  if (last && last.tokenType !== LineEnd && last.tokenType !== HeaderKey && last.tokenType !== ColorKey) {
    tokens.push(createTokenInstance(LineEnd, '', text.length, text.length - 1, NaN, NaN, NaN, NaN));
  }
  const spans = strayRuns(result.groups.strays ?? []);
  for (const e of result.errors) spans.push({ offset: e.offset, end: e.offset + e.length });
  spans.sort((a, b) => a.offset - b.offset);
  // Whether a line is a row is decided once per line: a line can hold thousands of stray characters.
  const rowLine = new Map<number, boolean>();
  const diagnostics = spans.slice(0, MAX_LEXING_ERRORS).map(({ offset, end }): Diagnostic => {
    const range = index.range(offset, end);
    let inRow = rowLine.get(range.line);
    if (inRow === undefined) {
      const start = index.lineStart(range.line);
      const head = text.slice(start, Math.min(offset, start + 40));
      inRow = ROW_LINE.test(head) && /[:\d]/.test(head);
      rowLine.set(range.line, inRow);
    }
    const hint = inRow
      ? "a row holds units of colour keys A-Z (optionally after '*' or '+'), groups like '(AB CB)x2', skips '-', and a comment after '#'"
      : "a line starts with a header key and ':' ('title: ...'), a colour key ('A  #2e6f8e  teal'), 'row N:', 'note:' or '#'";
    const run = text.slice(offset, end);
    const shown = printable(run);
    const look = lookAlike(run, shown);
    const d: Diagnostic = {
      severity: 'error',
      id: 'syntax',
      message: look ? look.message : `'${shown}' cannot stand here`,
      range,
      hint: look?.hint ?? hint,
    };
    const r = look?.replacement;
    if (r !== undefined) d.fix = { title: r === '' ? 'delete it' : `write '${r}'`, range, replacement: r };
    return d;
  });
  return { tokens, comments: result.groups.comments ?? [], diagnostics };
}

/** Stray characters next to each other make one problem, not one per character. */
function strayRuns(strays: IToken[]): { offset: number; end: number }[] {
  const runs: { offset: number; end: number }[] = [];
  for (const t of strays) {
    const last = runs[runs.length - 1];
    if (last && last.end === t.startOffset) last.end += t.image.length;
    else runs.push({ offset: t.startOffset, end: t.startOffset + t.image.length });
  }
  return runs;
}

/** Shorten and make control characters visible so a message never breaks the terminal. */
function printable(s: string): string {
  const shown = [...s].slice(0, MAX_QUOTED).join('');
  return (
    // eslint-disable-next-line no-control-regex -- control characters are exactly what is matched
    shown.replace(/[\u0000-\u001f\u007f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`) +
    (shown.length < s.length ? '…' : '')
  );
}
