/**
 * Bead tally and materials (NOTATION.md section 6): the `fourfold.tally/1`
 * shape of PRODUCT.md. Every count comes from the bead net itself (each bead
 * object once, however many units hold it), never from a formula, so the
 * tally agrees with the chart by construction.
 */
import { fileStart, type Diagnostic, type Result } from './diagnostic.js';
import { beadSize } from './bead-sizes.js';
import type { Bead, Model, ThreadPass } from './model.js';

export interface GramRange {
  low: number;
  high: number;
}

export interface TallyOptions {
  /** Beads per gram as a low-high range; by default the bead-size table's for the pattern's beads. */
  beadsPerGram?: GramRange;
  /** Spare margin for misshapen beads, as a fraction (0.1 = 10%). */
  spare?: number;
  /** Round each buy amount up to whole packs of this many grams. */
  packGrams?: number;
  /** Length of one thread as cut, in mm. */
  workingLengthMm?: number;
  /** Tail left at the start and at the end of each thread, in mm. */
  tailMm?: number;
}

export interface Tally {
  schema: 'fourfold.tally/1';
  title: string;
  beads: number;
  units: number;
  rows: { row: number; units: number; beads: number }[];
  colors: { key: string; name: string; hex: string; count: number; grams: GramRange; buyGrams: number }[];
  spare: number;
  thread: { mm: number; threads: number };
  size: { widthMm: number; heightMm: number };
}

// Defaults of NOTATION.md section 6: the tail and spare are common practice,
// from memory; the working length is what a beader can handle without tangles.
export const DEFAULT_SPARE = 0.1;
export const DEFAULT_WORKING_LENGTH_MM = 1500;
export const DEFAULT_TAIL_MM = 150;
/** The international inch (exact by definition since 1959). */
export const MM_PER_INCH = 25.4;
/** Allowance for the thread bending round a junction (NOTATION.md 6). */
export const TURN_ALLOWANCE_MM = 1;

const round2 = (n: number): number => Math.round(n * 100) / 100;
const round1 = (n: number): number => Math.round(n * 10) / 10;
/** Ceil that ignores floating-point dust (1.1 * 5 is 5.500000000000001). */
const ceilClean = (n: number): number => Math.ceil(n - 1e-9);

function optionProblem(message: string): Diagnostic {
  return { severity: 'error', id: 'tally-option', message, range: fileStart };
}

function checkOptions(o: Required<Omit<TallyOptions, 'packGrams'>> & Pick<TallyOptions, 'packGrams'>): Diagnostic[] {
  const out: Diagnostic[] = [];
  if (!(o.spare >= 0)) out.push(optionProblem(`the spare margin must be 0% or more, not ${o.spare * 100}%.`));
  if (o.packGrams !== undefined && !(o.packGrams > 0))
    out.push(optionProblem(`a pack must hold more than 0 g, not ${o.packGrams} g.`));
  if (!(o.tailMm >= 0)) out.push(optionProblem(`the tail must be 0 mm or more, not ${o.tailMm} mm.`));
  if (!(o.workingLengthMm > 2 * o.tailMm))
    out.push(
      optionProblem(
        `a working length of ${o.workingLengthMm} mm leaves no thread to bead with after two tails of ${o.tailMm} mm; ` +
          'use a longer working length or shorter tails.',
      ),
    );
  if (!(o.beadsPerGram.low > 0 && o.beadsPerGram.low <= o.beadsPerGram.high))
    out.push(
      optionProblem(
        `beads per gram must be a range with 0 < low <= high, not ${o.beadsPerGram.low}-${o.beadsPerGram.high}.`,
      ),
    );
  return out;
}

/**
 * Whether the thread bends where it goes from bead `a` into bead `b`. Beads in
 * line (the tops of a row) need no allowance; a square corner does. The
 * 45 degree cut keeps the slight bends between neighbours on a round straight.
 */
function turns(a: Bead, b: Bead): boolean {
  const d = Math.abs(a.angle - b.angle) % 180;
  return Math.min(d, 180 - d) > 45;
}

/** Length of the simulated path itself in mm, without tails. */
export function pathLengthMm(model: Model, passes: readonly ThreadPass[] = model.thread): number {
  const beadLength = model.layout.beadMm.length;
  let turnsCount = 0;
  for (let i = 1; i < passes.length; i++) {
    const a = model.beads[passes[i - 1]!.bead];
    const b = model.beads[passes[i]!.bead];
    if (a && b && turns(a, b)) turnsCount++;
  }
  return passes.length * beadLength + turnsCount * TURN_ALLOWANCE_MM;
}

/** Grams to buy: the high estimate plus the spare, up to whole grams or whole packs. */
export function buyAmount(highGrams: number, spare: number, packGrams?: number): number {
  if (highGrams <= 0) return 0;
  const need = highGrams * (1 + spare);
  return packGrams === undefined ? ceilClean(need) : ceilClean(need / packGrams) * packGrams;
}

export function tally(model: Model, options: TallyOptions): Result<Tally> {
  const o = {
    beadsPerGram: options.beadsPerGram ?? beadSize(model.header.beads.size, model.header.beads.shape).perGram,
    spare: options.spare ?? DEFAULT_SPARE,
    packGrams: options.packGrams,
    workingLengthMm: options.workingLengthMm ?? DEFAULT_WORKING_LENGTH_MM,
    tailMm: options.tailMm ?? DEFAULT_TAIL_MM,
  };
  const diagnostics = checkOptions(o);

  const rowOfUnit = new Map(model.units.map((u) => [u.id, u.row]));
  const perRow = new Map<number, number>(model.rows.map((r) => [r.row, 0]));
  const perColor = new Map<string, number>(model.palette.map((p) => [p.key, 0]));
  for (const bead of model.beads) {
    // The unit that picked a bead up is its row's, whoever else shares it.
    const row = rowOfUnit.get(bead.units[0] ?? -1);
    if (row !== undefined) perRow.set(row, (perRow.get(row) ?? 0) + 1);
    perColor.set(bead.color, (perColor.get(bead.color) ?? 0) + 1);
  }

  const { low: bpgLow, high: bpgHigh } = o.beadsPerGram;
  const colors = model.palette.map((p) => {
    const count = perColor.get(p.key) ?? 0;
    // Fewer beads per gram means heavier beads, so the low bpg gives the high weight.
    const grams = { low: round2(count / bpgHigh), high: round2(count / bpgLow) };
    return {
      key: p.key,
      name: p.name,
      hex: p.hex,
      count,
      grams,
      buyGrams: buyAmount(grams.high, o.spare, o.packGrams),
    };
  });

  const path = pathLengthMm(model);
  const usable = o.workingLengthMm - 2 * o.tailMm;
  const threads = usable > 0 && path > 0 ? Math.ceil(path / usable) : 0;

  return {
    value: {
      schema: 'fourfold.tally/1',
      title: model.header.title,
      beads: model.beads.length,
      units: model.units.length,
      rows: model.rows.map((r) => ({ row: r.row, units: r.units.length, beads: perRow.get(r.row) ?? 0 })),
      colors,
      spare: o.spare,
      thread: { mm: Math.round(path + threads * 2 * o.tailMm), threads },
      size: { widthMm: round1(model.layout.widthMm), heightMm: round1(model.layout.heightMm) },
    },
    diagnostics,
  };
}
