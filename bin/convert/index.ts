/**
 * Batch conversion: PATHS... to outputs under one folder, on every core
 * through a piscina worker pool. The CLI's `convert` and the server's start
 * script both call `convertPaths`.
 */
import { once } from 'node:events';
import { existsSync, statSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { resolve } from 'node:path';
import { setFlagsFromString } from 'node:v8';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { EXIT_FAILURE, EXIT_OK, EXIT_PATTERN_ERRORS } from '../command.js';
import { claimQueue, drainQueue } from './claim-queue.js';
import type { ConvertTask, FileResult } from './convert-one.js';
import { DEFAULT_OUTPUT_FORMATS, OUTPUT_FORMATS, type OutputFormat } from './formats.js';
import { findInputs } from './find-inputs.js';
import type { WorkerJob } from './worker.js';

export type { FileResult } from './convert-one.js';
export type { OutputFormat } from './formats.js';

export interface ConvertOptions {
  out: string;
  formats?: readonly OutputFormat[];
  /** Files converted at once; default: all cores. */
  jobs?: number;
  force?: boolean;
  /** Where relative PATHS and --out are resolved; default: the process's. */
  cwd?: string;
  /** Told the number of files before the first starts. */
  onStart?: (total: number) => void;
  /** Told each file's result as it finishes. */
  onResult?: (result: FileResult) => void;
}

export interface ConvertSummary {
  schema: 'fourfold.convert/1';
  out: string;
  converted: number;
  skipped: number;
  failed: number;
  ioErrors: number;
  /** Every input by its path under --out, sorted; problems with the PATHS themselves come as io-error. */
  files: FileResult[];
  /** 0, 1 when a pattern had errors, 2 when a file could not be read or written (2 wins). */
  exitCode: number;
}

/**
 * A worker thread pays for itself only with enough work to take: it loads its
 * modules in about 0.15 s, and V8 then compiles the same hot code again for
 * it, which for small patterns costs more CPU than converting a few hundred
 * of them. So a batch starts one worker for each this many bytes of pattern
 * text. Measured on two cores from a fresh `fourfold convert`: the second
 * lane broke even at about 200 to 250 KB of pattern text, both for small
 * patterns (1,000 of about 220 bytes) and for ones nine times their size
 * (200 of about 920 bytes); below that it was slower (100 small patterns:
 * 0.48 to 0.53 s with one lane, 0.58 to 0.63 s with two), above it faster
 * (5,000 small patterns: 5.6 to 5.8 s against 4.1 to 4.3 s).
 */
export const PATTERN_BYTES_PER_WORKER = 256 * 1024;

/**
 * Rasterising is native code that needs no compiling and costs far more per
 * file, so with PNG among the outputs a worker pays from a dozen files or
 * so: one starts for each this many (small patterns to all four formats, on
 * two cores: 16 took 0.70 to 0.81 s with one lane and 0.60 to 0.65 s with
 * two, 32 took 0.93 to 1.12 s against 0.72 to 0.81 s, 64 took 2.2 to 2.4 s
 * against 1.4 to 1.5 s).
 */
export const PNG_FILES_PER_WORKER = 16;

/**
 * How many worker threads a batch starts beside the calling thread: at most
 * one for each lane but the first, each with its share of work (above), and
 * never one more than there are files left for it.
 */
export function plannedWorkers(
  tasks: readonly Pick<ConvertTask, 'file' | 'formats'>[],
  lanes: number,
  sizeOf: (file: string) => number,
): number {
  const most = Math.min(lanes, tasks.length) - 1;
  if (most <= 0) return 0;
  if (tasks.some((t) => t.formats.includes('png')))
    return Math.min(most, Math.floor(tasks.length / PNG_FILES_PER_WORKER));
  // Sizes are read only until every possible worker has its share, so a huge archive is not looked at twice.
  let bytes = 0;
  for (const task of tasks) {
    bytes += sizeOf(task.file);
    if (bytes >= most * PATTERN_BYTES_PER_WORKER) break;
  }
  return Math.min(most, Math.floor(bytes / PATTERN_BYTES_PER_WORKER));
}

/** A file's size, or 0 when it cannot be read: its lane reports that when it gets there. */
function sizeOf(file: string): number {
  try {
    return statSync(file).size;
  } catch {
    return 0;
  }
}

// Compiled, the worker sits beside this file; from the TypeScript sources there is none to start.
const workerFile = fileURLToPath(new URL('./worker.js', import.meta.url));

/**
 * A pool of `threads` workers. When the lanes take every core, the workers
 * compile their hot functions on their own thread instead of handing them to
 * V8's background compiler: no core is idle to run it, so a lane went on
 * running its code unoptimised while the compile waited for a core (1,000
 * small patterns on two cores, the calling thread warm: 1.3 to 1.55 s before,
 * 1.0 to 1.1 s after). V8 reads the flag when a thread's engine starts, and
 * the flag holds for the whole process, so it is set back as soon as the
 * workers are running; a thread started meanwhile elsewhere in the process
 * would compile on its own thread too, which is only slower for it.
 */
function startPool(threads: number): Piscina<WorkerJob, number> {
  const ownFlag = process.execArgv.some((a) => a.includes('concurrent-recompilation'));
  // The lanes are the workers and this thread.
  const compileOnLanes = threads + 1 >= availableParallelism() && !ownFlag;
  if (compileOnLanes) setFlagsFromString('--no-concurrent-recompilation');
  const pool = new Piscina<WorkerJob, number>({ filename: workerFile, minThreads: threads, maxThreads: threads });
  if (compileOnLanes)
    // A worker that fails or exits before it runs (at the latest when the pool is destroyed) settles too.
    void Promise.allSettled(
      pool.threads.map((worker) => Promise.race([once(worker, 'online'), once(worker, 'exit')])),
    ).then(() => setFlagsFromString('--concurrent-recompilation'));
  return pool;
}

/**
 * Up to `jobs` lanes take files from one shared queue: this thread, whose
 * modules are loaded already, so it converts from the first moment while
 * the worker threads (`plannedWorkers`) are still loading theirs, and one
 * piscina task per worker thread that drains the queue on its own.
 */
async function runAll(tasks: ConvertTask[], jobs: number, onResult: (r: FileResult) => void): Promise<FileResult[]> {
  const results: FileResult[] = new Array<FileResult>(tasks.length);
  const take = (index: number, result: FileResult): void => {
    results[index] = result;
    onResult(result);
  };
  const queue = claimQueue(tasks);
  const lanes = Math.max(1, Math.min(jobs, tasks.length));
  const threads = existsSync(workerFile) ? plannedWorkers(tasks, lanes, sizeOf) : 0;
  // Lanes in one thread would only take turns, so without workers this thread is the one lane.
  if (threads === 0) {
    await drainQueue(queue, take);
    return results;
  }
  const pool = startPool(threads);
  const inWorker = async (): Promise<void> => {
    const { port1, port2 } = new MessageChannel();
    let received = 0;
    let sent = Infinity;
    const allIn = new Promise<void>((resolveAll, fail) => {
      port1.on('message', ([index, result]: [number, FileResult]) => {
        take(index, result);
        if (++received === sent) resolveAll();
      });
      // The answer and the results come on different channels, so the answer may come first.
      pool.run({ ...queue, port: port2 }, { transferList: [port2] }).then((count) => {
        sent = count;
        if (received === sent) resolveAll();
      }, fail);
    });
    try {
      await allIn;
    } finally {
      port1.close();
    }
  };
  try {
    await Promise.all([drainQueue(queue, take), ...Array.from({ length: threads }, inWorker)]);
  } finally {
    await pool.destroy();
  }
  return results;
}

export async function convertPaths(paths: readonly string[], options: ConvertOptions): Promise<ConvertSummary> {
  const cwd = options.cwd ?? process.cwd();
  const outDir = resolve(cwd, options.out);
  const formats = OUTPUT_FORMATS.filter((f) => (options.formats ?? DEFAULT_OUTPUT_FORMATS).includes(f));
  const { inputs, problems } = await findInputs(paths, cwd);
  const tasks = inputs.map((input) => ({ ...input, outDir, formats, force: options.force === true }));
  options.onStart?.(tasks.length);
  const results = await runAll(tasks, options.jobs ?? availableParallelism(), options.onResult ?? (() => {}));
  const files = [
    ...results,
    ...problems.map((p): FileResult => ({ rel: p.path, status: 'io-error', message: `'${p.path}': ${p.message}` })),
  ].sort((a, b) => (a.rel < b.rel ? -1 : a.rel > b.rel ? 1 : 0));
  const count = (status: FileResult['status']) => files.filter((f) => f.status === status).length;
  const ioErrors = count('io-error');
  const failed = count('failed');
  return {
    schema: 'fourfold.convert/1',
    out: outDir,
    converted: count('converted'),
    skipped: count('skipped'),
    failed,
    ioErrors,
    files,
    exitCode: ioErrors > 0 ? EXIT_FAILURE : failed > 0 ? EXIT_PATTERN_ERRORS : EXIT_OK,
  };
}
