/**
 * Batch conversion of 1,000 small generated patterns to the default formats
 * (svg,md,json): `--jobs 2` against `--jobs 1` (goal: at least 1.7x faster
 * on 2 cores), and the default (all cores) against a baseline that only
 * reads each pattern and writes files of the sizes its outputs have (goal:
 * at most 5x). Each run is a fresh `fourfold convert` process, as a user
 * starts it, so no run inherits code that another run made V8 compile.
 * Further figures, without goals: a batch with more work per worker, what
 * the file system and the processor allow, and what PNG costs.
 */
import { spawnSync } from 'node:child_process';
import { mkdir, mkdtemp, readFile, readdir, rm, stat, writeFile } from 'node:fs/promises';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { DEFAULT_OUTPUT_FORMATS, OUTPUT_FORMATS, type OutputFormat } from '../bin/convert/formats.js';
import { plannedWorkers } from '../bin/convert/index.js';
import type { Bench } from './harness.js';

const FILES = 1000;
const HEX = ['#2e6f8e', '#f4f1ea', '#c98b2b', '#6b2d5c', '#8fa683', '#1b1b1f'];

/**
 * A flat panel of 3-6 units by 3-8 rows in two or three colours, different
 * for each i; `scale` multiplies both, so scale 3 has about nine times the beads.
 */
export function samplePattern(i: number, scale = 1): string {
  const units = (3 + (i % 4)) * scale;
  const rows = (3 + (i % 6)) * scale;
  const keys = i % 3 === 0 ? 'ABC' : 'AB';
  const colors = [...keys].map((k, j) => `  ${k} ${HEX[(i + j) % HEX.length]} shade ${j + 1}`);
  const pick = (n: number, r: number) => Array.from({ length: n }, (_, j) => keys[(i + r + j) % keys.length]).join('');
  const lines = [`title: Sample ${i}`, 'designer: Orla Fenwick', 'colors:', ...colors];
  lines.push(`row 1: ${pick(4, 0)} ${Array.from({ length: units - 1 }, (_, u) => pick(3, u)).join(' ')}`);
  for (let r = 2; r <= rows; r++)
    lines.push(`row ${r}: ${pick(3, r)} ${Array.from({ length: units - 1 }, (_, u) => pick(2, r + u)).join(' ')}`);
  return `${lines.join('\n')}\n`;
}

/** Writes `count` sample patterns into `dir`; resolves to their size in bytes and the worker threads `--jobs 2` starts for them. */
async function writeSamples(dir: string, count: number, scale = 1): Promise<{ bytes: number; workers: number }> {
  await mkdir(dir, { recursive: true });
  const sizes = new Map<string, number>();
  for (let i = 0; i < count; i++) {
    const text = samplePattern(i, scale);
    const file = join(dir, `p${String(i).padStart(4, '0')}.ffp`);
    sizes.set(file, Buffer.byteLength(text));
    await writeFile(file, text);
  }
  const tasks = [...sizes.keys()].map((file) => ({ file, formats: [...DEFAULT_OUTPUT_FORMATS] }));
  return {
    bytes: [...sizes.values()].reduce((a, b) => a + b, 0),
    workers: plannedWorkers(tasks, 2, (file) => sizes.get(file)!),
  };
}

// Compiled to dist/bench/, so the launcher is two folders up.
const launcher = fileURLToPath(new URL('../../bin/fourfold.js', import.meta.url));

interface Run {
  wall: number;
  /** CPU time of the process, all its threads, user and system. */
  cpu: number;
}

/**
 * One fresh `fourfold convert` of `from` into a folder of its own. Each run
 * writes a new folder, as a first conversion does: replacing another run's
 * files would add thousands of deletions to one run and not the other (ext4
 * then searches past recently freed inodes). bash's `times` tells the CPU
 * time of the finished child, which Node cannot read for a child of its own.
 */
