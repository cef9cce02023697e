/**
 * Highlighting for `.ffp` pattern files in the editor: a small line-based
 * reader that follows the lexer's line kinds (parser/tokens.ts) closely
 * enough to colour them, and never judges them; the checks do that. Loaded
 * only with the editor page.
 */
import { HighlightStyle, StreamLanguage, syntaxHighlighting, type StreamParser } from '@codemirror/language';
import { tags } from '@lezer/highlight';
import { Prec, type Extension } from '@uiw/react-codemirror';

type LineKind = 'blank' | 'comment' | 'header' | 'color' | 'row' | 'other';

export interface FfpState {
  /** After a `colors:` line, indented word lines are colours; after a row, indented unit lines continue it. */
  inColors: boolean;
  inRow: boolean;
  line: LineKind;
  /** Which part of the line comes next: 0 the key or row word, 1 after it, 2 after the colon or the colour. */
  part: number;
  afterParen: boolean;
}

function lineKind(stream: { match(p: RegExp, consume?: boolean): unknown }, state: FfpState): LineKind {
  const at = (p: RegExp) => Boolean(stream.match(p, false));
  if (at(/^[ \t]*$/)) return 'blank';
  if (at(/^[ \t]*#/)) return 'comment';
  if (state.inRow && at(/^[ \t]+[-*+(A-Z]/)) return 'row';
  if (at(/^[ \t]*[A-Za-z][\w-]*[ \t]*:/)) return 'header';
  if (at(/^[ \t]*(?:rows?|rounds?)(?![\w-])/i) || at(/^[ \t]*[A-Za-z]{2,}[ \t]*\d/)) return 'row';
  if (state.inColors && at(/^[ \t]*[A-Za-z]/)) return 'color';
  return 'other';
}

export const ffpStream: StreamParser<FfpState> = {
  name: 'ffp',
  startState: () => ({ inColors: false, inRow: false, line: 'blank', part: 0, afterParen: false }),
  copyState: (s) => ({ ...s }),
  token(stream, state) {
    if (stream.sol()) {
      const kind = lineKind(stream, state);
      // A continuation line is still the row: its units come straight away.
      state.part = kind === 'row' && state.inRow && /^[ \t]/.test(stream.string) ? 2 : 0;
      state.line = kind;
      state.afterParen = false;
      if (kind !== 'blank') state.inRow = kind === 'row';
      if (kind === 'header') state.inColors = /^[ \t]*colou?rs[ \t]*:/i.test(stream.string);
      if (kind === 'row') state.inColors = false;
    }
    if (stream.eatSpace()) return null;
    if (state.line === 'comment' || (state.line === 'row' && stream.peek() === '#')) {
      stream.skipToEnd();
      return 'comment';
    }
    if (state.line === 'header') return headerToken(stream, state);
    if (state.line === 'color') return colorToken(stream, state);
    if (state.line === 'row') return rowToken(stream, state);
    stream.skipToEnd();
    return null;
  },
  languageData: { commentTokens: { line: '#' } },
};

type Stream = Parameters<StreamParser<FfpState>['token']>[0];

function headerToken(stream: Stream, state: FfpState): string | null {
  if (state.part === 0 && stream.match(/^[A-Za-z][\w-]*/)) {
    state.part = 1;
    return 'propertyName';
  }
  if (state.part === 1 && stream.eat(':')) {
    state.part = 2;
    return 'punctuation';
  }
  stream.skipToEnd();
  return 'string';
}

function colorToken(stream: Stream, state: FfpState): string | null {
  state.part += 1;
  if (state.part === 1 && stream.match(/^\S+/)) return 'variableName.definition';
  if (state.part === 2 && stream.match(/^\S+/)) return 'color';
  stream.skipToEnd();
  return 'string';
}

function rowToken(stream: Stream, state: FfpState): string | null {
  const afterParen = state.afterParen;
  state.afterParen = false;
  if (state.part < 2) {
    if (stream.eat(':')) {
      state.part = 2;
      return 'punctuation';
    }
    if (stream.match(/^\d+/)) return 'number';
    if (stream.eat('-')) return 'operator';
    if (stream.match(/^[A-Za-z]+/)) return 'keyword';
    stream.next();
    return null;
  }
  if (afterParen && stream.match(/^(?:[x×][ \t]*\d+|X\d+)/)) return 'number';
  if (stream.eat('(')) return 'paren';
  if (stream.eat(')')) {
    state.afterParen = true;
    return 'paren';
  }
  if (stream.match(/^[*+-]/)) return 'operator';
  if (stream.match(/^[A-Za-z]+/)) return 'variableName';
  if (stream.match(/^\d+/)) return 'number';
  stream.next();
  return null;
}

/**
 * Colours for the light editor (on white) and the dark one (on the one-dark
 * background); tests/web/contrast.test.ts holds each to 4.5:1. Tailwind's
 * 800 and 300 shades, written out because the bundle does not carry the palette.
 */
export const FFP_COLORS = {
  light: {
    comment: '#45556c', // slate-600
    key: '#005f5a', // teal-800
    row: '#5d0ec0', // violet-800
    number: '#193cb8', // blue-800
    color: '#a50036', // rose-800
    mark: '#8a0194', // fuchsia-800
  },
  dark: {
    comment: '#90a1b9', // slate-400
    key: '#46ecd5', // teal-300
    row: '#c4b4ff', // violet-300
    number: '#8ec5ff', // blue-300
    color: '#ffa1ad', // rose-300
    mark: '#f4a8ff', // fuchsia-300
  },
} as const;

function style(c: (typeof FFP_COLORS)['light' | 'dark']): HighlightStyle {
  return HighlightStyle.define([
    { tag: tags.comment, color: c.comment, fontStyle: 'italic' },
    { tag: [tags.propertyName, tags.definition(tags.variableName)], color: c.key, fontWeight: '600' },
    { tag: tags.keyword, color: c.row, fontWeight: '600' },
    { tag: tags.number, color: c.number },
    { tag: tags.color, color: c.color },
    { tag: [tags.operator, tags.paren], color: c.mark, fontWeight: '600' },
  ]);
}

const language = StreamLanguage.define(ffpStream);
const light = syntaxHighlighting(style(FFP_COLORS.light));
// Above the dark theme's own highlighting, so the two never disagree on a token.
const dark = Prec.highest(syntaxHighlighting(style(FFP_COLORS.dark)));

/** The language and the highlight style that matches the editor's theme. */
export const ffpHighlighting = (isDark: boolean): Extension => [language, isDark ? dark : light];
