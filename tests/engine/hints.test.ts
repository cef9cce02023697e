/**
 * Every problem the engine reports tells the designer how to fix it: a
 * message that stands on its own and a hint, as the diagnostics of the parser
 * have. One pattern a check (or a case of a check with its own hint).
 */
import { describe, expect, test } from 'vitest';
import { compileAst } from '../../shared/weave-model.js';
import { pattern } from './build-ast.js';
import type { Layout } from '../../parser/ast.js';

const long = ['AAAA', ...Array<string>(19).fill('AAA')].join(' ');

const cases: [string, Layout, string[], string][] = [
  ['bead-count in a flat row', 'flat', ['AAAA AAA', 'AAA AAA'], 'bead-count'],
  ['bead-count on a closing unit', 'tube', ['AAAA AAA AAA AA', 'AAA AA AA AA'], 'bead-count'],
  ['no-base-left after the row below ran out', 'flat', ['AAAA AAA', 'AAA AA AA'], 'no-base-left'],
  ['no-base-left in a tube', 'tube', ['AAAA AAA AAA AA', 'AAA AA AA AA A'], 'no-base-left'],
  ['no-base-left on a skip', 'flat', ['AAAA AAA', 'AAA AA - -'], 'no-base-left'],
  ['uncovered-base', 'flat', ['AAAA AAA AAA', 'AAA AA'], 'uncovered-base'],
  ['no-passage', 'flat', [long, `${'- '.repeat(14)}AAA AA AA AA AA AA`], 'no-passage'],
  ["misplaced-mark: '+' in row 1", 'flat', ['AAAA +AAA'], 'misplaced-mark'],
  ["misplaced-mark: '+' first", 'flat', ['AAAA AAA', '+AAA AA'], 'misplaced-mark'],
  ["misplaced-mark: '+' in a tube", 'tube', ['AAAA AAA AAA AA', 'AAA +AAA AA AA A'], 'misplaced-mark'],
  ["misplaced-mark: '+' before a plain unit", 'flat', ['AAAA AAA AAA', 'AAA +AAA AA'], 'misplaced-mark'],
  ["misplaced-mark: '*' in a round", 'round', ['AAAA AAA AAA AA', '*AAAA AA AA A'], 'misplaced-mark'],
  ["misplaced-mark: '*' in row 1", 'flat', ['*AAAA AAA'], 'misplaced-mark'],
  ["misplaced-mark: '*' not first", 'flat', ['AAAA AAA', 'AAA *AAAA'], 'misplaced-mark'],
  ["misplaced-mark: '-' in row 1", 'flat', ['AAAA AAA -'], 'misplaced-mark'],
  ["misplaced-mark: '-' inside a flat row", 'flat', ['AAAA AAA AAA', 'AAA - AA'], 'misplaced-mark'],
];

describe('engine diagnostics carry a hint', () => {
  test.each(cases)('%s', (_, layout, rows, id) => {
    const { diagnostics } = compileAst(pattern(layout, rows));
    const d = diagnostics.find((x) => x.id === id);
    expect(d, `${id} is reported`).toBeDefined();
    expect(d!.message.length).toBeGreaterThan(20);
    expect(d!.hint ?? '').toMatch(/\w{3,}/);
    // A hint that repeats the message word for word adds nothing.
    expect(d!.message).not.toContain(d!.hint!);
  });
});
