/**
 * The lexer: text to tokens plus the comments, with lexing errors turned into
 * diagnostics a designer can act on.
 */
import { createTokenInstance, Lexer, type IToken } from 'chevrotain';
import type { Diagnostic } from '../shared/diagnostic.js';
import type { LineIndex } from './positions.js';
import { lexerDefinition, LineEnd } from './tokens.js';

const lexer = new Lexer(lexerDefinition, { positionTracking: 'onlyOffset', ensureOptimizations: true });

export interface Lexed {
  tokens: IToken[];
  comments: IToken[];
  diagnostics: Diagnostic[];
}

const ROW_LINE = /^[ \t]*(?:rows?|rounds?|[A-Za-z]{2,}[ \t]*\d)/i;

export function lex(text: string, index: LineIndex): Lexed {
  const result = lexer.tokenize(text);
  const tokens = result.tokens;
  // Every line rule ends with a LineEnd; a file without a final newline gets an empty one.
  if (tokens.length > 0 && tokens[tokens.length - 1]!.tokenType !== LineEnd) {
    tokens.push(createTokenInstance(LineEnd, '', text.length, text.length - 1, NaN, NaN, NaN, NaN));
  }
  const diagnostics = result.errors.map((e): Diagnostic => {
    const range = index.range(e.offset, e.offset + e.length);
    const found = text.slice(e.offset, e.offset + e.length);
    const lineText = text.slice(index.lineStart(range.line), e.offset);
    const inRow = ROW_LINE.test(lineText) && /[:\d]/.test(lineText);
    return {
      severity: 'error',
      id: 'syntax',
      message: `'${printable(found)}' cannot stand here`,
      range,
      hint: inRow
        ? "a row holds units of colour keys A-Z (optionally after '*' or '+'), groups like '(AB CB)x2', skips '-', and a comment after '#'"
        : "a line starts with a header key and ':' ('title: ...'), a colour key ('A  #2e6f8e  teal'), 'row N:', 'note:' or '#'",
    };
  });
  return { tokens, comments: result.groups.comments ?? [], diagnostics };
}

/** Shorten and make control characters visible so a message never breaks the terminal. */
function printable(s: string): string {
  const shown = [...s].slice(0, 20).join('');
  return (
    // eslint-disable-next-line no-control-regex -- control characters are exactly what is matched
    shown.replace(/[\u0000-\u001f\u007f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`) +
    (shown.length < s.length ? '…' : '')
  );
}
