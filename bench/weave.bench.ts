/**
 * The engine on large flat panels: compiling 200,000 units against 100,000
 * (linear work gives 2; the goal allows 2.2), and the heap the model and
 * thread path hold per unit, measured in a child process that may force
 * garbage collection so the figure is what stays, not what is in flight.
 * The two sizes are timed in turns, five times each, and the medians compared.
 */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { medianMs, type Bench } from './harness.js';
import { compile } from '../shared/compile.js';

/** A flat panel `width` units wide: groups keep the text small, the model is full size. */
export function panelText(width: number, rows: number): string {
  return [
    'title: Bench panel',
    'colors:',
    '  A #f4f1ea',
    '  B #2e6f8e',
    `row 1: AAAA (ABA)x${width - 1}`,
    `rows 2-${rows}: BAB (AB)x${width - 1}`,
    '',
  ].join('\n');
}

const SMALL = panelText(500, 200);
const LARGE = panelText(500, 400);
const CHILD = 'FOURFOLD_WEAVE_BENCH_CHILD';

/**
 * Heap held by one compiled 200,000-unit model, in bytes per unit (run with
 * --expose-gc), and the peak resident size the compile added, per unit (what
 * the process needed at its height, garbage and all).
 */
function perUnit(): { held: number; peak: number } {
  const collect = (globalThis as { gc?: () => void }).gc!;
  // Twice: one full collection can leave objects a finaliser or a weak reference still held.
  const gc = () => {
    collect();
    collect();
  };
  gc();
  const before = process.memoryUsage().heapUsed;
  const rssBefore = process.memoryUsage().rss;
  const held = compile(LARGE);
  const peakRss = process.resourceUsage().maxRSS * 1024;
  gc();
  const after = process.memoryUsage().heapUsed;
  const units = held.value.model.units.length;
  return { held: (after - before) / units, peak: (peakRss - rssBefore) / units };
}

if (process.env[CHILD] === '1') process.stdout.write(`${JSON.stringify(perUnit())}\n`);

const bench: Bench = {
  name: 'weave engine',
  async run() {
    const units = (text: string) => compile(text).value.model.units.length;
    if (units(SMALL) !== 100_000 || units(LARGE) !== 200_000)
      throw new Error('bench panels are not the sizes they claim');
    // Interleaved, so a change in the machine's load during the run falls on both sizes alike.
    const smallRuns: number[] = [];
    const largeRuns: number[] = [];
    for (let i = 0; i < 5; i++) {
      smallRuns.push(await medianMs(() => compile(SMALL), 1, 0));
      largeRuns.push(await medianMs(() => compile(LARGE), 1, 0));
    }
    const median = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
    const small = median(smallRuns);
    const large = median(largeRuns);
    const child = execFileSync(process.execPath, ['--expose-gc', fileURLToPath(import.meta.url)], {
      env: { ...process.env, [CHILD]: '1' },
      encoding: 'utf8',
    });
    const memory = JSON.parse(child) as { held: number; peak: number };
    return [
      {
        name: 'compile 200,000-unit panel vs 100,000-unit panel',
        value: large,
        baseline: small,
        unit: 'ms',
        goal: { atMost: 2.2 },
      },
      {
        name: 'heap held by model and thread path per unit (200,000 units)',
        value: memory.held,
        unit: 'bytes',
        goal: { atMost: 2048 },
      },
      { name: 'peak resident size added while compiling, per unit (200,000 units)', value: memory.peak, unit: 'bytes' },
    ];
  },
};

export default bench;
