/**
 * The limits of NOTATION.md section 7, checked before anything large is built:
 * 1 MiB of text, 10,000 characters a line, 200,000 units after repeats, and
 * (ours) groups nested at most 16 deep, so the recursive parser cannot run
 * out of stack on hostile input.
 */
import type { IToken } from './chevrotain.js';
import type { Diagnostic } from '../shared/diagnostic.js';
import { rowLabel, type ItemNode, type PatternAst } from './ast.js';
import type { LineIndex } from './positions.js';

export const MAX_BYTES = 1024 * 1024;
export const MAX_LINE = 10_000;
export const UNIT_LIMIT = 200_000;
export const MAX_NESTING = 16;

/** More than this many problems in one file is noise: the first ones are listed, and a note says how many more. */
export const MAX_DIAGNOSTICS = 1000;

/**
 * A list of diagnostics that stops keeping them past MAX_DIAGNOSTICS and
 * counts the rest, so a file of half a million bad lines does not build
 * half a million messages. `full` lets a hot loop skip building one at all.
 */
export class DiagnosticList extends Array<Diagnostic> {
  dropped = 0;

  get full(): boolean {
    return this.length >= MAX_DIAGNOSTICS;
  }

  /** Builds the diagnostic only if it will be kept. */
  add(make: () => Diagnostic): void {
    if (this.full) this.dropped++;
    else super.push(make());
  }

  override push(...items: Diagnostic[]): number {
    for (const d of items) {
      if (this.length < MAX_DIAGNOSTICS) super.push(d);
      else this.dropped++;
    }
    return this.length;
  }
}

const tooLarge = (message: string, range: Diagnostic['range'], hint: string): Diagnostic => ({
  severity: 'error',
  id: 'too-large',
  message,
  range,
  hint,
});

/** UTF-8 length without encoding the text (the core stays free of Buffer). */
export function utf8Length(text: string): number {
  let n = text.length;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0x80) n += c < 0x800 ? 1 : c >= 0xd800 && c <= 0xdbff ? 0 : c >= 0xdc00 && c <= 0xdfff ? 1 : 2;
  }
  return n;
}

export function sizeDiagnostic(bytes: number, ix: LineIndex): Diagnostic | undefined {
  if (bytes <= MAX_BYTES) return undefined;
  return tooLarge(
    `the file is ${bytes.toLocaleString('en')} bytes; the limit is 1 MiB (${MAX_BYTES.toLocaleString('en')} bytes)`,
    ix.range(0, 0),
    'split the pattern into smaller files',
  );
}

/** Lines over the limit; the file is refused when there is any. */
export function lineDiagnostics(text: string, ix: LineIndex): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (let line = 1; line <= ix.lineCount && out.length < 20; line++) {
    const start = ix.lineStart(line);
    const end = line < ix.lineCount ? ix.lineStart(line + 1) - 1 : text.length;
    if (end - start <= MAX_LINE) continue;
    const length = [...text.slice(start, end)].length;
    if (length <= MAX_LINE) continue;
    out.push(
      tooLarge(
        `line ${line} is ${length.toLocaleString('en')} characters long; the limit is ${MAX_LINE.toLocaleString('en')}`,
        ix.range(start, end),
        'break a long row over several lines, each indented by a space, or use groups like (AB CB)x20',
      ),
    );
  }
  return out;
}

/**
 * Drops every row line whose groups nest deeper than MAX_NESTING, with one
 * diagnostic each, before the tokens reach the recursive parser.
 */
export function guardNesting(tokens: IToken[], ix: LineIndex): { tokens: IToken[]; diagnostics: Diagnostic[] } {
  const diagnostics: Diagnostic[] = [];
  let kept: IToken[] | undefined;
  let lineStart = 0;
  let depth = 0;
  let tooDeep: IToken | undefined;
  tokens.forEach((t, i) => {
    const name = t.tokenType.name;
    // Lines before a row (header, notes, colours) are single tokens: keep them as they come.
    if (name === 'RowStart') {
      kept?.push(...tokens.slice(lineStart, i));
      lineStart = i;
    } else if (name === 'LParen' && ++depth > MAX_NESTING && !tooDeep) tooDeep = t;
    else if (name === 'RParen') depth = Math.max(0, depth - 1);
    else if (name === 'LineEnd') {
      if (tooDeep) {
        kept ??= tokens.slice(0, lineStart);
        diagnostics.push(
          tooLarge(
            `groups nest more than ${MAX_NESTING} deep; this row is left out`,
            ix.range(tooDeep.startOffset, tooDeep.startOffset + 1),
            'write the inner groups out, or repeat fewer levels',
          ),
        );
      } else kept?.push(...tokens.slice(lineStart, i + 1));
      lineStart = i + 1;
      depth = 0;
      tooDeep = undefined;
    }
  });
  kept?.push(...tokens.slice(lineStart));
  return { tokens: kept ?? tokens, diagnostics };
}

/** Units and skips a list stands for once repeats are expanded, without expanding it. */
export function countItems(items: readonly ItemNode[]): number {
  let n = 0;
  for (const item of items) n += item.type === 'group' ? item.times * countItems(item.items) : 1;
  return n;
}

/**
 * One `too-large` at the row where the expanded pattern passes UNIT_LIMIT. A
 * range is named whole (`rows 2-40000`), under its label: its length is the likely slip.
 */
export function unitLimitDiagnostic(ast: PatternAst): Diagnostic | undefined {
  let total = 0;
  for (const row of ast.rows) {
    const each = countItems(row.items);
    const rows = Math.max(1, row.to - row.from + 1);
    total += each * rows;
    if (total <= UNIT_LIMIT) continue;
    const limit = `the pattern expands to more than ${UNIT_LIMIT.toLocaleString('en')} units`;
    const label = rowLabel(row);
    if (rows === 1)
      return tooLarge(`${limit} at ${label}`, row.range, 'check the repeat counts; a pattern this large is refused');
    return tooLarge(
      `${limit} at ${label}, which repeats ${each.toLocaleString('en')} unit${each === 1 ? '' : 's'} on each of ${rows.toLocaleString('en')} ${row.word}s`,
      {
        ...row.range,
        endLine: row.numberRange.endLine,
        endColumn: row.numberRange.endColumn,
        endOffset: row.numberRange.endOffset,
      },
      `check the range ${row.from}-${row.to} and the repeat counts; a pattern this large is refused`,
    );
  }
  return undefined;
}
