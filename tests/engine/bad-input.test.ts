/**
 * Structurally wrong patterns: each check's id, wording and range, the
 * partial model NOTATION.md section 7 asks for, and no throw or hang on any
 * item sequence at all.
 */
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { compileAst } from '../../shared/weave-model.js';
import { pattern } from './build-ast.js';
import type { ItemNode, Layout, PatternAst } from '../../parser/ast.js';

const only = (ast: PatternAst) => compileAst(ast).diagnostics;

describe('bead-count', () => {
  test('the message of NOTATION.md section 3, on the unit range', () => {
    // Source: NOTATION.md section 3, the example message for row 4, unit 3.
    const rows = ['AAAA AAA AAA', 'AAA AA AA', 'AAA AA AA', 'AAA AA CCB'];
    const [d, ...rest] = only(pattern('flat', rows));
    expect(rest).toEqual([]);
    expect(d).toMatchObject({ severity: 'error', id: 'bead-count', range: { line: 4, column: 8, endColumn: 11 } });
    expect(d!.message).toBe(
      "row 4, unit 3: this unit shares its near bead and a base bead, so it takes 2 new beads; 3 are written (C C B). Mark an increase with '+' if that is meant.",
    );
    // The fix inserts the mark before the keys.
    expect(d!.fix).toMatchObject({ replacement: '+', range: { line: 4, column: 8, endColumn: 8 } });
  });

  test("a fix removes a '+' that makes a unit take one bead too many", () => {
    const [d] = only(pattern('flat', ['AAAA AAA', 'AAA +AA']));
    expect(d!.fix).toMatchObject({ replacement: '', range: { line: 2, column: 5, endColumn: 6 } });
  });

  test('each shape of sharing says what it shares and what would make it valid', () => {
    const message = (layout: Layout, rows: string[]) =>
      only(pattern(layout, rows)).find((d) => d.id === 'bead-count')!.message;
    expect(message('flat', ['AAA'])).toMatch(
      /^row 1, unit 1: the first unit of row 1 shares no bead, so it takes 4 new beads; 3 are written \(A A A\)\./,
    );
    expect(message('flat', ['AAAA AA'])).toMatch(
      /unit 2: this unit shares its near bead, so it takes 3 new beads; 2 are written/,
    );
    expect(message('flat', ['AAAA AAA', 'AAAA AA'])).toMatch(
      /shares a base bead, so it takes 3 new beads; 4 are written \(A A A A\)\. Mark a fresh ring with '\*'/,
    );
    expect(message('tube', ['AAAA AAA AAA'])).toMatch(
      /^round 1, unit 3: this unit shares its near bead and its far bead \(the row closes on its first unit\), so it takes 2 new beads; 3 are written/,
    );
    expect(message('tube', ['AAAA AAA AA', 'AAA AA AA'])).toMatch(
      /shares its near bead, a base bead and its far bead .* so it takes 1 new bead; 2 are written/,
    );
    expect(message('flat', ['AAAA AAA', 'AAA +AA'])).toMatch(
      /so it takes 3 new beads; 2 are written \(A A\)\. Remove the '\+' if no increase is meant\./,
    );
  });
});

describe('other checks', () => {
  test('misplaced marks', () => {
    const ids = (layout: Layout, rows: string[]) =>
      only(pattern(layout, rows)).map((d) => `${d.id} ${d.range.line}:${d.range.column}`);
    expect(ids('flat', ['AAAA AAA', 'AAA +AAA AA'])).toEqual(['misplaced-mark 2:5']);
    expect(ids('flat', ['AAAA AAA', 'AAA *AAAA'])).toEqual(['misplaced-mark 2:5']);
    expect(ids('tube', ['AAAA AAA AA', 'AAA +AAA AA A'])).toEqual(['misplaced-mark 2:5']);
    expect(ids('round', ['*AAAA AAA AA'])).toEqual(['misplaced-mark 1:1']);
    expect(ids('flat', ['AAAA AAA AAA', 'AAA - AA'])).toEqual(['misplaced-mark 2:5']);
    expect(ids('flat', ['AAAA - AAA'])).toEqual(['misplaced-mark 1:6']);
  });

  test('a skip at the end of a flat row is a decrease without a warning; a row that stops short warns', () => {
    expect(only(pattern('flat', ['AAAA AAA AAA', 'AAA AA -']))).toEqual([]);
    expect(only(pattern('flat', ['AAAA AAA AAA', '- AAA AA']))).toEqual([]);
    const [d] = only(pattern('flat', ['AAAA AAA AAA', 'AAA AA']));
    expect(d).toMatchObject({ severity: 'warning', id: 'uncovered-base', range: { line: 2, column: 1 } });
    expect(d!.message).toBe('row 2 leaves 1 bead of row 1 uncovered');
  });

  test('no-base-left when a row runs past the row below', () => {
    const [d] = only(pattern('flat', ['AAAA AAA', 'AAA AA AA']));
    expect(d).toMatchObject({ id: 'no-base-left', range: { line: 2, column: 8 } });
    expect(d!.message).toMatch(/^row 2, unit 3: this unit needs a base bead, but row 1 has none left/);
  });
});

