/**
 * parse -> format -> parse keeps the AST (see normalise.ts for what may move),
 * and formatting is idempotent, for every good fixture and every example.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { format, parse, parseBytes } from '../../parser/index.js';
import { normalise } from './normalise.js';

const root = join(import.meta.dirname, '..', '..');
const files = [
  ...readdirSync(join(root, 'tests/parser/fixtures/good'))
    .filter((f) => f.endsWith('.ffp'))
    .map((f) => join(root, 'tests/parser/fixtures/good', f)),
  ...readdirSync(join(root, 'examples'))
    .filter((f) => f.endsWith('.ffp'))
    .map((f) => join(root, 'examples', f)),
];

describe('round trip', () => {
  test.each(files.map((f) => [f.slice(root.length + 1), f]))('%s', (_name, file) => {
    const first = parseBytes(readFileSync(file));
    const text = format(first.value);
    const second = parse(text);
    expect(second.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(normalise(second.value)).toEqual(normalise(first.value));
    expect(format(second.value)).toBe(text);
  });
});

describe('canonical layout', () => {
  test('header order, aligned values and colour table, one row a line, spacing', () => {
    const text = [
      '# top',
      'layout:  FLAT',
      'designer: Wren Halloway',
      'title:Spacing',
      'beads: 8/0',
      'colors:',
      ' A   teal   sea  glass',
      '  B #FFF',
      'row 1:AAAA  BAB   (AAB  BAA )  x2 # end',
      'rows 2-3 :  ABA',
      '    (BB)x4',
      'note:   firm',
    ].join('\n');
    expect(format(parse(text).value)).toBe(
      [
        '# top',
        'title:    Spacing',
        'designer: Wren Halloway',
        'beads:    8/0 round',
        'layout:   flat',
        '',
        'colors:',
        '  A  teal  sea  glass',
        '  B  #FFF',
        '',
        'row 1: AAAA BAB (AAB BAA)x2  # end',
        'rows 2-3: ABA (BB)x4',
        'note: firm',
        '',
      ].join('\n'),
    );
  });

  test('round and tube patterns are written with `round`, flat ones with `row`', () => {
    const tube = parse('title: T\nlayout: tube\ncolors:\n  A #000\nrow 1: AAAA AAA AA\nrows 2-3: AAA AA A\n');
    expect(format(tube.value)).toContain('round 1: AAAA AAA AA\nrounds 2-3: AAA AA A\n');
    const flat = parse('title: F\ncolors:\n  A #000\nround 1: AAAA\n');
    expect(format(flat.value)).toContain('\nrow 1: AAAA\n');
  });
});
