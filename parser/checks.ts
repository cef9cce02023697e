/**
 * The checks that need only the text (NOTATION.md sections 2 and 3): colours
 * used but not defined, defined but not used or defined twice, row numbers,
 * unknown header keys, and marks or skips where the layout rules forbid them.
 * The bead counts need the weave engine and are checked there.
 */
import { fileStart, type Diagnostic, type SourceRange } from '../shared/diagnostic.js';
import { rowLabel, type ItemNode, type Layout, type PatternAst, type RowNode, type UnitNode } from './ast.js';
import { expandRow } from './expand.js';
import { DiagnosticList } from './limits.js';
import { suggest } from './suggest.js';
import type { ShapeErrors } from './to-ast.js';
import { COLORS_KEYS, HEADER_KEYS, NOTE_KEY } from './values.js';

const NO_SHAPE_ERRORS: ShapeErrors = { lowerCase: new Map(), noColon: new Set(), colonLookAlikes: new Set() };

export function checkPattern(ast: PatternAst, shape: ShapeErrors = NO_SHAPE_ERRORS): DiagnosticList {
  const out = new DiagnosticList();
  checkKeys(ast, out);
  checkColors(ast, shape.lowerCase, out);
  checkRowNumbers(ast.rows, shape.noColon, out);
  for (const row of ast.rows) if (!out.full) checkMarks(row, ast.header.layout, out);
  if (ast.rows.length === 0) {
    out.push({
      severity: 'error',
      id: 'no-rows',
      message: 'the pattern has no rows',
      range: fileStart,
      hint: "add rows after the colours, like 'row 1: BBBB'",
    });
  }
  return out;
}

function checkKeys(ast: PatternAst, out: Diagnostic[]): void {
  const known: readonly string[] = HEADER_KEYS;
  for (const e of ast.header.entries) {
    if (known.includes(e.key)) continue;
    const s = suggest(e.key, [...HEADER_KEYS, NOTE_KEY, ...COLORS_KEYS], e.keyRange);
    out.push({
      severity: 'warning',
      id: 'unknown-key',
      message: `'${e.key}' is not a header key Fourfold knows${s.text}`,
      range: e.keyRange,
      hint: `the line is kept but not used; the header keys are: ${HEADER_KEYS.join(', ')}`,
      ...(s.fix ? { fix: s.fix } : {}),
    });
  }
}

function checkColors(ast: PatternAst, lowerCase: ReadonlyMap<number, Diagnostic>, out: DiagnosticList): void {
  const first = new Map<string, number>();
  for (const c of ast.colors) {
    const line = first.get(c.key);
    if (line === undefined) first.set(c.key, c.range.line);
    else {
      out.add(() => ({
        severity: 'error',
        id: 'duplicate-color',
        message: `colour key '${c.key}' is defined twice; the first, on line ${line}, is used`,
        range: c.keyRange,
        hint: 'give each colour its own letter',
      }));
    }
  }
  // Keys are A-Z, so sets of keys are 26-bit masks: this loop runs once per bead of the file.
  let defined = 0;
  for (const k of first.keys()) defined |= bit(k.charCodeAt(0));
  let used = 0;
  for (const row of ast.rows) {
    let reported = 0;
    forEachUnit(row.items, (u) => {
      // Most files have no lower-case unit: no lookup per unit then.
      const lower = lowerCase.size === 0 ? undefined : lowerCase.get(u.range.offset);
      let missing = 0;
      for (let k = 0; k < u.keys.length; k++) {
        const b = bit(u.keys.charCodeAt(k));
        used |= b;
        if (lower) {
          missing |= b & ~defined;
          continue;
        }
        if ((defined | reported) & b) continue;
        reported |= b;
        const key = u.keys[k]!;
        out.push({
          severity: 'error',
          id: 'unknown-color',
          message: `colour key '${key}' is not in the 'colors:' block`,
          range: narrow(u.range, u.mark.length + k, 1),
          hint: `add a line like '  ${key}  #2e6f8e  teal' under 'colors:', or use one of: ${[...first.keys()].join(' ') || '(none yet)'}`,
        });
      }
      // A unit in lower case has one diagnostic, which also says which of its keys still need a colour.
      if (lower && missing)
        lower.hint += `; ${keyList(missing)} ${missing & (missing - 1) ? 'are' : 'is'} not in the 'colors:' block yet`;
    });
  }
  for (const c of ast.colors) {
    if (used & bit(c.key.charCodeAt(0)) || first.get(c.key) !== c.range.line) continue;
    out.add(() => ({
      severity: 'warning',
      id: 'unused-color',
      message: `colour '${c.key}'${c.name ? ` (${c.name})` : ''} is never used`,
      range: c.keyRange,
      hint: 'remove the line, or use the key in a row',
    }));
  }
}

const bit = (code: number): number => 1 << (code - 65);