describe('no-passage', () => {
  test('a start corner farther than 12 beads from the thread is reported on that unit, and the piece is still built', () => {
    // Row 2 skips 14 beads at its start, so its first unit sits 14 sides along the edge from where row 1 ended.
    const row1 = ['AAAA', ...Array<string>(19).fill('AAA')].join(' ');
    const row2 = `${'- '.repeat(14)}AAA AA AA AA AA AA`;
    const { value, diagnostics } = compileAst(pattern('flat', [row1, row2]));
    expect(diagnostics.map((d) => `${d.id} ${d.range.line}:${d.range.column}`)).toEqual(['no-passage 2:29']);
    expect(diagnostics[0]!.message).toBe(
      "row 2, unit 1: the thread cannot reach this unit's start through 12 or fewer beads already in place",
    );
    expect(value.model.units.filter((u) => u.row === 2 && !u.failed).length).toBe(6);
    expect(value.model.thread.filter((p) => p.kind === 'pickup').length).toBe(value.model.beads.length);
  });

  test('a start within reach (after 10 skips) is not reported', () => {
    const row1 = ['AAAA', ...Array<string>(19).fill('AAA')].join(' ');
    const { diagnostics } = compileAst(pattern('flat', [row1, `${'- '.repeat(10)}AAA AA AA AA AA AA - - - -`]));
    expect(diagnostics).toEqual([]);
  });
});

describe('partial models', () => {
  test('a failing unit is reported, its row stops, and later rows build on what exists', () => {
    const { value, diagnostics } = compileAst(pattern('flat', ['AAAA AAA AAA AAA', 'AAA AA AAA AA', 'AAA AA']));
    expect(diagnostics.map((d) => d.id)).toEqual(['bead-count']);
    const m = value.model;
    expect(m.rows.map((r) => r.units.length)).toEqual([4, 3, 2]);
    const failed = m.units.filter((u) => u.failed);
    expect(failed.map((u) => `${u.row}.${u.index}`)).toEqual(['2.3']);
    // The failed unit shows the beads it would share and nothing of its own.
    expect(failed[0]!.places.far).toBeNull();
    expect(failed[0]!.places.near).not.toBeNull();
    expect(m.units.filter((u) => u.row === 3 && !u.failed).length).toBe(2);
  });
});

const unitArb = fc.record({
  type: fc.constant('unit' as const),
  mark: fc.constantFrom('' as const, '*' as const, '+' as const),
  keys: fc.stringMatching(/^[AB]{0,5}$/),
});
const itemArb: fc.Arbitrary<{ type: 'unit'; mark: '' | '*' | '+'; keys: string } | { type: 'skip' }> = fc.oneof(
  { weight: 5, arbitrary: unitArb },
  { weight: 1, arbitrary: fc.constant({ type: 'skip' as const }) },
);

describe('never throws, never hangs', () => {
  test('any sequence of units and skips in any layout yields a model and diagnostics', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<Layout>('flat', 'tube', 'round'),
        fc.array(fc.array(itemArb, { minLength: 0, maxLength: 8 }), { minLength: 1, maxLength: 6 }),
        (layout, rows) => {
          const ast = pattern(
            layout,
            rows.map(() => 'A'),
          );
          ast.rows.forEach((row, r) => {
            row.items = rows[r]!.map((it): ItemNode =>
              it.type === 'skip' ? { type: 'skip', range: row.range } : { ...it, range: row.range },
            );
          });
          const { value } = compileAst(ast);
          for (const b of value.model.beads) expect([1, 2]).toContain(b.units.length);
          for (const p of value.model.thread) expect(p.bead).toBeLessThan(value.model.beads.length);
        },
      ),
      { numRuns: 400 },
    );
  });
});
