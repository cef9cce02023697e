/**
 * `compile(text)`: the parser's and the engine's diagnostics together, in
 * file order, and the model for what could be built.
 */
import { describe, expect, test } from 'vitest';
import { compile, compileAst } from '../../shared/compile.js';

const text = (rows: string[]) =>
  ['title: Compile test', 'layout: flat', 'colors:', '  A #f4f1ea', '  B #2e6f8e', ...rows, ''].join('\n');

describe('compile', () => {
  test('a clean strip', () => {
    const { value, diagnostics } = compile(text(['row 1: AAAA BAB ABA']));
    expect(diagnostics).toEqual([]);
    expect(value.model.schema).toBe('fourfold.model/1');
    // Source: NOTATION.md section 8, strip of n units: 3n + 1 beads.
    expect(value.model.beads.length).toBe(10);
    expect(value.ast.rows.length).toBe(1);
  });

  test("parser and engine diagnostics are merged in file order, each with its unit's line and column", () => {
    const { value, diagnostics } = compile(text(['row 1: AAAA BAB ABA', 'row 2: BAB ABA AB', 'row 3: BAB AB AC']));
    expect(diagnostics.map((d) => `${d.id} ${d.range.line}:${d.range.column}`)).toEqual([
      'bead-count 7:12',
      'unknown-color 8:16',
    ]);
    expect(value.model.diagnostics).toEqual(diagnostics);
    expect(value.model.units.filter((u) => u.failed).map((u) => `${u.row}.${u.index}`)).toEqual(['2.2']);
  });

  test('text that is hardly a pattern still compiles: what the parser recovered is woven and reported', () => {
    const { value, diagnostics } = compile('\u0000\u0001 row row ((((');
    expect(diagnostics.some((d) => d.id === 'syntax')).toBe(true);
    // The parser reads the second 'row' as a unit of three keys; a first unit takes four.
    expect(diagnostics.some((d) => d.id === 'bead-count')).toBe(true);
    expect(value.model.beads).toEqual([]);
  });
});

test('a fault inside the engine is a diagnostic, not a crash', () => {
  // An AST no parser would produce (a row whose items are not a list) stands in for an engine bug.
  const ast = compile('title: T\ncolors:\n  A #ffffff\nrow 1: AAAA\n').value.ast;
  const broken = { ...ast, rows: [{ ...ast.rows[0]!, items: null as unknown as [] }] };
  const { value, diagnostics } = compileAst(broken);
  expect(diagnostics.map((d) => d.id)).toEqual(['internal']);
  expect(value.model.units).toEqual([]);
});

test('a check both the parser and the engine make is reported once', () => {
  const tube = [
    'title: T',
    'layout: tube',
    'colors:',
    '  A #ffffff',
    'round 1: AAAA AAA AA',
    'round 2: AAA +AAA AA A',
    '',
  ].join('\n');
  const { diagnostics } = compile(tube);
  expect(diagnostics.filter((d) => d.id === 'misplaced-mark').length).toBe(1);
});
