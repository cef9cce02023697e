/** One problem, one diagnostic: a mistake is not reported again by a later check in other words. */
import { describe, expect, test } from 'vitest';
import { parse } from '../../parser/index.js';
import { compile } from '../../shared/compile.js';
import type { Diagnostic } from '../../shared/diagnostic.js';

const head = 'title: T\ncolors:\n  A #000\n  B #fff\n';
const found = (rows: string) =>
  parse(`${head}${rows}`).diagnostics.map((d) => ({ id: d.id, at: `${d.range.line}:${d.range.column}`, d }));

describe('one problem, one diagnostic', () => {
  test('a lower-case key is not also an unknown colour; the hint names the keys still missing', () => {
    const ds = found('row 1: zzzz BBB\nrow 2: AA\n');
    expect(ds.map(({ id, at }) => `${id}@${at}`)).toEqual(['syntax@5:8']);
    expect(ds[0]!.d.message).toBe("colour keys are capital letters: 'zzzz' should be 'ZZZZ'");
    expect(ds[0]!.d.hint).toBe("a colour key is one capital letter A-Z; 'Z' is not in the 'colors:' block yet");
  });

  test('a lower-case key of a defined colour only says to use capitals', () => {
    const [d, ...rest] = found('row 1: aaaa BBB\n');
    expect(rest).toEqual([]);
    expect(d!.d.hint).toBe('a colour key is one capital letter A-Z');
  });

  test('an undefined key written in capitals is still reported', () => {
    expect(found('row 1: AAAA ZZZ\nrow 2: BB\n').map(({ id }) => id)).toEqual(['unknown-color']);
  });
});

describe('a group without its )', () => {
  test('a count inside it is where the ) was meant, and is not also a count without a group', () => {
    const ds = parse(`${head}row 1: AAAA (BBB x3\n`).diagnostics;
    expect(ds.map((d) => d.message)).toEqual([
      "')' is missing before 'x3': the group opened at column 13 is not closed",
    ]);
    expect(ds[0]!.fix).toMatchObject({ replacement: ')', range: { line: 5, column: 18, endColumn: 18 } });
    const group = parse(`${head}row 1: AAAA (BBB x3\n`).value.rows[0]!.items[1]!;
    expect(group).toMatchObject({ type: 'group', times: 3, items: [{ type: 'unit', keys: 'BBB' }] });
  });

  test('an unclosed group with no count still says so at its (', () => {
    const ds = parse(`${head}row 1: AAAA (BBB\n`).diagnostics;
    expect(ds.map((d) => `${d.message}@${d.range.column}`)).toEqual(["this group '(' is not closed@13"]);
  });
});

describe('a unit of more than 4 keys and a row without its colon', () => {
  test("'AAAAA' is one bead-count, from the parser, which the engine does not repeat", () => {
    const text = `${head}row 1: AAAAA BBB\n`;
    const expected = ["bead-count@5:8 'AAAAA' has 5 colour keys, but a unit holds at most 4 beads"];
    const show = (ds: Diagnostic[]) => ds.map((d) => `${d.id}@${d.range.line}:${d.range.column} ${d.message}`);
    expect(show(parse(text).diagnostics)).toEqual(expected);
    expect(show(compile(text).diagnostics)).toEqual(expected);
  });

  test("'row 2 AAA' is one missing ':', not also a wrong row number, and counting goes on from 2", () => {
    const ids = (rows: string) => parse(`${head}${rows}`).diagnostics.map((d) => `${d.id}@${d.range.line}`);
    expect(ids('row 2 AAAA BBB\nrow 3: AA\n')).toEqual(['syntax@5']);
    expect(ids('row 1: AAAA BBB\nrow 2 AAA\nrow 3: AA\n')).toEqual(['syntax@6']);
    // A wrong number on a row with its ':' is still reported.
    expect(ids('row 2: AAAA BBB\n')).toEqual(['row-number@5']);
  });
});

describe('the start of a row line', () => {
  test("'row2:' is read as row 2, not as an unknown header key after a row", () => {
    const r = parse(`${head}row 1: AAAA BBB\nrow2: AA BB\n`);
    expect(r.diagnostics).toEqual([]);
    expect(r.value.rows.map((x) => x.from)).toEqual([1, 2]);
  });

  test("a ',' or a full-width '：' typed for the ':' is one error, with a fix that writes ':'", () => {
    for (const c of [',', ';', '.', '\uff1a']) {
      const ds = parse(`${head}row 1${c} AAAA BBB\n`).diagnostics;
      expect(ds.map((d) => d.message)).toEqual([`expected ':' after 'row 1', not '${c}'`]);
      expect(ds[0]!.fix).toMatchObject({ replacement: ':', range: { column: 6, endColumn: 7 } });
    }
  });
});
