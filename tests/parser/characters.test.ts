/** Look-alike and invisible characters are named by code point, with the character to type. */
import { describe, expect, test } from 'vitest';
import { parse } from '../../parser/index.js';

const head = 'title: T\ncolors:\n  A #000\n  B #fff\n';
const syntax = (row: string) => parse(`${head}row 1: ${row}\n`).diagnostics.filter((d) => d.id === 'syntax');

describe('look-alike characters', () => {
  test('a no-break space is named, and the fix types a space', () => {
    const [d, ...rest] = syntax('AAAA\u00a0BBB');
    expect(rest).toEqual([]);
    expect(d!.message).toContain('U+00A0 (no-break space)');
    expect(d!.fix).toMatchObject({ replacement: ' ' });
    expect(d!.range).toMatchObject({ line: 5, column: 12, endColumn: 13 });
  });

  test('full-width letters name their ASCII form', () => {
    // Source: The Unicode Standard, Halfwidth and Fullwidth Forms chart: U+FF01-U+FF5E are U+0021-U+007E, full width.
    const [d] = syntax('\uff21\uff21\uff21\uff21 BBB');
    expect(d!.message).toBe("'ＡＡＡＡ' looks like 'AAAA' but is U+FF21 (full-width 'A')");
    expect(d!.fix).toMatchObject({ replacement: 'AAAA' });
  });

  test('an ideographic space at the start of a line and a zero-width space are named', () => {
    const wide = parse(`${head}\u3000row 1: AAAA BBB\n`).diagnostics;
    expect(wide.map((d) => d.message)).toEqual(['U+3000 (full-width space) looks like a space but is not one']);
    const [zw] = syntax('AAAA\u200b BBB');
    expect(zw!.message).toContain('U+200B (zero-width space)');
    expect(zw!.fix).toMatchObject({ replacement: '' });
  });

  test('other stray characters keep their plain message', () => {
    expect(syntax('AAAA % BBB').map((d) => d.message)).toEqual(["'%' cannot stand here"]);
  });
});

test('a long run of full-width letters is quoted short, and the row is not also called empty', () => {
  const [d, ...rest] = syntax('\uff21'.repeat(50));
  expect(rest).toEqual([]);
  expect(d!.message).toBe(`'${'Ａ'.repeat(20)}…' looks like '${'A'.repeat(20)}…' but is U+FF21 (full-width 'A')`);
  expect(d!.fix).toMatchObject({ replacement: 'A'.repeat(50) });
});