function convertRun(root: string, from: string, out: string, jobs: number, formats?: readonly OutputFormat[]): Run {
  const args = ['convert', from, '--out', out, '--jobs', String(jobs), '--force'];
  if (formats) args.push('--formats', formats.join(','));
  const script = '"$@" >/dev/null; status=$?; times; exit $status';
  const t0 = performance.now();
  const r = spawnSync('bash', ['-c', script, 'bash', process.execPath, launcher, ...args], { cwd: root });
  const wall = performance.now() - t0;
  if (r.status !== 0) throw new Error(`fourfold ${args.join(' ')} failed (${r.status}): ${r.stderr.toString()}`);
  // times prints the shell's own user and system time, then its children's: "0m2.140s 0m0.310s".
  const children = r.stdout.toString().trim().split('\n').at(-1)!;
  const [user, system] = [...children.matchAll(/(\d+)m([\d.]+)s/g)].map(
    (m) => (Number(m[1]) * 60 + Number(m[2])) * 1000,
  );
  return { wall, cpu: user! + system! };
}

/** `--jobs 1` and `--jobs 2`, taking turns so that the machine's drifts touch both alike; the median run of each. */
function oneAndTwo(root: string, from: string, rounds: number): { one: Run; two: Run } {
  const runs: Record<1 | 2, Run[]> = { 1: [], 2: [] };
  for (let k = 0; k < rounds; k++)
    for (const jobs of [1, 2] as const) runs[jobs].push(convertRun(root, from, `${from}-jobs${jobs}-${k}`, jobs));
  const median = (xs: Run[]) => [...xs].sort((a, b) => a.wall - b.wall)[Math.floor(xs.length / 2)]!;
  return { one: median(runs[1]), two: median(runs[2]) };
}

/**
 * The baseline: read each pattern and write, for each output that `out`
 * holds for it, a file of that output's size (the stamps left out).
 */
async function readAndWrite(root: string, out: string): Promise<number> {
  const outputs = (await readdir(join(root, out))).filter((f) => !f.endsWith('.hash')).sort();
  const sizes = await Promise.all(outputs.map(async (f) => (await stat(join(root, out, f))).size));
  const inputs = (await readdir(join(root, 'in'))).sort();
  const perInput = Math.ceil(outputs.length / inputs.length);
  const plain = join(root, `plain-${out}`);
  const t0 = performance.now();
  await mkdir(plain, { recursive: true });
  for (let i = 0; i < inputs.length; i++) {
    await readFile(join(root, 'in', inputs[i]!));
    for (let k = 0; k < perInput; k++) {
      const size = sizes[i * perInput + k];
      if (size !== undefined) await writeFile(join(plain, `${i}-${k}`), Buffer.alloc(size, 32));
    }
  }
  return performance.now() - t0;
}

/** Wall time of `threads` worker threads running `code`, each told its share [from, to) of `total` steps. */
async function threadsMs(code: string, threads: number, total: number, data: object = {}): Promise<number> {
  const t0 = performance.now();
  await Promise.all(
    Array.from({ length: threads }, (_, k) => {
      const workerData = { ...data, from: (k * total) / threads, to: ((k + 1) * total) / threads };
      const worker = new Worker(code, { eval: true, workerData });
      return new Promise((done, fail) => worker.on('exit', done).on('error', fail));
    }),
  );
  return performance.now() - t0;
}

/**
 * What the file system allows: 4,000 small files written and renamed into
 * one folder (as 1,000 patterns' outputs are) by one thread, then by two
 * threads sharing the work. A file system that creates files one at a time
 * caps every batch writer's speed-up, whatever it does between the files.
 */
async function fileCreationMs(root: string, threads: number): Promise<number> {
  const dir = join(root, `create-${threads}`);
  await mkdir(dir);
  const code = `
    const { writeFileSync, renameSync } = require('node:fs');
    const { dir, from, to } = require('node:worker_threads').workerData;
    const data = Buffer.alloc(8000, 32);
    for (let i = from; i < to; i++) { writeFileSync(dir + '/' + i + '.tmp', data); renameSync(dir + '/' + i + '.tmp', dir + '/' + i); }`;
  return threadsMs(code, threads, 4 * FILES, { dir });
}

/**
 * What the processor allows: the same arithmetic on one thread, then split
 * over two. The loop runs in calls of a million steps, so V8 optimises it
 * as it does any hot function (one loop of top-level code ran at speeds
 * three times apart from run to run, waiting for on-stack replacement). On
 * a virtual machine whose host is busy, two threads may get much less than
 * two cores' worth, which no program can make up for.
 */
