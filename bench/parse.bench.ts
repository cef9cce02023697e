/**
 * Parse throughput on a generated 1 MB pattern (10^6 bytes, under the 1 MiB
 * limit), against JSON.parse of a JSON file of the same size holding the same
 * rows, measured in the same run: lex + parse + CST-to-AST (goal: at most
 * 15x), and the whole `parse()` with the text checks and sorting, for
 * information.
 */
import { parseTokens } from '../parser/grammar.js';
import { parse } from '../parser/index.js';
import { lex } from '../parser/lexer.js';
import { LineIndex } from '../parser/positions.js';
import { toAst } from '../parser/to-ast.js';
import { performance } from 'node:perf_hooks';
import type { Bench } from './harness.js';

const KEYS = 'ABCDEFGH';
const TARGET = 1_000_000;

/** A deterministic flat panel of 40 units a row, with groups, notes and comments, about `TARGET` bytes. */
export function generatePattern(target = TARGET): {
  text: string;
  rows: { row: number; units: string[]; note: string }[];
} {
  let seed = 7;
  const next = (n: number): number => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed % n;
  };
  const key = (): string => KEYS[next(KEYS.length)]!;
  const head = [
    'title: Bench Panel',
    'designer: Oren Vale',
    'layout: flat',
    'colors:',
    ...[...KEYS].map((k, i) => `  ${k}  #${(0x102030 + i * 0x1f2b3c).toString(16).slice(-6)}  shade ${i + 1}`),
  ].join('\n');
  const parts = [head];
  const rows: { row: number; units: string[]; note: string }[] = [];
  let size = head.length;
  for (let r = 1; size < target; r++) {
    const units: string[] = [];
    for (let u = 0; u < 40; u++)
      units.push(Array.from({ length: r === 1 ? (u === 0 ? 4 : 3) : u === 0 ? 3 : 2 }, key).join(''));
    const note = `work row ${r} with an even tension, ${next(1000)} beads in`;
    const body = `${units.slice(0, 30).join(' ')} (${units.slice(30, 35).join(' ')})x1 ${units.slice(35).join(' ')}`;
    const line = `row ${r}: ${body}  # checkpoint ${r}\nnote: ${note}`;
    parts.push(line);
    rows.push({ row: r, units, note });
    size += line.length + 1;
  }
  return { text: parts.join('\n') + '\n', rows };
}

/** The same rows as JSON, as many as fit in the pattern's size, padded with spaces to exactly that size. */
function sameSizeJson(text: string, rows: unknown[]): string {
  let json = '[]';
  for (let n = rows.length; n > 0; n = Math.floor(n * 0.98)) {
    json = JSON.stringify({ title: 'Bench Panel', rows: rows.slice(0, n) });
    if (json.length <= text.length) break;
  }
  return json + ' '.repeat(Math.max(0, text.length - json.length));
}

function timed(f: () => unknown): number {
  const t0 = performance.now();
  f();
  return performance.now() - t0;
}

/** Median of each measurement over `runs` rounds, taking one sample of each in turn per round, after one warm-up round. */
function interleavedMedians(measures: (() => number)[], runs: number): number[] {
  const samples = measures.map((): number[] => []);
  for (let r = 0; r <= runs; r++) {
    measures.forEach((m, i) => {
      const ms = m();
      if (r > 0) samples[i]!.push(ms);
    });
  }
  return samples.map((xs) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)]!);
}

const bench: Bench = {
  name: 'parser',
  async run() {
    const { text, rows } = generatePattern();
    const json = sameSizeJson(text, rows);
    const check = parse(text);
    if (check.diagnostics.some((d) => d.severity === 'error'))
      throw new Error(`bench pattern has errors: ${check.diagnostics[0]!.message}`);
    const stagesOnly = (): unknown => {
      const ix = new LineIndex(text);
      const lexed = lex(text, ix);
      return toAst(parseTokens(lexed.tokens).cst, ix, lexed.comments);
    };
    // Interleaved, so a busy machine slows the baseline and the parser alike.
    const [baseline, stages, whole] = interleavedMedians(
      [() => timed(() => JSON.parse(json)), () => timed(stagesOnly), () => timed(() => parse(text))],
      15,
    ) as [number, number, number];
    const mb = (n: number): string => (n / 1e6).toFixed(2);
    return [
      {
        name: `lex+parse+to-AST of a ${mb(text.length)} MB pattern vs JSON.parse of ${mb(json.length)} MB`,
        value: stages,
        baseline,
        unit: 'ms',
        goal: { atMost: 15 },
      },
      { name: `parse() with checks of the same pattern vs JSON.parse`, value: whole, baseline, unit: 'ms' },
    ];
  },
};

export default bench;
