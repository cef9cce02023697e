/**
 * Bead counts and Euler characteristics from the structure, against closed
 * forms (NOTATION.md section 8), over random sizes.
 */
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { compileAst } from '../../shared/weave-model.js';
import type { Model } from '../../shared/model.js';
import { fanRows, panelRows, pattern, tubeRows } from './build-ast.js';

const built = (m: Model) => m.units.filter((u) => !u.failed).length;
/** Vertices - edges + faces of the bead net, each gap under a round increase counted as a face. */
const euler = (m: Model) => m.junctions.length - m.beads.length + built(m) + m.beads.filter((b) => b.gap).length;

describe('closed forms', () => {
  test('flat strip of n units has 3n + 1 beads', () => {
    // Source: a strip of n squares sharing sides has 3n + 1 edges (count: 4 + 3(n - 1)).
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), (n) => {
        const { value, diagnostics } = compileAst(pattern('flat', panelRows(n, 1)));
        expect(diagnostics).toEqual([]);
        expect(value.model.beads.length).toBe(3 * n + 1);
      }),
    );
  });

  test('flat panel n x r has n(r+1) + r(n+1) beads, and junctions - beads + units = 1', () => {
    // Source: edges of the n x r grid graph, Weisstein, MathWorld "Grid Graph";
    // Euler's formula V - E + F = 1 for a disc (Levin, "Discrete Mathematics: An Open Introduction", section 4.3).
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 15 }), fc.integer({ min: 1, max: 15 }), (n, r) => {
        const { value, diagnostics } = compileAst(pattern('flat', panelRows(n, r)));
        expect(diagnostics).toEqual([]);
        expect(value.model.beads.length).toBe(n * (r + 1) + r * (n + 1));
        expect(value.model.junctions.length).toBe((n + 1) * (r + 1));
        expect(euler(value.model)).toBe(1);
      }),
    );
  });

  test('tube c round and r rows has c(2r + 1) beads, and junctions - beads + units = 0', () => {
    // Source: NOTATION.md section 8; Euler characteristic 0 of an annulus (Levin, as above).
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 15 }), fc.integer({ min: 1, max: 12 }), (c, r) => {
        const { value, diagnostics } = compileAst(pattern('tube', tubeRows(c, r)));
        expect(diagnostics).toEqual([]);
        expect(value.model.beads.length).toBe(c * (2 * r + 1));
        expect(euler(value.model)).toBe(0);
      }),
    );
  });

  test('growing fan of R rows has 2R^2 + 3R - 1 beads, and junctions - beads + units = 1', () => {
    // Source: NOTATION.md section 8 (row k adds a fresh ring of 4, 2k - 3 units of 2, an increase of 3).
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 14 }), (R) => {
        const { value, diagnostics } = compileAst(pattern('flat', fanRows(R)));
        expect(diagnostics).toEqual([]);
        expect(value.model.beads.length).toBe(2 * R * R + 3 * R - 1);
        expect(value.model.rows.at(-1)!.units.length).toBe(2 * R - 1);
        expect(euler(value.model)).toBe(1);
      }),
    );
  });

  test('a round with increases has junctions - beads + units + gaps = 0', () => {
    // Source: Euler characteristic 0 of an annulus, the centre being open (Levin, as above).
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 10 }),
        fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 1, maxLength: 6 }),
        (c, adds) => {
          const rows = [['AAAA', ...Array<string>(c - 2).fill('AAA'), 'AA'].join(' ')];
          let units = c;
          for (const add of adds) {
            // `add` increases spread through the round; each `+` adds a unit and builds on no bead.
            const parts = ['AAA'];
            for (let i = 1; i < units; i++) {
              parts.push(i === units - 1 ? 'A' : 'AA');
              if (i <= add && i < units - 1) parts.push('+AAA');
            }
            const made = parts.filter((p) => p.startsWith('+')).length;
            rows.push(parts.join(' '));
            units += made;
          }
          const { value, diagnostics } = compileAst(pattern('round', rows));
          expect(diagnostics).toEqual([]);
          expect(value.model.rows.at(-1)!.units.length).toBe(units);
          expect(euler(value.model)).toBe(0);
        },
      ),
    );
  });
});

describe('every bead is one object', () => {
  test('random valid panels, fans, tubes and rounds weave cleanly; each bead is held by 1 or 2 units', () => {
    const shapes = fc.oneof(
      fc
        .tuple(fc.integer({ min: 1, max: 8 }), fc.integer({ min: 1, max: 8 }))
        .map(([n, r]) => pattern('flat', panelRows(n, r))),
      fc.integer({ min: 1, max: 8 }).map((R) => pattern('flat', fanRows(R))),
      fc
        .tuple(fc.integer({ min: 2, max: 8 }), fc.integer({ min: 1, max: 8 }))
        .map(([c, r]) => pattern('tube', tubeRows(c, r))),
      fc
        .tuple(fc.integer({ min: 3, max: 8 }), fc.integer({ min: 1, max: 6 }))
        .map(([c, r]) => pattern('round', tubeRows(c, r))),
      fc
        .integer({ min: 3, max: 7 })
        .map((c) =>
          pattern('round', [tubeRows(c, 1)[0]!, ['AAA', ...Array<string>(c - 2).fill('AB +ABA'), 'A'].join(' ')]),
        ),
    );
    fc.assert(
      fc.property(shapes, (ast) => {
        const { value, diagnostics } = compileAst(ast);
        expect(diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
        const m = value.model;
        const holders = new Array<number>(m.beads.length).fill(0);
        for (const u of m.units) for (const b of Object.values(u.places)) holders[b!]!++;
        m.beads.forEach((b, i) => {
          expect(b.id).toBe(i);
          expect(b.units.length).toBe(holders[i]);
          expect([1, 2]).toContain(b.units.length);
        });
        // The thread never jumps: each pass starts where the one before ended, through a bead that ends there.
        for (let i = 1; i < m.thread.length; i++) expect(m.thread[i]!.from).toBe(m.thread[i - 1]!.to);
        for (const p of m.thread) expect(new Set(m.beads[p.bead]!.junctions)).toEqual(new Set([p.from, p.to]));
        // Every bead is picked up exactly once by the thread.
        expect(m.thread.filter((p) => p.kind === 'pickup').map((p) => p.bead)).toEqual(m.beads.map((b) => b.id));
      }),
    );
  });
});
