/**
 * `npm run bench`: runs every `*.bench.js` beside this file (compiled from
 * bench/*.bench.ts) and prints one line per figure. `npm run bench -- parse`
 * runs only the benches whose file name contains "parse".
 *
 * Each bench runs in a process of its own, so no figure depends on what an
 * earlier bench left in the heap or made V8 compile, and a bench that throws
 * is reported without stopping the rest.
 */
import { spawnSync } from 'node:child_process';
import { readdir } from 'node:fs/promises';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { dirname, join } from 'node:path';
import { formatFigure, meetsGoal, type Bench } from './harness.js';

const here = dirname(fileURLToPath(import.meta.url));
const self = fileURLToPath(import.meta.url);
const CHILD = '--one-bench';
/** A child's exit status when its bench threw; below it, the number of goals it missed. */
const CRASHED = 101;

/** Runs one bench file, printing its figures; resolves to how many goals it missed. */
async function runOne(file: string): Promise<number> {
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { default: Bench };
  console.log(`# ${mod.default.name}`);
  let missed = 0;
  for (const figure of await mod.default.run()) {
    console.log(formatFigure(figure));
    if (!meetsGoal(figure)) missed++;
  }
  return missed;
}

if (process.argv[2] === CHILD) {
  try {
    process.exitCode = Math.min(await runOne(process.argv[3]!), CRASHED - 1);
  } catch (error) {
    console.error(error);
    process.exitCode = CRASHED;
  }
} else {
  const only = process.argv.slice(2);
  const files = (await readdir(here))
    .filter((f) => f.endsWith('.bench.js'))
    .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
    .sort();
  let missed = 0;
  let failed = 0;
  for (const file of files) {
    const child = spawnSync(process.execPath, [self, CHILD, file], { stdio: 'inherit' });
    // Killed by a signal, a child has no status.
    if (child.status === null || child.status >= CRASHED) failed++;
    else missed += child.status;
  }
  console.log(
    failed > 0 ? `${failed} bench(es) failed to run` : missed === 0 ? 'all goals met' : `${missed} goal(s) missed`,
  );
  if (failed > 0) process.exitCode = 1;
}
