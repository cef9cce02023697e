/**
 * The thread through the net, by the four rules of NOTATION.md section 4:
 * figure-eight direction, start corners, round the unit, and the passage on
 * as the shortest route through beads already in place. The thread decides
 * where each picked-up bead lands, so colours are given to beads here, and
 * each bead's pick-up rank (the order the thread adds it) becomes its id.
 */
import type { Diagnostic, Result } from './diagnostic.js';
import type { Corner, Place, StepAction, ThreadPass, UnitStep } from './model.js';
import { beadAt, cornerAt, type Weave, type WeaveUnit } from './weave-net.js';
import { findRoute, preferRoute, type Net } from './thread-route.js';

export const PLACES: readonly Place[] = ['base', 'far', 'top', 'near'];
export const CORNERS: readonly Corner[] = ['base|far', 'far|top', 'top|near', 'near|base'];
export const PASSAGE_LIMIT = 12;

export interface Thread {
  /** Pick-up rank of each bead of the net (-1 for none): the bead's id in the model. */
  rank: number[];
  /** Colour key of each bead. */
  color: string[];
  /** Bead ids in these are the net's; the model renumbers them by rank. */
  passes: ThreadPass[];
  /** One per unit, failed units included (with no actions). */
  steps: UnitStep[];
}

interface Pos {
  j: number;
  last: number;
}

/** Corners where, going round in `dir` (1 forward, -1 backward), a shared place lies behind and a free one ahead. */
export function startCorners(shared: number, dir: 1 | -1): number[] {
  const out: number[] = [];
  for (let k = 0; k < 4; k++) {
    const behind = dir === 1 ? k : (k + 1) % 4;
    const ahead = dir === 1 ? (k + 1) % 4 : k;
    if ((shared >> behind) & 1 && !((shared >> ahead) & 1)) out.push(k);
  }
  return out;
}

/** The n-th place (0-3) met going round from corner `start`; the thread enters it at corner p-1 (forward) or p (backward). */
export const placeAt = (start: number, dir: 1 | -1, n: number): number =>
  dir === 1 ? (start + 1 + n) % 4 : (start - n + 4) % 4;

class Sim {
  readonly rank: number[];
  readonly color: string[];
  readonly passes: ThreadPass[] = [];
  readonly steps: UnitStep[] = [];
  readonly diagnostics: Diagnostic[] = [];
  private readonly net: Net;
  private next = 0;
  private pos: Pos = { j: -1, last: -1 };
  /** The unit the thread last went round: passages on are its `moveOn`. */
  private prevUnit = -1;

  constructor(private readonly w: Weave) {
    const beads = w.beadOwner.length;
    this.rank = new Array<number>(beads).fill(-1);
    this.color = new Array<string>(beads).fill('');
    this.net = buildNet(w, this.rank);
  }

  run(): void {
    for (const row of this.w.rows) {
      let dir: 1 | -1 = 1;
      let firstBuilt = true;
      for (let r = 0; r < row.units.length; r++) {
        const id = row.units[r]!;
        const u = this.w.units[id]!;
        if (u.failed) {
          this.steps[id] = emptyStep(id);
          continue;
        }
        if (u.shared === 0) dir = 1;
        else if (firstBuilt) dir = this.chooseFirst(u, row.units[r + 1]);
        else dir = dir === 1 ? -1 : 1;
        firstBuilt = false;
        this.doUnit(id, u, dir);
      }
    }
  }

  /** Best start corner for `u` going `dir` from `pos`, with its passage; null when none is in reach. */
  private startFor(u: WeaveUnit, dir: 1 | -1, pos: Pos): { corner: number; route: number[] } | null {
    const corners = u.shared === 0 ? [0] : startCorners(u.shared, dir);
    let best: { corner: number; route: number[] } | null = null;
    for (const corner of corners) {
      const route =
        pos.j === -1 ? [] : findRoute(this.net, pos.j, pos.last, cornerAt(this.w, u.id, corner), PASSAGE_LIMIT);
      if (route && (!best || preferRoute(this.rank, route, best.route))) best = { corner, route };
    }
    return best;
  }

  /** Rule 1 for a later row's first unit: the way that makes the passages to it and on to the second unit shortest. */
  private chooseFirst(u: WeaveUnit, secondId: number | undefined): 1 | -1 {
    const second = secondId === undefined ? undefined : this.w.units[secondId];
    let bestDir: 1 | -1 = 1;
    let bestLen = Infinity;
    for (const dir of [1, -1] as const) {
      const start = this.startFor(u, dir, this.pos);
      if (!start) continue;
      let len = start.route.length;
      if (second && !second.failed) {
        const end = this.goRound(u, dir, start.corner, false);
        const on = this.startFor(second, dir === 1 ? -1 : 1, end.pos);
        this.undo(end.picked);
        len += on ? on.route.length : PASSAGE_LIMIT + 1;
      }
      if (len < bestLen) {
        bestLen = len;
        bestDir = dir;
      }
    }
    return bestDir;
  }

  private undo(picked: number[]): void {
    for (const b of picked) this.rank[b] = -1;
    this.next -= picked.length;
  }

