/**
 * Placing the lines of a file: which header entries, colours, notes and rows
 * it has, which comments go with which line, and the errors of a line in the
 * wrong place (a colour outside the colour block, a header after a row).
 */
import type { SourceRange } from '../shared/diagnostic.js';
import type { ColorDef, Comment, HeaderEntry, NoteNode, PatternAst, RowNode } from './ast.js';
import type { DiagnosticList } from './limits.js';
import type { LineIndex } from './positions.js';
import { didYouMean } from './suggest.js';
import {
  badColor,
  colorHex,
  COLORS_KEYS,
  HEADER_KEYS,
  LOWER_CASE_HINT,
  NOTE_KEY,
  readHeader,
  ROW_WORDS,
} from './values.js';

/** One line as the CST visitor reads it, before it is placed. */
export type Line = KeyLine | ColorLine | RowLine;

export interface KeyLine {
  kind: 'key';
  key: string;
  keyRange: SourceRange;
  value: string;
  valueRange: SourceRange;
  range: SourceRange;
}
export interface ColorLine {
  kind: 'color';
  word: string;
  wordRange: SourceRange;
  text: string;
  textOffset: number;
  range: SourceRange;
}
export interface RowLine {
  kind: 'row';
  row: RowNode;
  /** Where the line's content ends (its newline), to tell trailing comments from leading ones. */
  end: number;
}

/** Place every line and attach comments: own-line comments to the line below, end-of-row ones to the row. */
export function placeLines(lines: Line[], comments: Comment[], ix: LineIndex, diagnostics: DiagnosticList): PatternAst {
  const entries: HeaderEntry[] = [];
  const colors: ColorDef[] = [];
  const notes: NoteNode[] = [];
  const rows: RowNode[] = [];
  let colorsComments: Comment[] | undefined;
  let inColors = false;
  let c = 0;
  const headComments: Comment[] = [];
  const takeBefore = (offset: number): Comment[] => {
    const out: Comment[] = [];
    while (c < comments.length && comments[c]!.range.offset < offset) out.push(comments[c++]!);
    return out;
  };
  const err = (range: SourceRange, message: string, hint: string): void => {
    diagnostics.push({ severity: 'error', id: 'syntax', message, range, hint });
  };

  lines.forEach((line, i) => {
    const start = line.kind === 'row' ? line.row.range.offset : line.range.offset;
    const leading = takeBefore(start);
    if (i === 0) headComments.push(...leading.splice(0));
    const seenRow = rows.length > 0;
    if (line.kind === 'row') {
      const inside = takeBefore(line.end);
      const trailing = inside.pop();
      line.row.leadingComments = [...leading, ...inside];
      if (trailing) line.row.trailingComment = trailing;
      rows.push(line.row);
      inColors = false;
      return;
    }
    if (line.kind === 'key') {
      if (line.key === NOTE_KEY) {
        const note: NoteNode = { text: line.value, range: line.range, leadingComments: leading };
        (seenRow ? rows[rows.length - 1]!.notes : notes).push(note);
        return;
      }
      if ((COLORS_KEYS as readonly string[]).includes(line.key)) {
        if (seenRow)
          err(line.keyRange, "the 'colors:' block goes before the first row", 'move it up, under the header');
        if (line.value !== '')
          err(
            line.valueRange,
            "nothing goes after 'colors:' on its line",
            "write each colour on its own line below: '  A  #2e6f8e  teal'",
          );
        colorsComments = [...(colorsComments ?? []), ...leading];
        inColors = true;
        return;
      }
      if ((ROW_WORDS as readonly string[]).includes(line.key)) {
        err(line.keyRange, `'${line.key}:' needs its number`, `write it like '${line.key} 3: AB CB'`);
        return;
      }
      if (seenRow)
        err(line.keyRange, `the header line '${line.key}:' comes after a row`, 'header lines go before the first row');
      const { key, keyRange, value, valueRange, range } = line;
      entries.push({ key, value, range, keyRange, valueRange, leadingComments: leading });
      return;
    }
    const def = colorLine(line, inColors && !seenRow, ix, diagnostics);
    if (def) colors.push({ ...def, leadingComments: leading });
  });
  const tailComments = takeBefore(Infinity);
  const { header, diagnostics: headerDiagnostics } = readHeader(entries);
  diagnostics.push(...headerDiagnostics);
  const ast: PatternAst = { header, colors, notes, rows, comments, headComments, tailComments };
  if (colorsComments) ast.colorsComments = colorsComments;
  return ast;
}

/** A colour line, or a word line that is not one (a header key without its ':', a stray word). */
function colorLine(
  line: ColorLine,
  inBlock: boolean,
  ix: LineIndex,
  diagnostics: DiagnosticList,
): Omit<ColorDef, 'leadingComments'> | undefined {
  const push = (range: SourceRange, message: string, hint: string, id = 'syntax'): void => {
    diagnostics.add(() => ({ severity: 'error', id, message, range, hint }));
  };
  const lower = line.word.toLowerCase();
  const known = [...HEADER_KEYS, NOTE_KEY, ...COLORS_KEYS];
  if (known.includes(lower as never)) {
    const at = ix.range(line.wordRange.endOffset, line.wordRange.endOffset);
    diagnostics.push({
      severity: 'error',
      id: 'syntax',
      message: `expected ':' after '${line.word}'`,
      range: line.wordRange,
      hint: `write '${line.word}: ...'`,
      fix: { title: "insert ':'", range: at, replacement: ':' },
    });
    return undefined;
  }
  if (line.word.length > 1) {
    const message = inBlock
      ? `'${line.word}' is not a colour key: a key is one capital letter A-Z`
      : `'${line.word}' is not a header key, a colour or a row${didYouMean(lower, [...known, ...ROW_WORDS])}`;
    push(
      line.wordRange,
      message,
      inBlock ? "write the colour as 'A  #2e6f8e  teal'" : "header lines look like 'title: Kestrel Fan'",
    );
    return undefined;
  }
  if (!inBlock)
    push(
      line.wordRange,
      `the colour line '${line.word}' is outside the 'colors:' block`,
      "put colour lines under a 'colors:' line, before the first row",
    );
  const key = line.word.toUpperCase();
  if (key !== line.word) {
    diagnostics.push({
      severity: 'error',
      id: 'syntax',
      message: `colour keys are capital letters: '${line.word}' should be '${key}'`,
      range: line.wordRange,
      hint: LOWER_CASE_HINT,
      fix: { title: `write '${key}'`, range: line.wordRange, replacement: key },
    });
  }
  const text = line.text;
  const m = /^(\s*)(\S*)(\s*)([\s\S]*?)\s*$/.exec(text)!;
  const written = m[2]!;
  const cStart = line.textOffset + m[1]!.length;
  const colorRange = ix.range(cStart, cStart + written.length);
  const hex = written === '' ? null : colorHex(written);
  if (written === '')
    push(
      line.wordRange,
      `colour '${key}' has no colour`,
      "write a hex colour or a CSS colour name after the key: 'A  #2e6f8e  teal'",
      'bad-color',
    );
  else if (hex === null) diagnostics.push(badColor(key, written, colorRange));
  return { key, written, hex, name: m[4]!, range: line.range, keyRange: line.wordRange, colorRange };
}
