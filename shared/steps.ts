/**
 * The written steps as a document: what a beader reads, built from the
 * model's per-unit steps and thread path, so the words can never disagree
 * with the chart. Renderers (steps-render.ts) only lay this out; the JSON
 * form of `fourfold steps --format json` is this document as it is.
 */
import type { Layout } from '../parser/ast.js';
import type { Model, Place, RowInfo, Unit, UnitStep } from './model.js';
import { colorName } from './color-name.js';

export interface BeadRef {
  key: string;
  name: string;
  /** Where the bead sits, in plain words ("top", "left side", "bottom of the next unit"). */
  where: string;
}

/** A run of pick-ups or of passes, in thread order. */
export interface StepMove {
  kind: 'pickup' | 'pass';
  beads: BeadRef[];
}

export interface StepUnit {
  number: number;
  unit: number;
  mark: '' | '*' | '+';
  /** Where the first new bead goes; only when the new beads are not all one colour. */
  cue?: string;
  /** The last unit of a tube's or a round's row, which joins the row up with its first unit. */
  closes?: true;
  /** Going round the unit: pick up, then pass through to close it. */
  round: StepMove[];
  /** Beads to pass through to reach the next unit, in the next row too (empty when the thread is already there). */
  moveOn: BeadRef[];
  /** Side beads the row shows once this unit is done: the count to find one's place by. */
  sideBeads: number;
}

export interface StepRow {
  row: number;
  word: 'row' | 'round';
  units: number;
  beads: number;
  direction: string;
  /**
   * Top beads of the row before that this row builds nothing on (skips, a
   * narrowing edge), counted at its start, at its end and along the way;
   * absent when it builds on every one.
   */
  uncovered?: { start: number; end: number; along: number };
  notes: string[];
  steps: StepUnit[];
}

export interface StepsDoc {
  schema: 'fourfold.steps/1';
  title: string;
  designer?: string;
  beads: string;
  layout: Layout;
  colors: { key: string; name: string; hex: string }[];
  glossary: { term: string; meaning: string }[];
  notes: string[];
  rows: StepRow[];
  /** How to begin: thread length and the tail, before the first unit. */
  start: string;
  /** How to end off once the last unit is done, the same words for every piece. */
  finish: string;
}

/**
 * Getting going, in plain words: the lengths are the tally's defaults
 * (a 150 cm working thread, a 15 cm tail; common practice, from memory).
 */
export const startWords = (word: 'row' | 'round'): string =>
  'Cut a comfortable length of thread (about 150 cm) and thread the needle. ' +
  `Pick up the beads of ${word} 1, unit 1 and slide them down to about 15 cm from the end: ` +
  'that tail is left loose to hold while you work and is finished off at the end.';

/**
 * Securing the ends, in plain words: common practice (from memory), the way
 * beading books describe it, without the trade word "weave in".
 */
export const FINISH =
  'When the last unit is done, take the needle back through the beads of a few units, ' +
  'tie a small knot round the thread between two beads, pass on through a few more beads and cut the thread close. ' +
  'Do the same with the tail left at the start.';

type Heading = RowInfo['heading'];

/** Place names as a beader sees them on the chart (rows stack upward, rounds grow outward). */
function placeWords(place: Place, heading: Heading, layout: Layout): string {
  if (place === 'top') return layout === 'round' ? 'outer edge' : 'top';
  if (place === 'base') return layout === 'round' ? 'inner edge' : 'bottom';
  if (heading === 'around') return place === 'far' ? 'side ahead' : 'side behind';
  const right = (place === 'far') === (heading === 'right');
  return right ? 'right side' : 'left side';
}

function cueWords(place: Place, heading: Heading, layout: Layout): string {
  const where = placeWords(place, heading, layout);
  if (place === 'top' && layout !== 'round') return 'first bead on top';
  if (place === 'base' && layout !== 'round') return 'first bead at the bottom';
  return `first bead on the ${where}`;
}

function directionWords(heading: Heading, word: 'row' | 'round', first: boolean): string {
  if (heading === 'right') return 'working left to right';
  if (heading === 'left') return 'working right to left';
  return first ? 'working round' : `working round, the same way as the ${word} before`;
}

const GLOSSARY = {
  unit: 'a square ring of four beads, one on each side; neighbouring units share the bead between them.',
  'pick up': 'slide the beads named onto the needle, in the order given.',
  'pass through': 'take the needle through a bead already in place, the way the thread is going.',
  'side beads': 'the beads standing across the row between units; count them to find your place.',
  cue: 'where the first new bead goes, given only when a unit uses more than one colour.',
  round: 'a row that goes all the way round and joins up with its own start.',
  'fresh ring (*)': 'a unit of four new beads that starts the row one place further out.',
  'increase (+)': 'a unit with no bead below it, which makes the row one unit longer.',
} as const;

function glossary(model: Model): StepsDoc['glossary'] {
  const marks = new Set(model.units.map((u) => u.mark));
  const terms: (keyof typeof GLOSSARY)[] = ['unit', 'pick up', 'pass through', 'side beads'];
  if (model.steps.some((s) => s.cue)) terms.push('cue');
  if (model.layout.kind !== 'flat') terms.push('round');
  if (marks.has('*')) terms.push('fresh ring (*)');
  if (marks.has('+')) terms.push('increase (+)');
  return terms.map((term) => ({ term, meaning: GLOSSARY[term] }));
}

interface Ctx {
  model: Model;
  names: Map<string, string>;
  rows: Map<number, RowInfo>;
}