/** `'X'`, `'X' and 'Y'`, ... for the keys in a mask, in alphabetical order. */
function keyList(mask: number): string {
  const keys: string[] = [];
  for (let k = 0; k < 26; k++) if (mask & (1 << k)) keys.push(`'${String.fromCharCode(65 + k)}'`);
  return keys.length === 1 ? keys[0]! : `${keys.slice(0, -1).join(', ')} and ${keys[keys.length - 1]}`;
}

/** A part of a one-line range, `at` code units in, `length` long (keys are ASCII, so units are columns). */
const narrow = (r: SourceRange, at: number, length: number): SourceRange => ({
  line: r.line,
  column: r.column + at,
  endLine: r.line,
  endColumn: r.column + at + length,
  offset: r.offset + at,
  endOffset: r.offset + at + length,
});

function forEachUnit(items: readonly ItemNode[], f: (u: UnitNode) => void): void {
  for (const item of items) {
    if (item.type === 'unit') f(item);
    else if (item.type === 'group') forEachUnit(item.items, f);
  }
}

function checkRowNumbers(rows: readonly RowNode[], noColon: ReadonlySet<RowNode>, out: Diagnostic[]): void {
  let expected = 1;
  for (const row of rows) {
    const r = row.numberRange;
    if (r.offset === r.endOffset) {
      expected++;
      continue; // no number at all: a syntax error already says so
    }
    if (noColon.has(row)) {
      // The missing ':' is the one error of this line; counting goes on from its number.
      expected = Math.max(row.from, row.to) + 1;
      continue;
    }
    const label = rowLabel(row);
    if (row.to < row.from) {
      out.push({
        severity: 'error',
        id: 'row-number',
        message: `the range ${row.from}-${row.to} runs backwards`,
        range: r,
        hint: `write '${row.word}s ${row.to}-${row.from}'`,
      });
    } else if (row.from !== expected) {
      const why =
        row.from < expected
          ? row.from < 1
            ? 'rows are numbered from 1'
            : `${row.word} ${row.from} is already written above`
          : `${row.word} ${expected} is missing`;
      out.push({
        severity: 'error',
        id: 'row-number',
        message: `expected ${row.word} ${expected} here, but this is ${label}: ${why}`,
        range: r,
        hint: 'rows are numbered from 1, in order, with no gaps',
      });
    }
    expected = Math.max(row.from, row.to) + 1;
  }
}

/** The placement rules for `*`, `+` and `-` (NOTATION.md section 2), one diagnostic per written node. */
function checkMarks(row: RowNode, layout: Layout, out: Diagnostic[]): void {
  if (!hasMarkOrSkip(row.items)) return;
  const flat = expandRow(row).value;
  const reported = new Set<object>();
  const report = (node: object & { range: SourceRange }, message: string, hint: string): void => {
    if (reported.has(node)) return;
    reported.add(node);
    out.push({ severity: 'error', id: 'misplaced-mark', message, range: node.range, hint });
  };
  const firstUnit = flat.findIndex((i) => i.type === 'unit');
  let lastUnit = -1;
  let lastPlain = -1;
  flat.forEach((item, p) => {
    if (item.type !== 'unit') return;
    lastUnit = p;
    if (item.mark !== '+') lastPlain = p;
  });
  const hasRow1 = row.from <= 1;
  flat.forEach((item, p) => {
    if (item.type === 'skip') {
      if (hasRow1) report(item, "row 1 has no row below it, so it cannot skip '-'", 'remove the skip');
      else if (layout === 'flat' && p > firstUnit && p < lastUnit && firstUnit >= 0) {
        report(
          item,
          "in a flat row a skip '-' stands only at the start or the end of the row",
          'move the skip to an end of the row, or remove it',
        );
      }
      return;
    }
    if (item.mark === '*') {
      if (layout !== 'flat')
        report(
          item,
          `a fresh ring '*' is for flat pieces only; this pattern's layout is ${layout}`,
          "remove the '*' and write the unit's new beads",
        );
      else if (hasRow1)
        report(item, "row 1 starts with an unmarked unit of 4 beads; '*' starts a later row", "remove the '*'");
      else if (p !== 0)
        report(item, "a fresh ring '*' can only be the first item of a row", 'move it to the start of the row');
    } else if (item.mark === '+') {
      if (layout === 'tube')
        report(
          item,
          "a tube has no increases: '+' is for flat and round pieces",
          "remove the '+', or change the layout to round",
        );
      else if (p === firstUnit)
        report(
          item,
          "an increase '+' cannot be a row's first unit: it shares the near bead of the unit before it",
          'start the row with an ordinary unit',
        );
      else if (layout === 'flat' && p < lastPlain)
        report(
          item,
          "in a flat row, increases '+' stand only at the end of the row",
          "move the increases after the row's last ordinary unit",
        );
    }
  });
}

const hasMarkOrSkip = (items: readonly ItemNode[]): boolean =>
  items.some((i) => (i.type === 'group' ? hasMarkOrSkip(i.items) : i.type === 'skip' || i.mark !== ''));
