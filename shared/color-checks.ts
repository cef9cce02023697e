/**
 * Material checks that need the palette or the round counts rather than the
 * bead net: colours too close to tell apart on a chart, and rounds that will
 * not lie flat (NOTATION.md section 6). Both are warnings: the piece can still
 * be made, the designer should just know.
 */
import { differenceCiede2000, parse, type Color } from './culori.js';
import type { Diagnostic, SourceRange } from './diagnostic.js';
import type { PatternAst } from '../parser/ast.js';
import type { Model, RowInfo } from './model.js';

export interface MaterialCheckOptions {
  /** CIEDE2000 distance below which two palette colours warn (default 8). */
  similarColors?: number;
}

export const DEFAULT_SIMILAR_COLORS = 8;

/**
 * Each round of a flat circle of square units adds about 2*pi units, since
 * round k lies on a circle of radius k (common practice, and geometry).
 */
export const FLAT_CIRCLE_ADDS = 2 * Math.PI;
export const CUP_BELOW = 0.6;
export const RUFFLE_ABOVE = 1.4;

/**
 * CIEDE2000 with the reference weights kL = kC = kH = 1. culori works in
 * CIELAB under D65 (its `lab65` mode); hex colours are converted to it.
 */
export const ciede2000: (a: Color, b: Color) => number = differenceCiede2000();

/** CIEDE2000 distance of two CSS colours, or null when either cannot be read. */
export function colorDistance(a: string, b: string): number | null {
  const ca: Color | undefined = parse(a);
  const cb: Color | undefined = parse(b);
  return ca && cb ? ciede2000(ca, cb) : null;
}

/** One decimal is what a reader can compare; more suggests false precision. */
const oneDecimal = (n: number): string => n.toFixed(1);

export function similarColors(ast: PatternAst, threshold = DEFAULT_SIMILAR_COLORS): Diagnostic[] {
  const out: Diagnostic[] = [];
  ast.colors.forEach((second, j) => {
    for (const first of ast.colors.slice(0, j)) {
      if (first.hex === null || second.hex === null || first.key === second.key) continue;
      const d = colorDistance(first.hex, second.hex);
      if (d === null || d >= threshold) continue;
      out.push({
        severity: 'warning',
        id: 'similar-colors',
        message:
          `colour ${second.key} (${second.written}) is hard to tell from ${first.key} (${first.written}) on a chart: ` +
          `their CIEDE2000 distance is ${oneDecimal(d)}, below ${threshold}.`,
        range: second.colorRange,
        hint: 'pick a colour further from the other, or merge the two keys if they are the same bead',
      });
      // One warning per colour is enough to send the designer to the palette.
      break;
    }
  });
  return out;
}

function roundRange(ast: PatternAst, round: number): SourceRange | null {
  const node = ast.rows.find((r) => r.from <= round && round <= r.to);
  return node ? node.numberRange : null;
}

/** The flat-circle check: compares the units each round adds with 2*pi. */
export function flatCircle(model: Model, ast: PatternAst): Diagnostic[] {
  if (model.layout.kind !== 'round') return [];
  const out: Diagnostic[] = [];
  const expected = FLAT_CIRCLE_ADDS;
  const broken = (r: RowInfo): boolean => r.units.some((id) => model.units[id]?.failed === true);
  for (let i = 1; i < model.rows.length; i++) {
    const prev = model.rows[i - 1]!;
    const row = model.rows[i]!;
    // A round that broke off holds fewer units than written, and the rounds after it build on that:
    // their counts say where the pattern breaks (already an error), not what shape the piece takes.
    if (broken(prev) || broken(row)) break;
    const added = row.units.length - prev.units.length;
    const ratio = added / expected;
    const shape = ratio < CUP_BELOW ? 'cup' : ratio > RUFFLE_ABOVE ? 'ruffle' : null;
    const range = roundRange(ast, row.row);
    if (shape === null || range === null) continue;
    const limit =
      shape === 'cup'
        ? `fewer than ${oneDecimal(CUP_BELOW * expected)}`
        : `more than ${oneDecimal(RUFFLE_ABOVE * expected)}`;
    out.push({
      severity: 'warning',
      id: 'flat-circle',
      message:
        `round ${row.row} adds ${added} units to round ${prev.row} (${prev.units.length} to ${row.units.length}); ` +
        `a flat circle adds about ${oneDecimal(expected)} per round, and ${limit} makes the piece ${shape}.`,
      range,
      hint:
        shape === 'cup'
          ? "add increases ('+') to this round if it should lie flat; leave it if a bowl or cup is meant"
          : 'use fewer increases in this round if it should lie flat; leave it if a ruffled edge is meant',
    });
  }
  return out;
}

/** The checks `fourfold check` and the server run on top of the engine's own. */
export function materialChecks(
  compiled: { ast: PatternAst; model: Model },
  options: MaterialCheckOptions = {},
): Diagnostic[] {
  return [
    ...similarColors(compiled.ast, options.similarColors ?? DEFAULT_SIMILAR_COLORS),
    ...flatCircle(compiled.model, compiled.ast),
  ];
}
