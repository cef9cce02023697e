/**
 * The thread rules of NOTATION.md section 4: the worked check in both key
 * orders, and the rhythm beaders know from working right angle weave.
 */
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { compileAst } from '../../shared/weave-model.js';
import type { Model, Place } from '../../shared/model.js';
import { panelRows, pattern, tubeRows } from './build-ast.js';

/** Colour at each place of a unit, as "far A, top B, ...", in the order given. */
const laid = (m: Model, unit: number, places: Place[]) =>
  places.map((p) => `${p} ${m.beads[m.units[unit]!.places[p]!]!.color}`).join(', ');
const pickups = (m: Model, unit: number) =>
  m.steps[unit]!.actions.filter((a) => a.kind === 'pickup')
    .map((a) => `${a.place} ${m.beads[a.bead]!.color}`)
    .join(', ');
const newBeads = (m: Model, unit: number) =>
  m.steps[unit]!.actions.filter((a) => a.kind === 'pickup').map((a) => a.bead);

describe('worked check (NOTATION.md section 4)', () => {
  // Source: NOTATION.md section 4, "Worked check".
  const check = (m: Model) => {
    expect(pickups(m, 0)).toBe('far A, top B, near C, base D');
    expect(m.steps[1]).toMatchObject({ direction: 'backward', startCorner: 'top|near' });
    expect(pickups(m, 1)).toBe('top B, far C, base A');
    expect(m.steps[1]!.actions.at(-1)).toMatchObject({ kind: 'pass', place: 'near' });
    const u2 = m.units[1]!.places;
    expect(m.steps[1]!.moveOn).toEqual([u2.top, u2.far]);
    expect(m.steps[2]).toMatchObject({ direction: 'forward', startCorner: 'near|base' });
    expect(pickups(m, 2)).toBe('base C, far A, top B');
  };

  test('pick-up order: row 1: ABCD BCA CAB', () => {
    const { value, diagnostics } = compileAst(pattern('flat', ['ABCD BCA CAB']));
    expect(diagnostics).toEqual([]);
    check(value.model);
  });

  test('placed order: row 1: DABC ACB CAB describes the same piece', () => {
    const placed = compileAst(pattern('flat', ['DABC ACB CAB'], 'placed')).value.model;
    const pickup = compileAst(pattern('flat', ['ABCD BCA CAB'])).value.model;
    check(placed);
    const all: Place[] = ['base', 'far', 'top', 'near'];
    for (let u = 0; u < 3; u++) expect(laid(placed, u, all)).toBe(laid(pickup, u, all));
    expect(placed.beads.map((b) => b.color)).toEqual(pickup.beads.map((b) => b.color));
  });
});