function arithmeticMs(threads: number): Promise<number> {
  const code = `
    const { from, to } = require('node:worker_threads').workerData;
    function spin(a, b) { let x = 0; for (let i = a; i < b; i++) x = (x + i * 7) | 0; return x; }
    let x = 0;
    for (let s = from; s < to; s += 1e6) x ^= spin(s, Math.min(s + 1e6, to));
    if (x === 0.5) console.log(x);`;
  return threadsMs(code, threads, 2e9);
}

const bench: Bench = {
  name: 'convert',
  async run() {
    const root = await mkdtemp(join(tmpdir(), 'fourfold-bench-'));
    try {
      const small = await writeSamples(join(root, 'in'), FILES);
      const big = 400;
      const large = await writeSamples(join(root, 'big'), big, 3);
      const { one, two } = oneAndTwo(root, 'in', 3);
      const all = availableParallelism() === 2 ? two : convertRun(root, 'in', 'in-all', availableParallelism());
      const baseline = await readAndWrite(root, 'in-jobs2-0');
      const bigRuns = oneAndTwo(root, 'big', 1);
      const withPng = convertRun(root, 'in', 'in-png', availableParallelism(), OUTPUT_FORMATS);
      const withPngBaseline = await readAndWrite(root, 'in-png');
      const createOne = await fileCreationMs(root, 1);
      const createTwo = await fileCreationMs(root, 2);
      const spinOne = await arithmeticMs(1);
      const spinTwo = await arithmeticMs(2);
      const about = ({ bytes, workers }: { bytes: number; workers: number }) =>
        `${Math.round(bytes / 1000)} KB; --jobs 2 starts ${workers} worker thread${workers === 1 ? '' : 's'} beside the calling one`;
      return [
        {
          name: `convert ${FILES} small patterns (${about(small)}; default formats ${DEFAULT_OUTPUT_FORMATS.join(',')}): --jobs 1 vs --jobs 2 (speed-up, median of 3 fresh runs each)`,
          value: one.wall,
          baseline: two.wall,
          unit: 'ms',
          goal: { atLeast: 1.7 },
        },
        {
          // On a machine busy with other work, two threads get less than two cores; this says how much of a miss above is the machine.
          name: `  the same two runs in CPU time of all threads: --jobs 2 vs --jobs 1 (the work running in parallel adds)`,
          value: two.cpu,
          baseline: one.cpu,
          unit: 'ms',
        },
        {
          // When both runs take the same CPU time, this ratio is the speed-up: V8's background compiler keeps part of
          // a second core busy in --jobs 1 already, and a second lane must compile the same code again.
          name: `  cores the two runs got on average: --jobs 2 vs --jobs 1 (with equal CPU time, the speed-up's ceiling)`,
          value: two.cpu / two.wall,
          baseline: one.cpu / one.wall,
          unit: 'cores',
        },
        {
          name: `  ${big} patterns nine times the size (${about(large)}): --jobs 1 vs --jobs 2 (speed-up)`,
          value: bigRuns.one.wall,
          baseline: bigRuns.two.wall,
          unit: 'ms',
        },
        {
          name: `  the file system's own ceiling: ${4 * FILES} files written and renamed into one folder, 1 thread vs 2 (speed-up)`,
          value: createOne,
          baseline: createTwo,
          unit: 'ms',
        },
        {
          name: `  the processor's own ceiling: an arithmetic loop, 1 thread vs the same work on 2 (speed-up)`,
          value: spinOne,
          baseline: spinTwo,
          unit: 'ms',
        },
        {
          name: `convert ${FILES} patterns (default formats), all ${availableParallelism()} cores, vs reading each and writing files of its outputs' sizes`,
          value: all.wall,
          baseline,
          unit: 'ms',
          goal: { atMost: 5 },
        },
        {
          name: `convert ${FILES} patterns --formats ${OUTPUT_FORMATS.join(',')}, all ${availableParallelism()} cores, vs reading each and writing files of its outputs' sizes`,
          value: withPng.wall,
          baseline: withPngBaseline,
          unit: 'ms',
        },
      ];
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  },
};

export default bench;
