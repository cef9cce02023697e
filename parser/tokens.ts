/**
 * Token types of the notation. The file is line-oriented, so the lexer runs in
 * two modes: `line` at the start of each line, where a header, note or colour
 * line is one token, and `row` inside a row line (and its continuation
 * lines). Keeping the modes in the lexer keeps the grammar small: it only ever
 * sees whole, already classified lines.
 */
import { createToken, Lexer, type TokenType } from './chevrotain.js';

const LINE = 'line';
const ROW = 'row';
export const modes = { LINE, ROW } as const;

/** Blank space and empty lines between lines: nothing in the grammar depends on them. */
export const Gap = createToken({ name: 'Gap', pattern: /[ \t\r\n]+/, group: Lexer.SKIPPED, line_breaks: true });

/** Spaces inside a row or before the end of a line. */
export const Blank = createToken({ name: 'Blank', pattern: /[ \t\r]+/, group: Lexer.SKIPPED });

/** `# ...` to the end of the line; collected apart from the token stream so `fmt` can keep them. */
export const Comment = createToken({
  name: 'Comment',
  // eslint-disable-next-line no-control-regex -- every character but the line breaks, as a positive range
  pattern: /#[\u0000-\u0009\u000b\u000c\u000e-\uffff]*/,
  group: 'comments',
});

/**
 * A whole `key: value` line: `title: Kestrel Fan`, `note: ...`, `colors:`.
 * One token for the line keeps the token count of a file with many notes low;
 * the AST step splits key and value.
 */
export const HeaderKey = createToken({
  name: 'HeaderKey',
  // Not `row2:`, which is a row with its space left out (RowStart reads it).
  // eslint-disable-next-line no-control-regex -- every character but the line break, as a positive range
  pattern: /(?!(?:rows?|rounds?)\d)[A-Za-z][\w-]*[ \t]*:[\u0000-\u0009\u000b-\uffff]*/i,
});

/**
 * `row`, `rows`, `round`, `rounds`, or any other word of two or more letters
 * followed by a number, so a typo like `rwo 3:` still reads as a row and can
 * get a did-you-mean instead of a wall of errors.
 */
export const RowStart = createToken({
  name: 'RowStart',
  pattern: /(?:rows?|rounds?)(?![\w-])|[A-Za-z]{2,}(?=[ \t]*\d)/i,
  push_mode: ROW,
});

/** Any other line that starts with a word: a colour line (`A  #F4F1EA  chalk`), as one token. */
export const ColorKey = createToken({
  name: 'ColorKey',
  // eslint-disable-next-line no-control-regex -- every character but the line break, as a positive range
  pattern: /[A-Za-z][\w-]*[\u0000-\u0009\u000b-\uffff]*/,
});

/** Ends a row line and returns to the `line` mode. */
export const LineEnd = createToken({ name: 'LineEnd', pattern: /\r?\n/, line_breaks: true, pop_mode: true });

/** A line break followed by an indented line that starts like units: the row goes on. */
export const Continuation = createToken({
  name: 'Continuation',
  pattern: /\r?\n(?=[ \t]+[-*+(A-Z])/,
  group: Lexer.SKIPPED,
  line_breaks: true,
});

/** Tokens that may stand in a row's unit list, kept in one CST array so their order survives. */
export const BodyToken = createToken({ name: 'BodyToken', pattern: Lexer.NA });

/** A repeat count after a group: `x3`, `x 3`, `×3`, `X3`. Before `Units` so `x3` is never read as keys. */
export const Times = createToken({ name: 'Times', pattern: /[x×][ \t]*\d+|X\d+/, categories: BodyToken });

/**
 * A run of units and skips separated by spaces (`- *AAAA BA +AAA`) as one token; the AST
 * step splits it. A row of a thousand plain units is then a handful of
 * tokens, which keeps lexing and parsing a large file cheap. Lower-case keys
 * are lexed too, so the AST step can say "colour keys are capital letters".
 * A run stops before a repeat count (`AB x3` leaves `x3` for `Times`). Nothing
 * in the pattern looks behind a run of letters, so a long line of letters is
 * matched in one pass, never re-tried letter by letter.
 */
export const Units = createToken({
  name: 'Units',
  pattern: /(?:[*+][A-Za-z]*|[A-Za-z]+|-)(?:[ \t]+(?![x×][ \t]*\d|X\d|-[ \t]*\d)(?:[*+][A-Za-z]*|[A-Za-z]+|-))*[ \t]*/,
  categories: BodyToken,
});

/** The dash of a row range `rows 2-5` (before `Units`, which takes skips). */
export const Dash = createToken({ name: 'Dash', pattern: /-(?=[ \t]*\d)/, categories: BodyToken });

export const RowNumber = createToken({ name: 'RowNumber', pattern: /\d+/, categories: BodyToken });
export const Colon = createToken({ name: 'Colon', pattern: /:/, categories: BodyToken });
export const LParen = createToken({ name: 'LParen', pattern: /\(/ });
export const RParen = createToken({ name: 'RParen', pattern: /\)/ });

/**
 * Any other single character, in every mode, collected apart like comments.
 * The lexer then never fails, and so never falls back to trying every
 * pattern at every following character: a line of stray characters costs
 * no more than a line of units. `lexer.ts` reports them.
 */
export const Stray = createToken({
  name: 'Stray',
  // eslint-disable-next-line no-control-regex -- every character but the blanks, as a positive range
  pattern: /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u0021-\uffff]/,
  group: 'strays',
});

export const lexerDefinition: { modes: Record<string, TokenType[]>; defaultMode: string } = {
  modes: {
    [LINE]: [Gap, Comment, HeaderKey, RowStart, ColorKey, Stray],
    [ROW]: [Continuation, LineEnd, Blank, Comment, Times, Dash, Units, RowNumber, Colon, LParen, RParen, Stray],
  },
  defaultMode: LINE,
};

export const allTokens: TokenType[] = [
  Gap,
  Blank,
  Comment,
  HeaderKey,
  RowStart,
  ColorKey,
  LineEnd,
  Continuation,
  BodyToken,
  Times,
  Units,
  Dash,
  RowNumber,
  Colon,
  LParen,
  RParen,
  Stray,
];
