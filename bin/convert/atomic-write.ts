/**
 * Write a file so that no reader ever sees half of it: write beside it under
 * a temporary name, then rename (atomic on one file system). An interrupted
 * run leaves at most a stray `.tmp` file, never a truncated chart.
 *
 * Synchronous on purpose: a batch writes four small files per pattern, each
 * lane (a worker thread, or the main thread) has nothing else to do while
 * they are written, and every asynchronous call is a round trip through
 * libuv's thread pool that costs more than writing a small file does.
 */
import { mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { threadId } from 'node:worker_threads';

/** Temporary names differ by process, thread and write, so two lanes or two runs never share one. */
let writes = 0;

export function writeFileAtomic(path: string, data: string | Uint8Array): void {
  const temp = `${path}.${process.pid}-${threadId}-${writes++}.tmp`;
  try {
    try {
      writeFileSync(temp, data);
    } catch (error) {
      // The folder is made only when it is missing: in a batch, nearly every file goes to a folder that exists.
      if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(temp, data);
    }
    renameSync(temp, path);
  } catch (error) {
    rmSync(temp, { force: true });
    throw error;
  }
}
