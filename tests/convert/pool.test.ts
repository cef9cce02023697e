/**
 * The worker pool needs compiled workers (Node 20 cannot start a thread on a
 * .ts file), so this test runs the build in dist/ (`npm run build:cli`,
 * which `npm test` runs first) and checks it against the in-thread path of
 * the sources: the same files, byte for byte.
 */
import { afterAll, beforeAll, expect, test } from 'vitest';
import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { convertPaths, PNG_FILES_PER_WORKER } from '../../bin/convert/index.js';
import { OUTPUT_FORMATS } from '../../bin/convert/formats.js';
import { BROKEN, FAN, TUBE } from './patterns.js';

const built = resolve('dist/bin/convert/index.js');
let root: string;

beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'fourfold-pool-'));
  await mkdir(join(root, 'in', 'deep'), { recursive: true });
  // Enough files that a worker thread starts beside this one: with PNG among the outputs, one for each PNG_FILES_PER_WORKER.
  for (let i = 0; i < PNG_FILES_PER_WORKER; i++)
    await writeFile(join(root, 'in', `fan-${i}.ffp`), FAN.replace('Linnet Fan', `Linnet Fan ${i}`));
  await writeFile(join(root, 'in', 'deep', 'tube.ffp'), TUBE);
  await writeFile(join(root, 'in', 'broken.ffp'), BROKEN);
});

afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

test(
  'two jobs (this thread and a worker thread) give the same outputs as one thread, each file once',
  { timeout: 60_000 },
  async () => {
    expect(existsSync(built), 'dist/ is missing: run npm run build:cli first').toBe(true);
    const { convertPaths: pooled } = (await import(pathToFileURL(built).href)) as { convertPaths: typeof convertPaths };
    const told: string[] = [];
    const a = await pooled(['in'], {
      out: 'pool',
      cwd: root,
      jobs: 2,
      formats: OUTPUT_FORMATS,
      onResult: (r) => told.push(r.rel),
    });
    const b = await convertPaths(['in'], { out: 'single', cwd: root, jobs: 1, formats: OUTPUT_FORMATS });
    expect([a.converted, a.failed, a.exitCode]).toEqual([PNG_FILES_PER_WORKER + 1, 1, 1]);
    expect(a.files.map((f) => f.status)).toEqual(b.files.map((f) => f.status));
    // Both lanes take from one shared queue: each file is converted, and reported, exactly once.
    expect(told.sort()).toEqual(a.files.map((f) => f.rel));
    const files = (await readdir(join(root, 'pool'), { recursive: true }))
      .filter((f) => /\.(svg|png|md|json)$/.test(f))
      .sort();
    expect(files).toHaveLength((PNG_FILES_PER_WORKER + 2) * 4);
    for (const f of files)
      expect((await readFile(join(root, 'pool', f))).equals(await readFile(join(root, 'single', f))), f).toBe(true);
  },
);
