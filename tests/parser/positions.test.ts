/**
 * Lines and columns as NOTATION.md section 7 counts them: 1-based, in code
 * points, a tab is one column; end columns are exclusive.
 */
import { describe, expect, test } from 'vitest';
import { parse } from '../../parser/index.js';
import { LineIndex } from '../../parser/positions.js';

describe('LineIndex', () => {
  test('tabs count as one column', () => {
    const text = 'a\n\tb\tc';
    const ix = new LineIndex(text);
    expect(ix.position(text.indexOf('b'))).toEqual({ line: 2, column: 2 });
    expect(ix.position(text.indexOf('c'))).toEqual({ line: 2, column: 4 });
  });

  test('a character outside the BMP is one column, though it is two UTF-16 code units', () => {
    const text = 'x\n🐦🐦z';
    const ix = new LineIndex(text);
    expect(text.indexOf('z') - text.indexOf('🐦')).toBe(4); // two surrogate pairs
    expect(ix.position(text.indexOf('z'))).toEqual({ line: 2, column: 3 });
    expect(ix.range(2, 4)).toMatchObject({ line: 2, column: 1, endLine: 2, endColumn: 2, offset: 2, endOffset: 4 });
    expect(ix.unitColumn(2, 3)).toBe(4);
  });

  test('offsets at a line break and at the end of the text', () => {
    const ix = new LineIndex('ab\ncd');
    expect(ix.position(2)).toEqual({ line: 1, column: 3 });
    expect(ix.position(3)).toEqual({ line: 2, column: 1 });
    expect(ix.position(5)).toEqual({ line: 2, column: 3 });
  });
});

describe('diagnostic ranges from the parser', () => {
  test('after tabs and non-BMP characters on the same line', () => {
    const text = 'title: T\ncolors:\n\tA\t#000\t🐦 bird\nrow 1:\tAAAA\tQAA # 🐦🐦 then\nrow 2: ZA\n';
    const r = parse(text);
    const q = r.diagnostics.find((d) => d.id === 'unknown-color' && d.range.line === 4)!;
    // 'row 1:' is 6 columns, a tab, 'AAAA', a tab: Q is column 13.
    expect(q.range).toMatchObject({ line: 4, column: 13, endLine: 4, endColumn: 14 });
    expect(text.slice(q.range.offset, q.range.endOffset)).toBe('Q');
    const z = r.diagnostics.find((d) => d.range.line === 5)!;
    expect(z.range).toMatchObject({ column: 8, endColumn: 9 });
  });

  test('a bad colour after a non-BMP character in a colour name is measured in code points', () => {
    const text = 'title: 🐦🐦 T\ncolors:\n  A #00\nrow 1: AAAA\n';
    const r = parse(text);
    expect(r.value.header.title).toBe('🐦🐦 T');
    const d = r.diagnostics.find((x) => x.id === 'bad-color')!;
    expect(d.range).toMatchObject({ line: 3, column: 5, endColumn: 8 });
  });

  test('a lexing error after a non-BMP character in a row', () => {
    const text = 'title: T\ncolors:\n  A #000\nrow 1: AAAA 🐦 AAA\n';
    const d = parse(text).diagnostics.find((x) => x.id === 'syntax')!;
    expect(d.range).toMatchObject({ line: 4, column: 13, endLine: 4, endColumn: 14 });
    expect(text.slice(d.range.offset, d.range.endOffset)).toBe('🐦');
  });
});
