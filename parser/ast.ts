/**
 * The pattern AST: what the file says, with a source range on every node.
 * Built by `to-ast.ts` from Chevrotain's CST; meaning (which beads are shared,
 * where they land) is the weave engine's job, not the parser's.
 */
import type { SourceRange } from '../shared/diagnostic.js';

export type Layout = 'flat' | 'tube' | 'round';
export type KeyOrder = 'pickup' | 'placed';
export type BeadShape = 'round' | 'cylinder';

export interface Comment {
  text: string; // without the leading '#'
  range: SourceRange;
}

export interface HeaderEntry {
  key: string; // as written, lower-cased
  value: string; // trimmed
  range: SourceRange;
  keyRange: SourceRange;
  valueRange: SourceRange;
  /** Comments on their own lines just above this line, kept by `fmt`. */
  leadingComments?: Comment[];
}

export interface ColorDef {
  key: string; // one capital letter
  /** The colour as written: `#RGB`, `#RRGGBB` or a CSS Color 4 name. */
  written: string;
  /** Normalised `#rrggbb` (lower case), or null when the colour could not be read. */
  hex: string | null;
  name: string; // '' when none is given
  range: SourceRange;
  keyRange: SourceRange;
  colorRange: SourceRange;
  /** Comments on their own lines just above this line, kept by `fmt`. */
  leadingComments?: Comment[];
}

export type Mark = '' | '*' | '+';

export interface UnitNode {
  type: 'unit';
  mark: Mark;
  /** The colour keys as written, one per new bead, e.g. "CCB". */
  keys: string;
  range: SourceRange;
}

export interface SkipNode {
  type: 'skip';
  range: SourceRange;
}

export interface GroupNode {
  type: 'group';
  items: ItemNode[];
  times: number;
  range: SourceRange;
}

export type ItemNode = UnitNode | SkipNode | GroupNode;

export interface NoteNode {
  text: string;
  range: SourceRange;
  /** Comments on their own lines just above this note, kept by `fmt`. */
  leadingComments?: Comment[];
}

export interface RowNode {
  /** The word used: `row`/`rows` or `round`/`rounds`. */
  word: 'row' | 'round';
  from: number;
  to: number; // === from unless a range `rows N-M`
  items: ItemNode[];
  notes: NoteNode[];
  range: SourceRange;
  /** Range of the number (or `N-M`), for `row-number` diagnostics. */
  numberRange: SourceRange;
  /** Comments on their own lines just above this row, kept by `fmt`. */
  leadingComments: Comment[];
  /** A comment at the end of the row's last line. */
  trailingComment?: Comment;
}

/** `row 3` or `rows 2-5`, as messages name a row line. */
export const rowLabel = (row: RowNode): string =>
  row.from === row.to ? `${row.word} ${row.from}` : `${row.word}s ${row.from}-${row.to}`;

/** The header values with defaults applied; raw entries stay in `entries`. */
export interface Header {
  title: string;
  designer?: string;
  beads: { size: string; shape: BeadShape }; // size like "11/0"
  layout: Layout;
  order: KeyOrder;
  thread?: string;
  description?: string;
  license?: string;
  entries: HeaderEntry[];
}

export interface PatternAst {
  header: Header;
  colors: ColorDef[];
  /** `note:` lines before the first row. */
  notes: NoteNode[];
  rows: RowNode[];
  /** Every comment in the file, in order, for tools that need them all. */
  comments: Comment[];
  /** Comments before the first line of the file that is not a comment. */
  headComments?: Comment[];
  /** Comments just above the `colors:` line. */
  colorsComments?: Comment[];
  /** Comments after the last line that is not a comment. */
  tailComments?: Comment[];
}
