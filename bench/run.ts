/**
 * `npm run bench`: runs every `*.bench.js` beside this file (compiled from
 * bench/*.bench.ts) and prints one line per figure. `npm run bench -- parse`
 * runs only the benches whose file name contains "parse".
 */
import { readdir } from 'node:fs/promises';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { dirname, join } from 'node:path';
import { formatFigure, meetsGoal, type Bench } from './harness.js';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv.slice(2);
const files = (await readdir(here))
  .filter((f) => f.endsWith('.bench.js'))
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();

let missed = 0;
for (const file of files) {
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { default: Bench };
  console.log(`# ${mod.default.name}`);
  for (const figure of await mod.default.run()) {
    console.log(formatFigure(figure));
    if (!meetsGoal(figure)) missed++;
  }
}
console.log(missed === 0 ? 'all goals met' : `${missed} goal(s) missed`);
