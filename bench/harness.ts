/**
 * The benchmark harness. Every figure is a ratio against a baseline measured
 * in the same run, on the same machine, so the numbers mean something on any
 * machine; no test ever times anything.
 */
import { performance } from 'node:perf_hooks';

export interface Figure {
  /** What is measured, e.g. "parse 1 MB pattern vs JSON.parse". */
  name: string;
  /** measured / baseline, or a plain figure when `baseline` is absent. */
  value: number;
  baseline?: number;
  unit: string;
  /** The goal for `ratio` (or `value` when there is no baseline). */
  goal?: { atMost?: number; atLeast?: number };
}

export interface Bench {
  name: string;
  run(): Promise<Figure[]>;
}

/** Median wall time in ms of `runs` calls after `warmup` calls. */
export async function medianMs(fn: () => unknown, runs = 7, warmup = 2): Promise<number> {
  for (let i = 0; i < warmup; i++) await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}

export function ratioOf(f: Figure): number {
  return f.baseline === undefined ? f.value : f.value / f.baseline;
}

export function meetsGoal(f: Figure): boolean {
  const r = ratioOf(f);
  return (f.goal?.atMost === undefined || r <= f.goal.atMost) && (f.goal?.atLeast === undefined || r >= f.goal.atLeast);
}

export function formatFigure(f: Figure): string {
  const r = ratioOf(f);
  const what =
    f.baseline === undefined
      ? `${r.toFixed(2)} ${f.unit}`
      : `${r.toFixed(2)}x (${f.value.toFixed(2)} vs ${f.baseline.toFixed(2)} ${f.unit})`;
  const goal = f.goal
    ? ` goal ${f.goal.atMost !== undefined ? `<= ${f.goal.atMost}` : `>= ${f.goal.atLeast}`} ${meetsGoal(f) ? 'met' : 'MISSED'}`
    : '';
  return `${f.name}: ${what}${goal}`;
}
