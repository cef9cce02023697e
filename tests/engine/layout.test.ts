/**
 * Geometry: the square grid for flat and tube, rings for rounds, and the
 * finished size from the bead table.
 */
import { describe, expect, test } from 'vitest';
import { compileAst } from '../../shared/weave-model.js';
import { BEAD_SIZES, beadSize, unitSideMm } from '../../shared/bead-sizes.js';
import { panelRows, pattern, tubeRows } from './build-ast.js';

describe('grid', () => {
  test('a flat panel: junctions on integer points, each bead midway between its ends, one side long', () => {
    const m = compileAst(pattern('flat', panelRows(5, 4))).value.model;
    expect(m.layout.bounds).toEqual({ minX: 0, minY: 0, maxX: 5, maxY: 4 });
    for (const j of m.junctions) {
      expect(Number.isInteger(j.x) && Number.isInteger(j.y)).toBe(true);
    }
    for (const b of m.beads) {
      const [a, z] = b.junctions.map((j) => m.junctions[j]!);
      expect(Math.hypot(a!.x - z!.x, a!.y - z!.y)).toBe(1);
      expect([b.x, b.y]).toEqual([(a!.x + z!.x) / 2, (a!.y + z!.y) / 2]);
      expect(b.angle).toBe(a!.y === z!.y ? 0 : 90);
    }
    // Every unit's centre is half a side in from its four beads.
    for (const u of m.units)
      for (const p of ['base', 'far', 'top', 'near'] as const) {
        const b = m.beads[u.places[p]!]!;
        expect(Math.hypot(b.x - u.x, b.y - u.y)).toBe(0.5);
      }
  });

  test('flat rows alternate heading; the first unit of row 2 sits over the last of row 1', () => {
    const m = compileAst(pattern('flat', panelRows(3, 2))).value.model;
    expect(m.rows.map((r) => r.heading)).toEqual(['right', 'left']);
    expect(m.units[3]!.x).toBe(m.units[2]!.x);
  });

  test('a tube is unrolled: c columns, the seam at x = 0, seam beads drawn on the left edge', () => {
    const m = compileAst(pattern('tube', tubeRows(4, 3))).value.model;
    expect(m.layout.seamX).toBe(0);
    expect(m.layout.bounds.maxX).toBe(4);
    for (const j of m.junctions) expect(j.x).toBeLessThan(4);
    for (const b of m.beads) expect(b.x).toBeGreaterThanOrEqual(0);
    const b = m.layout.beadMm;
    // The tube's width is its circumference unrolled: c unit sides.
    expect(m.layout.widthMm).toBeCloseTo(4 * (b.length + b.diameter / 2), 1);
  });
});

describe('rings', () => {
  const { value, diagnostics } = compileAst(
    pattern('round', ['AAAA AAA AAA AAA AAA AA', 'AAA AA +AAA AA AA +AAA AA A']),
  );
  const m = value.model;
  const r0 = m.layout.centerRadius!;

  test('the round weaves cleanly', () => expect(diagnostics).toEqual([]));

  test('round k lies between radius k - 1 and k, plus the centre opening', () => {
    expect(r0).toBeCloseTo(6 / (2 * Math.PI), 6);
    for (const u of m.units) expect(Math.hypot(u.x, u.y)).toBeCloseTo(u.row - 0.5 + r0, 3);
    const radii = new Set(m.junctions.map((j) => Math.round(Math.hypot(j.x, j.y) * 1000) / 1000));
    expect([...radii].sort()).toEqual([r0, r0 + 1, r0 + 2].map((r) => Math.round(r * 1000) / 1000).sort());
  });

  test('a unit on a base bead sits over it; an increase draws its base as a short gap bead', () => {
    for (const u of m.units.filter((v) => v.row === 2)) {
      const base = m.beads[u.places.base!]!;
      if (u.mark === '+') {
        expect(base.gap).toBe(true);
        expect(base.junctions[0]).toBe(base.junctions[1]);
        expect(base.length).toBeLessThan(0.5);
      } else {
        const angle = (p: { x: number; y: number }) => Math.atan2(p.y, p.x);
        expect(Math.cos(angle(u) - angle(base))).toBeGreaterThan(1 - 1e-6);
      }
    }
    expect(m.beads.filter((b) => b.gap).length).toBe(2);
  });
});

describe('bead table', () => {
  test('every size named in NOTATION.md is in the table, with a sensible shape', () => {
    // Source: NOTATION.md section 2 lists the sizes; figures are from memory (see bead-sizes.ts).
    for (const [size, shape] of [
      ['15/0', 'round'],
      ['11/0', 'round'],
      ['8/0', 'round'],
      ['6/0', 'round'],
      ['11/0', 'cylinder'],
    ] as const) {
      const b = beadSize(size, shape);
      expect([b.size, b.shape]).toEqual([size, shape]);
      expect(b.perGram.low).toBeLessThan(b.perGram.high);
      // common practice: supplier charts differ by 10-20%, so a range wider than +-25% of its middle would be no figure at all.
      expect((b.perGram.high - b.perGram.low) / ((b.perGram.high + b.perGram.low) / 2)).toBeLessThan(0.5);
    }
    // Larger beads (smaller aught numbers) are larger and fewer to the gram.
    const rounds = BEAD_SIZES.filter((b) => b.shape === 'round');
    for (let i = 1; i < rounds.length; i++) {
      expect(rounds[i]!.diameterMm).toBeGreaterThan(rounds[i - 1]!.diameterMm);
      expect(rounds[i]!.perGram.high).toBeLessThan(rounds[i - 1]!.perGram.low);
    }
    // Weight check from geometry: glass (about 2.5 g/cm3, from memory) in a ring of the bead's size,
    // hole about a third of the diameter, gives a figure inside the range's order of magnitude.
    for (const b of BEAD_SIZES) {
      const volumeCm3 = (Math.PI / 4) * (b.diameterMm ** 2 - (b.diameterMm / 3) ** 2) * b.lengthMm * 1e-3;
      const perGram = 1 / (volumeCm3 * 2.5);
      expect(perGram / b.perGram.low).toBeGreaterThan(0.5);
      expect(perGram / b.perGram.high).toBeLessThan(2);
    }
    expect(unitSideMm(beadSize('11/0', 'round'))).toBeCloseTo(2.4, 5);
  });
});
