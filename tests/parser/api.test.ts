/** The public API: limits, bytes, expansion, and the order of diagnostics. */
import { describe, expect, test } from 'vitest';
import { expandRow, MAX_BYTES, MAX_DIAGNOSTICS, parse, parseBytes, UNIT_LIMIT } from '../../parser/index.js';
import { sortDiagnostics } from '../../shared/diagnostic.js';

const utf8 = (s: string): Uint8Array => new TextEncoder().encode(s);
const head = 'title: T\ncolors:\n  A #000\n  B #fff\n';

describe('parseBytes', () => {
  test('strips a byte-order mark', () => {
    const r = parseBytes(new Uint8Array([0xef, 0xbb, 0xbf, ...utf8(`${head}row 1: AAAA BBB\n`)]));
    expect(r.diagnostics).toEqual([]);
    expect(r.value.header.title).toBe('T');
  });

  test('a file over 1 MiB is refused before it is decoded', () => {
    const r = parseBytes(new Uint8Array(MAX_BYTES + 1).fill(0x41));
    expect(r.diagnostics.map((d) => d.id)).toEqual(['too-large']);
    expect(r.diagnostics[0]!.message).toContain('1,048,577 bytes');
  });

  test('exactly 1 MiB is read', () => {
    const body = `${head}row 1: AAAA\n`;
    const line = `#${'x'.repeat(998)}\n`; // 1,000 bytes, well under the line limit
    const fill = MAX_BYTES - body.length;
    const text = body + line.repeat(Math.floor(fill / 1000)) + '#'.repeat((fill % 1000) - 1) + '\n';
    expect(utf8(text).length).toBe(MAX_BYTES);
    expect(parseBytes(utf8(text)).diagnostics.map((d) => d.id)).not.toContain('too-large');
  });

  test('one clear error for binary data and for text that is not UTF-8', () => {
    expect(parseBytes(new Uint8Array([0x74, 0x00, 0x41])).diagnostics.map((d) => d.id)).toEqual(['not-text']);
    expect(parseBytes(new Uint8Array([0x74, 0xc3, 0x28])).diagnostics.map((d) => d.id)).toEqual(['not-text']);
  });
});

