import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buyAmount, pathLengthMm, tally, TURN_ALLOWANCE_MM } from '../../shared/tally.js';
import { stripModel } from './fixture-strip.js';

// 11/0 round beads per gram, a typical supplier figure (from memory).
const BPG = { low: 100, high: 120 };

describe('tally on a hand-built strip', () => {
  const model = stripModel();
  const { value: t, diagnostics } = tally(model, { beadsPerGram: BPG });

  it('counts each bead once, however many units hold it', () => {
    expect(diagnostics).toEqual([]);
    // Source: NOTATION.md section 8, a strip of n units has 3n + 1 beads.
    expect(t.beads).toBe(3 * 2 + 1);
    expect(t.units).toBe(2);
    expect(t.rows).toEqual([{ row: 1, units: 2, beads: 7 }]);
    expect(t.colors.map((c) => [c.key, c.count])).toEqual([
      ['A', 2],
      ['B', 2],
      ['C', 2],
      ['D', 1],
      ['E', 0],
    ]);
  });

  it('gives grams as a low-high range and buys the high estimate plus the spare', () => {
    const a = t.colors[0]!;
    expect(a.grams).toEqual({ low: 0.02, high: 0.02 });
    for (const c of t.colors) {
      expect(c.grams.low).toBeLessThanOrEqual(c.grams.high);
      expect(c.buyGrams).toBeGreaterThanOrEqual(c.grams.high * (1 + t.spare) - 1e-9);
    }
    expect(t.colors.find((c) => c.key === 'E')!.buyGrams).toBe(0);
    expect(t.spare).toBe(0.1);
  });

  it('measures the thread as passes x bead length + 1 mm per turn, plus two tails per thread', () => {
    // 9 passes of 1.6 mm; each of the 8 steps from one bead to the next goes round a square
    // corner (a side bead to a top or bottom bead or back), so 8 turns.
    const turnsCounted = 8;
    expect(pathLengthMm(model)).toBeCloseTo(9 * 1.6 + turnsCounted * TURN_ALLOWANCE_MM, 9);
    expect(t.thread.threads).toBe(1);
    expect(t.thread.mm).toBe(Math.round(9 * 1.6 + 8 + 2 * 150));
  });

  it('needs more threads when the working length is short', () => {
    const short = tally(model, { beadsPerGram: BPG, workingLengthMm: 310, tailMm: 150 }).value;
    // 10 mm of working thread per piece of 310 mm: ceil(22.4 / 10) = 3 threads.
    expect(short.thread.threads).toBe(3);
    expect(short.thread.mm).toBe(Math.round(22.4 + 3 * 300));
  });

  it('refuses options that cannot work, with a diagnostic instead of a throw', () => {
    const bad = tally(model, { beadsPerGram: BPG, workingLengthMm: 300, tailMm: 150, spare: -0.1, packGrams: 0 });
    expect(bad.diagnostics.map((d) => d.id)).toEqual(['tally-option', 'tally-option', 'tally-option']);
    expect(bad.diagnostics.every((d) => d.severity === 'error')).toBe(true);
  });

  it('keeps the finished size from the layout', () => {
    expect(t.size).toEqual({ widthMm: 7.6, heightMm: 3.8 });
  });
});

describe('buy amount', () => {
  it('rounds up to whole grams, or whole packs, never below high x (1 + spare)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 500, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.option(fc.integer({ min: 1, max: 50 }), { nil: undefined }),
        (high, spare, pack) => {
          const buy = buyAmount(high, spare, pack);
          expect(buy).toBeGreaterThanOrEqual(high * (1 + spare) - 1e-6);
          if (pack === undefined) {
            expect(Number.isInteger(buy)).toBe(true);
            expect(buy - 1).toBeLessThan(high * (1 + spare));
          } else {
            expect(buy % pack).toBe(0);
            expect(buy - pack).toBeLessThan(high * (1 + spare));
          }
        },
      ),
    );
  });

  it('does not round 5.0 g up to 6 g from floating-point dust', () => {
    // 1.1 * 5 / 1.1 style dust: 4.545454... * 1.1 is 4.999999... or 5.000000001 in binary.
    expect(buyAmount(5 / 1.1, 0.1)).toBe(5);
    expect(buyAmount(10, 0.1, 5)).toBe(15);
  });
});

describe('fourfold.tally/1 JSON shape', () => {
  // Source: PRODUCT.md, "JSON shapes that other tools rely on": every key, and no others.
  it('has exactly the keys PRODUCT.md lists, at every level', () => {
    const t = JSON.parse(JSON.stringify(tally(stripModel(), { beadsPerGram: BPG }).value)) as Record<string, unknown>;
    const keys = (o: unknown) => Object.keys(o as object).sort();
    expect(keys(t)).toEqual(['beads', 'colors', 'rows', 'schema', 'size', 'spare', 'thread', 'title', 'units']);
    expect(t.schema).toBe('fourfold.tally/1');
    expect((t.rows as unknown[]).map(keys)).toEqual([['beads', 'row', 'units']]);
    for (const c of t.colors as Record<string, unknown>[]) {
      expect(keys(c)).toEqual(['buyGrams', 'count', 'grams', 'hex', 'key', 'name']);
      expect(keys(c.grams)).toEqual(['high', 'low']);
    }
    expect(keys(t.thread)).toEqual(['mm', 'threads']);
    expect(keys(t.size)).toEqual(['heightMm', 'widthMm']);
    for (const n of [t.beads, t.units, t.spare]) expect(typeof n).toBe('number');
  });

  it('takes beads per gram from the bead-size table when none is given', () => {
    const t = tally(stripModel(), {}).value;
    expect(t.colors[0]!.grams.low).toBeGreaterThan(0);
    expect(t.colors[0]!.grams.low).toBeLessThanOrEqual(t.colors[0]!.grams.high);
  });
});
