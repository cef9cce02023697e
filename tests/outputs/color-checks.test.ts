import { describe, expect, it } from 'vitest';
import type { ColorDef, PatternAst, RowNode } from '../../parser/ast.js';
import type { SourceRange } from '../../shared/diagnostic.js';
import type { Model, RowInfo } from '../../shared/model.js';
import { FLAT_CIRCLE_ADDS, flatCircle, materialChecks, similarColors } from '../../shared/color-checks.js';
import { stripModel } from './fixture-strip.js';
import { compile } from '../../shared/compile.js';

const at = (line: number, column = 1, width = 1): SourceRange => ({
  line,
  column,
  endLine: line,
  endColumn: column + width,
  offset: line * 100 + column,
  endOffset: line * 100 + column + width,
});

function color(key: string, hex: string, line: number): ColorDef {
  return {
    key,
    written: hex,
    hex,
    name: '',
    range: at(line, 3, 10),
    keyRange: at(line, 3),
    colorRange: at(line, 6, 7),
  };
}

function row(n: number, line: number): RowNode {
  return {
    word: 'round',
    from: n,
    to: n,
    items: [],
    notes: [],
    range: at(line, 1, 20),
    numberRange: at(line, 7, 1),
    leadingComments: [],
  };
}

function ast(colors: ColorDef[], rows: RowNode[] = []): PatternAst {
  return {
    header: { title: 't', beads: { size: '11/0', shape: 'round' }, layout: 'round', order: 'pickup', entries: [] },
    colors,
    notes: [],
    rows,
    comments: [],
  };
}

/** A round model only as far as the check reads it: units per round. */
function roundModel(unitsPerRound: number[]): Model {
  const m = stripModel();
  let next = 0;
  const rows: RowInfo[] = unitsPerRound.map((n, i) => ({
    row: i + 1,
    word: 'round',
    units: Array.from({ length: n }, () => next++),
    beads: 0,
    heading: 'around',
    notes: [],
    line: 10 + i,
  }));
  return { ...m, layout: { ...m.layout, kind: 'round' }, rows };
}

describe('similar-colors', () => {
  it('warns on the second colour line when two colours are closer than 8', () => {
    // #2e6f8e and #2f708f differ by one step per channel: far below any visible difference.
    const d = similarColors(ast([color('A', '#2e6f8e', 4), color('B', '#f4f1ea', 5), color('C', '#2f708f', 6)]));
    expect(d).toHaveLength(1);
    expect(d[0]!.id).toBe('similar-colors');
    expect(d[0]!.severity).toBe('warning');
    expect(d[0]!.range.line).toBe(6);
    expect(d[0]!.message).toMatch(/C \(#2f708f\).*A \(#2e6f8e\).*below 8/);
  });

  it('stays quiet for distinct colours, and follows the threshold option', () => {
    const colors = [color('A', '#f4f1ea', 4), color('B', '#2e6f8e', 5), color('C', '#c98b2b', 6)];
    expect(similarColors(ast(colors))).toEqual([]);
    // Black and white are 100 apart (the CIEDE2000 lightness scale), so a threshold of 101 flags them.
    expect(similarColors(ast([color('A', '#000000', 4), color('B', '#ffffff', 5)]), 101)).toHaveLength(1);
    expect(similarColors(ast([color('A', '#000000', 4), color('B', '#ffffff', 5)]), 99)).toHaveLength(0);
  });

  it('skips colours that could not be read (the parser reports those)', () => {
    const bad: ColorDef = { ...color('B', '#2e6f8e', 5), hex: null };
    expect(similarColors(ast([color('A', '#2e6f8e', 4), bad]))).toEqual([]);
  });
});

describe('flat-circle check for rounds', () => {
  // Source: NOTATION.md section 6; a flat circle adds about 2*pi units a round (geometry).
  it('passes a round that adds about 6 units', () => {
    const rows = [row(1, 10), row(2, 11), row(3, 12)];
    expect(flatCircle(roundModel([6, 12, 18]), ast([], rows))).toEqual([]);
  });

  it('warns that a round adding too few units cups, on that round, with both numbers', () => {
    const rows = [row(1, 10), row(2, 11), row(3, 12)];
    const d = flatCircle(roundModel([6, 12, 14]), ast([], rows));
    expect(d).toHaveLength(1);
    expect(d[0]!.id).toBe('flat-circle');
    expect(d[0]!.range.line).toBe(12);
    expect(d[0]!.message).toContain('adds 2 units');
    expect(d[0]!.message).toContain(`about ${FLAT_CIRCLE_ADDS.toFixed(1)}`);
    expect(d[0]!.message).toContain('cup');
  });

  it('warns that a round adding too many units ruffles', () => {
    const d = flatCircle(roundModel([6, 16]), ast([], [row(1, 10), row(2, 11)]));
    expect(d.map((x) => x.message)).toEqual([expect.stringContaining('ruffle')]);
    // 10 added > 1.4 x 6.28 = 8.8; 8 added would not warn.
    expect(flatCircle(roundModel([6, 14]), ast([], [row(1, 10), row(2, 11)]))).toEqual([]);
  });

  it('finds the line of a round written in a range `rounds 2-3`', () => {
    const range: RowNode = { ...row(2, 11), to: 3 };
    const d = flatCircle(roundModel([6, 12, 12]), ast([], [row(1, 10), range]));
    expect(d).toHaveLength(1);
    expect(d[0]!.range.line).toBe(11);
  });

  it('stops at a round that broke off: its count is the error, not the shape', () => {
    // Round 3 runs out of base beads at its 13th unit (round 2 has 6); round 4 is built on the 13 that exist.
    const text = [
      'title: Broken round',
      'layout: round',
      'colors:',
      '  A red',
      'round 1: AAAA (AAA)x4 AA',
      'round 2: AAA AA AA AA AA A',
      'round 3: AAA (+AAA AA)x5 +AAA A',
      'round 4: AAA (+AAA +AAA AA)x11 +AAA A',
      '',
    ].join('\n');
    const compiled = compile(text);
    expect(compiled.diagnostics.map((d) => d.id)).toContain('no-base-left');
    // Round 2 adds nothing to round 1 and is still judged; round 4 (13 to 36 units) would ruffle, but is not judged.
    expect(flatCircle(compiled.value.model, compiled.value.ast).map((d) => d.range.line)).toEqual([6]);
  });

  it('does not apply to flat pieces', () => {
    const model = { ...roundModel([6, 6]), layout: stripModel().layout };
    expect(flatCircle(model, ast([], [row(1, 10), row(2, 11)]))).toEqual([]);
  });

  it('is run with similar-colors by materialChecks', () => {
    const compiled = {
      ast: ast([color('A', '#2e6f8e', 4), color('B', '#2e6f8f', 5)], [row(1, 10), row(2, 11)]),
      model: roundModel([6, 7]),
    };
    expect(
      materialChecks(compiled)
        .map((d) => d.id)
        .sort(),
    ).toEqual(['flat-circle', 'similar-colors']);
    expect(materialChecks(compiled, { similarColors: 0.01 }).map((d) => d.id)).toEqual(['flat-circle']);
  });
});
