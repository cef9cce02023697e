/**
 * Batch conversion of 1,000 small generated patterns to the default formats
 * (svg,md,json): `--jobs 2` against `--jobs 1` (goal: at least 1.7x faster
 * on 2 cores), and the default (all cores) against a baseline that only
 * reads each pattern and writes files of the sizes its outputs have (goal:
 * at most 5x). Worker threads start cold in every run, as they do for a
 * user. A last figure, without a goal, does the same with PNG added, to show
 * what rasterising costs.
 */
import { mkdir, mkdtemp, readFile, readdir, rm, stat, writeFile } from 'node:fs/promises';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { Worker } from 'node:worker_threads';
import { convertPaths, type OutputFormat } from '../bin/convert/index.js';
import { DEFAULT_OUTPUT_FORMATS, OUTPUT_FORMATS } from '../bin/convert/formats.js';
import type { Bench } from './harness.js';

const FILES = 1000;
const HEX = ['#2e6f8e', '#f4f1ea', '#c98b2b', '#6b2d5c', '#8fa683', '#1b1b1f'];

/** A flat panel of 3-6 units by 3-8 rows in two or three colours, different for each i. */
export function smallPattern(i: number): string {
  const units = 3 + (i % 4);
  const rows = 3 + (i % 6);
  const keys = i % 3 === 0 ? 'ABC' : 'AB';
  const colors = [...keys].map((k, j) => `  ${k} ${HEX[(i + j) % HEX.length]} shade ${j + 1}`);
  const pick = (n: number, r: number) => Array.from({ length: n }, (_, j) => keys[(i + r + j) % keys.length]).join('');
  const lines = [`title: Sample ${i}`, 'designer: Orla Fenwick', 'colors:', ...colors];
  lines.push(`row 1: ${pick(4, 0)} ${Array.from({ length: units - 1 }, (_, u) => pick(3, u)).join(' ')}`);
  for (let r = 2; r <= rows; r++)
    lines.push(`row ${r}: ${pick(3, r)} ${Array.from({ length: units - 1 }, (_, u) => pick(2, r + u)).join(' ')}`);
  return `${lines.join('\n')}\n`;
}

/** CPU time (ms, every thread of this process) of each timed run, in order. */
const cpuMs: number[] = [];

async function timed(fn: () => Promise<unknown>): Promise<number> {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  await fn();
  const wall = performance.now() - t0;
  const c = process.cpuUsage(c0);
  cpuMs.push((c.user + c.system) / 1000);
  return wall;
}

async function convertOnce(root: string, jobs: number, out: string, formats?: OutputFormat[]): Promise<void> {
  const summary = await convertPaths(['in'], { out, cwd: root, jobs, force: true, formats });
  if (summary.converted !== FILES)
    throw new Error(`converted ${summary.converted} of ${FILES}: ${summary.files.find((f) => f.message)?.message}`);
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
  return timed(async () => {
    await mkdir(plain, { recursive: true });
    for (let i = 0; i < inputs.length; i++) {
      await readFile(join(root, 'in', inputs[i]!));
      for (let k = 0; k < perInput; k++) {
        const size = sizes[i * perInput + k];
        if (size !== undefined) await writeFile(join(plain, `${i}-${k}`), Buffer.alloc(size, 32));
      }
    }
  });
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
      await mkdir(join(root, 'in'));
      for (let i = 0; i < FILES; i++)
        await writeFile(join(root, 'in', `p${String(i).padStart(4, '0')}.ffp`), smallPattern(i));
      // Warm this thread's modules, which --jobs 1 uses; workers start cold either way.
      await convertPaths(['in/p0000.ffp'], { out: 'warm', cwd: root, jobs: 1, force: true });

      // Each run writes a folder of its own, as a first conversion does: replacing another run's files would
      // add thousands of deletions to one run and not the other (ext4 then searches past recently freed inodes).
      const one = await timed(() => convertOnce(root, 1, 'out-1'));
      const two = await timed(() => convertOnce(root, 2, 'out-2'));
      const [oneCpu, twoCpu] = cpuMs.slice(-2) as [number, number];
      const all =
        availableParallelism() === 2 ? two : await timed(() => convertOnce(root, availableParallelism(), 'out-all'));
      const baseline = await readAndWrite(root, 'out-2');
      const withPng = await timed(() => convertOnce(root, availableParallelism(), 'out-png', [...OUTPUT_FORMATS]));
      const withPngBaseline = await readAndWrite(root, 'out-png');
      const createOne = await fileCreationMs(root, 1);
      const createTwo = await fileCreationMs(root, 2);
      const spinOne = await arithmeticMs(1);
      const spinTwo = await arithmeticMs(2);
      return [
        {
          name: `convert ${FILES} patterns (default formats ${DEFAULT_OUTPUT_FORMATS.join(',')}): --jobs 1 vs --jobs 2 (speed-up)`,
          value: one,
          baseline: two,
          unit: 'ms',
          goal: { atLeast: 1.7 },
        },
        {
          // On a machine busy with other work, two threads get less than two cores; this says how much of a miss above is the machine.
          name: `  the same two runs in CPU time of all threads: --jobs 2 vs --jobs 1 (the work running in parallel adds)`,
          value: twoCpu,
          baseline: oneCpu,
          unit: 'ms',
        },
        {
          // When both runs take the same CPU time, this ratio is the speed-up: V8's background compiler keeps part of
          // a second core busy in --jobs 1 already, and a second lane must compile the same code again.
          name: `  cores the two runs got on average: --jobs 2 vs --jobs 1 (with equal CPU time, the speed-up's ceiling)`,
          value: twoCpu / two,
          baseline: oneCpu / one,
          unit: 'cores',
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
          value: all,
          baseline,
          unit: 'ms',
          goal: { atMost: 5 },
        },
        {
          name: `convert ${FILES} patterns --formats ${OUTPUT_FORMATS.join(',')}, all ${availableParallelism()} cores, vs reading each and writing files of its outputs' sizes`,
          value: withPng,
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