describe('the rhythm of right angle weave (common practice)', () => {
  const panel = compileAst(pattern('flat', panelRows(6, 5))).value.model;
  const closes = (m: Model, unit: number) => {
    const actions = m.steps[unit]!.actions;
    const firstPass = actions.findIndex((a) => a.kind === 'pass');
    return actions.slice(firstPass).map((a) => a.kind);
  };

  test('two new beads close through two beads, three through one', () => {
    // common practice
    for (const u of panel.units) {
      const fresh = newBeads(panel, u.id).length;
      if (u.row === 1 && u.index === 1) continue;
      expect(closes(panel, u.id)).toEqual(fresh === 2 ? ['pass', 'pass'] : ['pass']);
      expect(fresh === 2 || fresh === 3).toBe(true);
    }
  });

  test('a fresh ring closes through its first bead again', () => {
    // common practice
    for (const m of [panel, compileAst(pattern('flat', ['AAAA', '*ABCD AA'])).value.model]) {
      const ring = m.units.find((u) => u.row === 1 || u.mark === '*')!;
      const actions = m.steps[ring.id]!.actions;
      expect(actions.map((a) => a.kind)).toEqual(['pickup', 'pickup', 'pickup', 'pickup', 'pass']);
      expect(actions[4]!.bead).toBe(actions[0]!.bead);
    }
  });

  test('in row 1 the passage to the next unit goes through two of its new beads', () => {
    // common practice; from unit 2 on: the first unit's pass through its first bead already ends where unit 2 starts.
    const row1 = panel.rows[0]!.units;
    for (const u of row1.slice(1, -1)) {
      const moveOn = panel.steps[u]!.moveOn;
      expect(moveOn.length).toBe(2);
      for (const b of moveOn) expect(newBeads(panel, u)).toContain(b);
    }
  });

  test('later rows: first bead on top is followed by its two new beads and the next base bead; up the side, by that bead', () => {
    // common practice
    for (const row of panel.rows.slice(1)) {
      for (let i = 1; i < row.units.length - 1; i++) {
        const u = row.units[i]!;
        const step = panel.steps[u]!;
        const next = panel.units[row.units[i + 1]!]!;
        if (step.firstPlace === 'top') {
          expect(step.startCorner).toBe('top|near');
          expect(new Set(step.moveOn)).toEqual(new Set([...newBeads(panel, u), next.places.base!]));
        } else {
          expect(step.firstPlace).toBe('far');
          expect(step.moveOn).toEqual([newBeads(panel, u)[0]]);
        }
      }
    }
  });

  test('consecutive units in a row go round opposite ways', () => {
    // common practice
    for (const m of [panel, compileAst(pattern('tube', tubeRows(6, 4))).value.model]) {
      for (const row of m.rows)
        for (let i = 1; i < row.units.length; i++)
          expect(m.steps[row.units[i]!]!.direction).not.toBe(m.steps[row.units[i - 1]!]!.direction);
    }
  });

  test('an increase at the end of a row, after a unit that went backward, is reached through its two new beads', () => {
    // Source: NOTATION.md section 4 ("there is no base bead to go on through").
    const m = compileAst(pattern('flat', ['AAAA', '*AAAA AA +AAA'])).value.model;
    const before = m.steps[2]!;
    expect(before.direction).toBe('backward');
    expect(m.steps[3]).toMatchObject({ direction: 'forward', startCorner: 'near|base' });
    expect(new Set(before.moveOn)).toEqual(new Set(newBeads(m, 2)));
    expect(before.moveOn.length).toBe(2);
  });

  test("a later row's first unit goes the way with the shorter passages to it and on to the second unit", () => {
    // Worked by hand from rules 1-4 (NOTATION.md section 4) for a panel 3 wide: row 1 ends forward at unit 3's
    // near|base corner. Forward, row 2's first unit is reached through 3 beads and its second through 1 (4);
    // backward, through 2 and then 4 (6). So it goes forward.
    const m = compileAst(pattern('flat', panelRows(3, 2))).value.model;
    expect(m.steps[2]).toMatchObject({ direction: 'forward', startCorner: 'near|base' });
    expect(m.steps[2]!.moveOn.length).toBe(3);
    expect(m.steps[3]).toMatchObject({ direction: 'forward', startCorner: 'base|far' });
    expect(m.steps[3]!.moveOn.length).toBe(1);
  });

  test('the unit closing row 1 of a tube alternates pick-ups and passes', () => {
    // Source: NOTATION.md section 4, rule 3 (the split case).
    const m = compileAst(pattern('tube', tubeRows(5, 1))).value.model;
    expect(m.steps[4]!.actions.map((a) => a.kind)).toEqual(['pickup', 'pass', 'pickup', 'pass']);
  });

  test('the thread path is continuous: each pass starts where the last ended', () => {
    for (const m of [panel, compileAst(pattern('tube', tubeRows(4, 3))).value.model]) {
      for (let i = 1; i < m.thread.length; i++) expect(m.thread[i]!.from).toBe(m.thread[i - 1]!.to);
      for (const p of m.thread) expect(new Set(m.beads[p.bead]!.junctions)).toEqual(new Set([p.from, p.to]));
    }
  });

  test('cues only where the new beads differ in colour', () => {
    const m = compileAst(pattern('flat', ['AAAA ABA AAA'])).value.model;
    expect(m.steps.map((s) => s.cue)).toEqual([false, true, false]);
  });
});

describe('decreases in closed rows', () => {
  test('after a skip the thread crosses the bead passed over, and the path stays continuous', () => {
    // A tube of 6 narrowing to 5: the skipped bead is crossed on the way round the unit after it.
    const { value, diagnostics } = compileAst(pattern('tube', [...tubeRows(6, 2), 'AAA AA - AA AA A']));
    expect(diagnostics).toEqual([]);
    const m = value.model;
    for (let i = 1; i < m.thread.length; i++) expect(m.thread[i]!.from).toBe(m.thread[i - 1]!.to);
    for (const p of m.thread) expect(new Set(m.beads[p.bead]!.junctions)).toEqual(new Set([p.from, p.to]));
    const row2Tops = m.rows[1]!.units.map((u) => m.units[u]!.places.top);
    const skipped = row2Tops[2]!;
    expect(m.units.filter((u) => u.row === 3).some((u) => Object.values(u.places).includes(skipped))).toBe(false);
    expect(m.thread.some((p) => p.bead === skipped && m.units[p.unit]!.row === 3)).toBe(true);
  });
});

test('random decreases in tubes and rounds weave cleanly and the thread never jumps', () => {
  // A closed row over c base beads: each unit takes one, each skip passes one, the last unit closes the row.
  const rowArb = fc.integer({ min: 4, max: 9 }).chain((c) =>
    fc.tuple(
      fc.constant(c),
      fc.constantFrom('tube' as const, 'round' as const),
      fc.array(fc.boolean(), { minLength: c, maxLength: c }).filter((skips) => skips.filter((s) => !s).length >= 2),
    ),
  );
  fc.assert(
    fc.property(rowArb, ([c, layout, skips]) => {
      const units = skips.filter((s) => !s).length;
      let seen = 0;
      const row2 = skips.map((skip) => (skip ? '-' : ++seen === 1 ? 'AAA' : seen === units ? 'A' : 'AA')).join(' ');
      const { value, diagnostics } = compileAst(pattern(layout, [tubeRows(c, 1)[0]!, row2]));
      expect(diagnostics).toEqual([]);
      const m = value.model;
      for (let i = 1; i < m.thread.length; i++) expect(m.thread[i]!.from).toBe(m.thread[i - 1]!.to);
      for (const p of m.thread) expect(new Set(m.beads[p.bead]!.junctions)).toEqual(new Set([p.from, p.to]));
    }),
  );
});