  /** Picks up at free places and passes shared ones; a unit sharing nothing passes its first bead again. */
  private goRound(
    u: WeaveUnit,
    dir: 1 | -1,
    corner: number,
    record: boolean,
  ): { pos: Pos; picked: number[]; actions: StepAction[] } {
    const picked: number[] = [];
    // Sized up front: a large model holds hundreds of thousands of these lists.
    const actions: StepAction[] = record ? new Array<StepAction>(u.shared === 0 ? 5 : 4) : [];
    let k = 0;
    let last = -1;
    let at = cornerAt(this.w, u.id, corner);
    const steps = u.shared === 0 ? 5 : 4;
    const ends = this.w.beadEnds;
    for (let i = 0; i < steps; i++) {
      const p = placeAt(corner, dir, i % 4);
      const bead = beadAt(this.w, u.id, p);
      const e0 = ends[2 * bead]!;
      const e1 = ends[2 * bead + 1]!;
      if (at !== e0 && at !== e1) {
        // After a skip the shared beads of a unit do not meet: the thread crosses the bead passed over.
        const entry = cornerAt(this.w, u.id, dir === 1 ? p : (p + 3) % 4) === e0 ? e1 : e0;
        const bridge = findRoute(this.net, at, last, entry, PASSAGE_LIMIT) ?? [];
        for (const b of bridge) {
          const out = ends[2 * b] === at ? ends[2 * b + 1]! : ends[2 * b]!;
          if (record) {
            actions[k++] = { kind: 'pass', bead: b, place: 'base' };
            this.passes.push({ bead: b, unit: -1, kind: 'close', from: at, to: out });
          }
          at = out;
          last = b;
        }
        at = entry;
      }
      const to = at === e0 ? e1 : e0;
      const pickup = i < 4 && ((u.shared >> p) & 1) === 0;
      if (pickup) {
        this.rank[bead] = this.next++;
        picked.push(bead);
      }
      if (record) {
        actions[k++] = { kind: pickup ? 'pickup' : 'pass', bead, place: PLACES[p]! };
        this.passes.push({ bead, unit: -1, kind: pickup ? 'pickup' : 'close', from: at, to });
      }
      at = to;
      last = bead;
    }
    return { pos: { j: at, last }, picked, actions };
  }

  private doUnit(id: number, u: WeaveUnit, dir: 1 | -1): void {
    let start = this.startFor(u, dir, this.pos);
    if (!start) {
      this.diagnostics.push({
        severity: 'error',
        id: 'no-passage',
        message: `${this.w.rows[u.rowIndex]!.word} ${u.row}, unit ${u.index}: the thread cannot reach this unit's start through ${PASSAGE_LIMIT} or fewer beads already in place`,
        range: u.range,
        hint: 'check the marks and skips just before this unit: the thread can only travel through beads already in place',
      });
      start = { corner: (u.shared === 0 ? [0] : startCorners(u.shared, dir))[0]!, route: [] };
    } else if (this.prevUnit !== -1) {
      this.recordPassage(start.route, this.prevUnit);
    }
    const mark = this.passes.length;
    const { pos, picked, actions } = this.goRound(u, dir, start.corner, true);
    for (let i = mark; i < this.passes.length; i++) this.passes[i]!.unit = id;
    this.colour(u, picked);
    const firstColour = this.color[picked[0]!];
    this.steps[id] = {
      unit: id,
      direction: dir === 1 ? 'forward' : 'backward',
      startCorner: CORNERS[start.corner]!,
      firstPlace: PLACES[this.w.beadOwnerPlace[picked[0]!]!]!,
      cue: picked.some((b) => this.color[b] !== firstColour),
      actions,
      moveOn: [],
    };
    this.pos = pos;
    this.prevUnit = id;
  }

  private recordPassage(route: number[], unit: number): void {
    const ends = this.w.beadEnds;
    // Each route is a fresh array of its exact length, so the step keeps it as it is.
    this.steps[unit]!.moveOn = route;
    let j = this.pos.j;
    for (const bead of route) {
      const to = ends[2 * bead] === j ? ends[2 * bead + 1]! : ends[2 * bead]!;
      this.passes.push({ bead, unit, kind: 'position', from: j, to });
      j = to;
    }
  }

  /** Pick-up order takes keys as the thread picks up; placed order takes them by place, base, far, top, near. */
  private colour(u: WeaveUnit, picked: number[]): void {
    if (this.w.order === 'placed') {
      let k = 0;
      for (let p = 0; p < 4; p++)
        if (((u.shared >> p) & 1) === 0) this.color[beadAt(this.w, u.id, p)] = u.keys[k++] ?? '';
    } else {
      for (let i = 0; i < picked.length; i++) this.color[picked[i]!] = u.keys[i] ?? '';
    }
  }
}

function emptyStep(unit: number): UnitStep {
  return {
    unit,
    direction: 'forward',
    startCorner: 'base|far',
    firstPlace: 'base',
    cue: false,
    actions: [],
    moveOn: [],
  };
}

function buildNet(w: Weave, rank: number[]): Net {
  const count = new Int32Array(w.junctionCount + 1);
  const beads = w.beadOwner.length;
  for (let b = 0; b < beads; b++) {
    const a = w.beadEnds[2 * b]!;
    const z = w.beadEnds[2 * b + 1]!;
    count[a + 1]!++;
    if (z !== a) count[z + 1]!++;
  }
  for (let j = 0; j < w.junctionCount; j++) count[j + 1]! += count[j]!;
  const fill = count.slice(0, w.junctionCount);
  const at = new Int32Array(count[w.junctionCount]!);
  for (let b = 0; b < beads; b++) {
    const a = w.beadEnds[2 * b]!;
    const z = w.beadEnds[2 * b + 1]!;
    at[fill[a]!++] = b;
    if (z !== a) at[fill[z]!++] = b;
  }
  return { start: count, at, ends: w.beadEnds, rank, seen: new Int32Array(2 * beads), search: 0 };
}

/** Follows the thread through a woven net. Never throws; an unreachable start is `no-passage` on that unit. */
export function thread(w: Weave): Result<Thread> {
  const sim = new Sim(w);
  sim.run();
  return {
    value: { rank: sim.rank, color: sim.color, passes: sim.passes, steps: sim.steps },
    diagnostics: sim.diagnostics,
  };
}