describe('parse', () => {
  test('text over 1 MiB in UTF-8 is refused, counting multi-byte characters', () => {
    // 'é' is two bytes in UTF-8: 600,000 of them are 1.2 MB though only 600,000 code units.
    const r = parse(`${head}row 1: AAAA\n# ${'é'.repeat(600_000)}\n`);
    expect(r.diagnostics.map((d) => d.id)).toEqual(['too-large']);
  });

  test('the unit limit counts repeats and ranges without expanding them', () => {
    const at = parse(`${head}row 1: AAAA${' AAA'.repeat(9)}\nrows 2-${UNIT_LIMIT / 10}: AAA (AA)x9\n`);
    expect(at.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const over = parse(`${head}row 1: AAAA\nrow 2: AAA (AA)x99999999999\n`);
    expect(over.diagnostics.map((d) => d.id)).toEqual(['too-large']);
    expect(over.diagnostics[0]!.range.line).toBe(6);
  });

  test('a row range past the unit limit is named whole, under its label', () => {
    const [d, ...rest] = parse(`${head}row 1: AAAA BBB\nrows 2-999999999: AA BB\n`).diagnostics;
    expect(rest).toEqual([]);
    expect(d!.message).toBe(
      'the pattern expands to more than 200,000 units at rows 2-999999999, which repeats 2 units on each of 999,999,998 rows',
    );
    expect(d!.range).toMatchObject({ line: 6, column: 1, endColumn: 17 });
    const one = parse(`${head}row 1: AAAA BBB\nrow 2: (AB)x999999\n`).diagnostics;
    expect(one.map((x) => x.message)).toEqual(['the pattern expands to more than 200,000 units at row 2']);
  });

  test('diagnostics come sorted by position', () => {
    const r = parse('colors:\n  A tela\nrow 2: QQ\nrow 1: +AAA\n');
    expect(r.diagnostics).toEqual(sortDiagnostics(r.diagnostics));
    expect(r.diagnostics.length).toBeGreaterThan(3);
  });

  test('a file with every kind of mistake still yields the rows it could read', () => {
    const r = parse(`${head}row 1: AAAA BBB\nrow 2: AA ) BB\nrwo 3: AB\nrow 4: (AB\n`);
    expect(r.value.rows.map((x) => x.from)).toEqual([1, 2, 3, 4]);
    expect(r.value.rows[1]!.items.map((i) => (i.type === 'unit' ? i.keys : i.type))).toEqual(['AA', 'BB']);
  });
});

describe('many problems', () => {
  test('past MAX_DIAGNOSTICS the first are listed, in order, and one note counts the rest', () => {
    // Each line is a colour line outside the colour block with no colour: two errors and a warning.
    const r = parse(`${head}row 1: AAAA BBB\n${'C\n'.repeat(600)}`);
    expect(r.diagnostics).toHaveLength(MAX_DIAGNOSTICS + 1);
    const note = r.diagnostics[r.diagnostics.length - 1]!;
    expect(note).toMatchObject({ severity: 'info', id: 'too-many-problems' });
    expect(note.message).toBe('800 more problems from here on are not listed');
    expect(r.diagnostics).toEqual(sortDiagnostics(r.diagnostics));
  });

  test('stray characters next to each other are one problem', () => {
    const r = parse(`${head}row 1: AAAA %%% BBB\n`);
    expect(r.diagnostics.map((d) => [d.id, d.range.column, d.range.endColumn])).toEqual([['syntax', 13, 16]]);
  });
});

describe('nesting', () => {
  test('a row nested too deep is left out, and the lines around it are kept', () => {
    const deep = `${'('.repeat(20)}AA${')x2'.repeat(20)}`;
    const r = parse(`${head}row 1: ${deep}\nnote: after\nrow 1: AAAA BBB\nnote: last`);
    expect(r.diagnostics.map((d) => d.id)).toEqual(['too-large']);
    expect(r.value.header.title).toBe('T');
    expect(r.value.colors).toHaveLength(2);
    expect(r.value.rows.map((x) => x.notes.map((n) => n.text))).toEqual([['last']]);
    expect(r.value.notes.map((n) => n.text)).toEqual(['after']);
  });
});

describe('inputs found by fuzzing', () => {
  test.each([['a lone carriage return in a colour line', 'r r r\rr']])('%s', (_what, text) => {
    expect(parse(text).diagnostics.map((d) => d.id)).not.toContain('internal');
  });
});

describe('fixes', () => {
  test('did-you-mean suggestions and a missing colon come with a fix', () => {
    const text = 'title: T\nlayuot: flat\nlayout: rond\ncolors:\n  A tela\nrwo 1: AAAA\nrow 2 AAA\n';
    const fixes = parse(text).diagnostics.flatMap((d) =>
      d.fix ? [[d.id, text.slice(d.fix.range.offset, d.fix.range.endOffset), d.fix.replacement]] : [],
    );
    expect(fixes).toEqual([
      ['unknown-key', 'layuot', 'layout'],
      ['bad-header-value', 'rond', 'round'],
      ['bad-color', 'tela', 'teal'],
      ['syntax', 'rwo', 'row'],
      ['syntax', '', ':'],
    ]);
  });
});

describe('expandRow', () => {
  const row = (units: string) => parse(`${head}row 1: AAAA\nrow 2: ${units}\n`).value.rows[1]!;

  test('expands groups and nested repeats in order, keeping the written nodes', () => {
    const r = row('AB ((BA)x2 -)x2 +BBB');
    const flat = expandRow(r).value;
    expect(flat.map((i) => (i.type === 'unit' ? i.mark + i.keys : '-'))).toEqual([
      'AB',
      'BA',
      'BA',
      '-',
      'BA',
      'BA',
      '-',
      '+BBB',
    ]);
    // The same written unit stands for each repetition, so its range points at the text.
    expect(flat[1]).toBe(flat[4]);
    expect(flat[1]!.range.column).toBe(13); // 'row 2: AB ((' is 12 columns
  });

  test('refuses to expand past its limit', () => {
    const r = expandRow(row('(AB)x50'), 10);
    expect(r.value).toEqual([]);
    expect(r.diagnostics[0]!.id).toBe('too-large');
  });
});