function placeOf(unit: Unit, bead: number): Place | null {
  for (const p of ['base', 'far', 'top', 'near'] as const) if (unit.places[p] === bead) return p;
  return null;
}

function beadRef(ctx: Ctx, bead: number, where: string): BeadRef {
  const key = ctx.model.beads[bead]?.color ?? '?';
  return { key, name: ctx.names.get(key) ?? '', where };
}

/** Names a bead from where the beader's needle is: this unit, the next, or by row and unit. */
function locate(ctx: Ctx, bead: number, unit: Unit, next: Unit | undefined): string {
  const { model } = ctx;
  const heading = ctx.rows.get(unit.row)?.heading ?? 'right';
  const here = placeOf(unit, bead);
  if (here) return placeWords(here, heading, model.layout.kind);
  const there = next ? placeOf(next, bead) : null;
  if (next && there) return `${placeWords(there, heading, model.layout.kind)} of the next unit`;
  const holder = model.units[model.beads[bead]?.units[0] ?? -1];
  if (!holder) return 'bead';
  const row = ctx.rows.get(holder.row);
  const p = placeOf(holder, bead) ?? 'top';
  return `${placeWords(p, row?.heading ?? 'right', model.layout.kind)} of ${row?.word ?? 'row'} ${holder.row}, unit ${holder.index}`;
}

function roundMoves(ctx: Ctx, step: UnitStep, heading: Heading): StepMove[] {
  const moves: StepMove[] = [];
  const firstPicked = step.actions.find((a) => a.kind === 'pickup')?.bead;
  for (const action of step.actions) {
    const place = placeWords(action.place, heading, ctx.model.layout.kind);
    // Closing a ring of four goes back through its first bead: say so, a beginner looks for it by order, not place.
    const again = action.kind === 'pass' && action.bead === firstPicked ? ', the first bead of this unit' : '';
    const ref = beadRef(ctx, action.bead, `${place}${again}`);
    const last = moves[moves.length - 1];
    if (last && last.kind === action.kind) last.beads.push(ref);
    else moves.push({ kind: action.kind, beads: [ref] });
  }
  return moves;
}

/** Which top beads of `below` the row leaves without a unit on them, in the order the row meets them. */
function uncoveredOf(model: Model, row: RowInfo, below: RowInfo | undefined): StepRow['uncovered'] {
  if (!below) return undefined;
  const used = new Set(row.units.map((id) => model.units[id]?.places.base));
  const met = row.heading === 'around' ? below.units : [...below.units].reverse();
  const bare = met.map((id) => model.units[id]?.places.top ?? null).map((b) => b !== null && !used.has(b));
  const count = bare.filter(Boolean).length;
  if (count === 0) return undefined;
  const first = bare.indexOf(false);
  // A row that covers nothing at all (it broke off): everything counts as its start.
  if (first === -1) return { start: count, end: 0, along: 0 };
  const end = bare.length - 1 - bare.lastIndexOf(false);
  return { start: first, end, along: count - first - end };
}

function buildRow(ctx: Ctx, row: RowInfo, stepOf: Map<number, UnitStep>, below?: RowInfo): StepRow {
  const { model } = ctx;
  const sides = new Set<number>();
  const steps: StepUnit[] = [];
  const uncovered = uncoveredOf(model, row, below);
  row.units.forEach((id, i) => {
    const unit = model.units[id]!;
    const next = model.units[row.units[i + 1] ?? -1];
    for (const p of ['near', 'far'] as const) {
      const b = unit.places[p];
      if (b !== null) sides.add(b);
    }
    const step = stepOf.get(id);
    const cue = step?.cue ? cueWords(step.firstPlace, row.heading, model.layout.kind) : undefined;
    steps.push({
      number: unit.index,
      unit: id,
      mark: unit.mark,
      ...(cue ? { cue } : {}),
      ...(model.layout.kind !== 'flat' && i === row.units.length - 1 && i > 0 ? { closes: true as const } : {}),
      round: step ? roundMoves(ctx, step, row.heading) : [],
      moveOn: (step?.moveOn ?? []).map((b) => beadRef(ctx, b, locate(ctx, b, unit, next))),
      sideBeads: sides.size,
    });
  });
  return {
    row: row.row,
    word: row.word,
    units: row.units.length,
    // Counted from the pick-ups printed, so the header always matches the lines below it.
    beads: steps.reduce(
      (n, s) => n + s.round.filter((m) => m.kind === 'pickup').reduce((k, m) => k + m.beads.length, 0),
      0,
    ),
    direction: directionWords(row.heading, row.word, row.row === 1),
    ...(uncovered ? { uncovered } : {}),
    notes: row.notes,
    steps,
  };
}

export function buildSteps(model: Model): StepsDoc {
  const ctx: Ctx = {
    model,
    names: new Map(model.palette.map((p) => [p.key, colorName(p)])),
    rows: new Map(model.rows.map((r) => [r.row, r])),
  };
  const stepOf = new Map(model.steps.map((s) => [s.unit, s]));
  return {
    schema: 'fourfold.steps/1',
    title: model.header.title,
    ...(model.header.designer ? { designer: model.header.designer } : {}),
    beads: `${model.header.beads.size} ${model.header.beads.shape}`,
    layout: model.layout.kind,
    colors: model.palette.map((p) => ({ key: p.key, name: colorName(p), hex: p.hex })),
    glossary: glossary(model),
    notes: model.header.notes,
    rows: model.rows.map((r, i) => buildRow(ctx, r, stepOf, model.rows[i - 1])),
    start: startWords(model.rows[0]?.word ?? 'row'),
    finish: FINISH,
  };
}
