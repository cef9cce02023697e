import { afterEach, beforeEach, describe, expect, test, vi } from 'vitest';
import { mkdir, mkdtemp, readdir, readFile, rm, stat, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { convertPaths, type ConvertSummary } from '../../bin/convert/index.js';
import { writeFileAtomic } from '../../bin/convert/atomic-write.js';
import { DEFAULT_OUTPUT_FORMATS, OUTPUT_FORMATS } from '../../bin/convert/formats.js';
import { isWellFormed } from '../chart/svg-tree.js';
import { run as check } from '../../bin/commands/check.js';
import { fakeIO } from '../cli/fake-io.js';
import { BROKEN, FAN, TUBE } from './patterns.js';

let root: string;
const inDir = () => join(root, 'patterns');
const outDir = () => join(root, 'out');

async function listFiles(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true });
  return entries
    .filter((e) => e.isFile())
    .map((e) => join(e.parentPath, e.name).slice(dir.length + 1))
    .sort();
}

const mtimes = async (files: string[]) => Promise.all(files.map(async (f) => (await stat(join(outDir(), f))).mtimeMs));

// Every format, PNG included, so each test covers every writer.
const convert = (paths: string[], extra: Partial<Parameters<typeof convertPaths>[1]> = {}): Promise<ConvertSummary> =>
  convertPaths(paths, { out: 'out', cwd: root, jobs: 2, formats: OUTPUT_FORMATS, ...extra });

beforeEach(async () => {
  root = await mkdtemp(join(tmpdir(), 'fourfold-convert-'));
  await mkdir(join(inDir(), 'tubes'), { recursive: true });
  await writeFile(join(inDir(), 'fan.ffp'), FAN);
  await writeFile(join(inDir(), 'tubes', 'heron.ffp'), TUBE);
  await writeFile(join(inDir(), 'wren.ffp'), BROKEN);
  await writeFile(join(inDir(), 'notes.txt'), 'not a pattern');
});

afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

describe('convert a folder', () => {
  test('good files converted in a mirrored tree, the broken one reported, exit 1', async () => {
    const summary = await convert(['patterns']);
    expect(summary.exitCode).toBe(1);
    expect([summary.converted, summary.skipped, summary.failed, summary.ioErrors]).toEqual([2, 0, 1, 0]);
    const wren = summary.files.find((f) => f.rel === 'wren.ffp');
    expect(wren?.status).toBe('failed');
    expect(wren?.message).toMatch(/^wren\.ffp:6:\d+: error\[bead-count\]: /);

    const files = await listFiles(outDir());
    for (const base of ['fan', 'tubes/heron']) {
      for (const ext of ['svg', 'png', 'md', 'json', 'hash']) expect(files).toContain(`${base}.${ext}`);
    }
    // Nothing half-written: no temporary files left, and every output reads whole.
    expect(files.filter((f) => f.endsWith('.tmp'))).toEqual([]);
    for (const f of files.filter((f) => f.endsWith('.svg')))
      expect(isWellFormed(await readFile(join(outDir(), f), 'utf8'))).toBe(true);
    for (const f of files.filter((f) => f.endsWith('.json')))
      expect(JSON.parse(await readFile(join(outDir(), f), 'utf8')).schema).toBe('fourfold.model/1');
    // Source: PNG specification (W3C, 2003), section 5.2: the eight-byte signature.
    for (const f of files.filter((f) => f.endsWith('.png')))
      expect([...(await readFile(join(outDir(), f))).subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    expect(await readFile(join(outDir(), 'fan.md'), 'utf8')).toContain('Linnet Fan');
  });

  test('a second run skips everything, and touches no output', async () => {
    await convert(['patterns']);
    const files = await listFiles(outDir());
    const before = await mtimes(files);
    const again = await convert(['patterns']);
    expect([again.converted, again.skipped, again.failed]).toEqual([0, 2, 1]);
    expect(again.files.find((f) => f.rel === 'wren.ffp')?.unchanged).toBe(true);
    expect(again.exitCode).toBe(1);
    expect(await mtimes(files)).toEqual(before);
  });

  test('--force redoes all; a changed file or other formats redo only what changed', async () => {
    await convert(['patterns'], { formats: ['svg'] });
    expect((await convert(['patterns'], { formats: ['svg'], force: true })).converted).toBe(2);
    await writeFile(join(inDir(), 'fan.ffp'), FAN.replace('Linnet Fan', 'Linnet Fan II'));
    const changed = await convert(['patterns'], { formats: ['svg'] });
    expect(changed.files.filter((f) => f.status === 'converted').map((f) => f.rel)).toEqual(['fan.ffp']);
    expect((await convert(['patterns'], { formats: ['svg', 'json'] })).converted).toBe(2);
  });

  test('a dangling symbolic link is a file that cannot be read: exit 2, the rest still converted', async () => {
    await symlink(join(root, 'nowhere.ffp'), join(inDir(), 'lost.ffp'));
    const summary = await convert(['patterns'], { formats: ['svg'] });
    expect(summary.exitCode).toBe(2);
    expect(summary.converted).toBe(2);
    const lost = summary.files.find((f) => f.rel === 'lost.ffp');
    expect(lost?.status).toBe('io-error');
    expect(lost?.message).toContain('no such file');
  });

  test('a folder named like a pattern file, given by name, cannot be read: exit 2', async () => {
    await mkdir(join(root, 'odd.ffp'));
    const summary = await convert(['odd.ffp', 'patterns/fan.ffp'], { formats: ['svg'] });
    expect(summary.exitCode).toBe(2);
    expect(summary.files.find((f) => f.rel === 'odd.ffp')?.message).toContain('folder');
    expect(summary.converted).toBe(1);
  });

  test('outputs that cannot be written give exit 2 and say which file', async () => {
    await writeFile(join(root, 'out'), 'a file where the output folder should be');
    const summary = await convert(['patterns/fan.ffp'], { formats: ['svg'] });
    expect(summary.exitCode).toBe(2);
    expect(summary.files).toEqual([
      expect.objectContaining({
        rel: 'fan.ffp',
        status: 'io-error',
        message: expect.stringContaining("cannot write outputs of 'fan.ffp'"),
      }),
    ]);
  });

  test('a font cache that cannot be written makes PNG files unwritable: exit 2, and nothing of theirs written', async () => {
    const saved = process.env.FOURFOLD_CACHE_DIR;
    // The cache folder is fixed when the font module loads, so load a fresh copy with one that cannot be made.
    process.env.FOURFOLD_CACHE_DIR = join(inDir(), 'fan.ffp', 'cache');
    try {
      vi.resetModules();
      const fresh = (await import('../../bin/convert/index.js')).convertPaths;
      const summary = await fresh(['patterns/fan.ffp'], { out: 'out', cwd: root, jobs: 1, formats: ['svg', 'png'] });
      expect(summary.exitCode).toBe(2);
      expect(summary.files).toEqual([
        {
          rel: 'fan.ffp',
          status: 'io-error',
          message: `fan.ffp: cannot write the bundled font for PNG output into '${join(process.env.FOURFOLD_CACHE_DIR, 'fonts')}': a part of the path is not a folder`,
        },
      ]);
      expect(await listFiles(outDir()).catch(() => [])).toEqual([]);
    } finally {
      if (saved === undefined) delete process.env.FOURFOLD_CACHE_DIR;
      else process.env.FOURFOLD_CACHE_DIR = saved;
      vi.resetModules();
    }
  });

  test('a glob mirrors the tree below its fixed part', async () => {
    const summary = await convert(['patterns/**/h*.ffp'], { formats: ['json'] });
    expect(summary.files.map((f) => [f.rel, f.status])).toEqual([['tubes/heron.ffp', 'converted']]);
    expect(await listFiles(outDir())).toEqual(['tubes/heron.hash', 'tubes/heron.json']);
  });
});

describe('a file that is not text', () => {
  /** The message `check --format json` gives the same file. */
  async function checkSays(rel: string): Promise<string> {
    const io = fakeIO({ cwd: inDir() });
    await check({ name: 'check', operands: [rel], options: { format: 'json' } }, io);
    const report = JSON.parse(io.out()) as { files: Array<{ diagnostics: Array<{ id: string; message: string }> }> };
    const [first] = report.files[0]!.diagnostics;
    return `${rel}:1:1: error[${first!.id}]: ${first!.message}`;
  }

  test('is called what check calls it: binary data, or not UTF-8', async () => {
    // 23 bytes of text, then a zero byte: the 24th.
    await writeFile(
      join(inDir(), 'photo.ffp'),
      Buffer.concat([Buffer.from('title: not a pattern ok'), Buffer.from([0, 1])]),
    );
    // 0xff never occurs in UTF-8 (RFC 3629, section 1).
    await writeFile(join(inDir(), 'latin.ffp'), Buffer.from([0x74, 0x69, 0x74, 0x6c, 0x65, 0x3a, 0x20, 0xff, 0x0a]));
    const summary = await convert(['patterns'], { formats: ['svg'] });
    const says = (rel: string) => summary.files.find((f) => f.rel === rel);
    expect(says('photo.ffp')).toEqual({ rel: 'photo.ffp', status: 'failed', message: await checkSays('photo.ffp') });
    expect(says('photo.ffp')?.message).toContain('binary data (a zero byte at byte 24)');
    expect(says('latin.ffp')).toEqual({ rel: 'latin.ffp', status: 'failed', message: await checkSays('latin.ffp') });
    expect(says('latin.ffp')?.message).toContain('not UTF-8 text');
    expect(await listFiles(outDir())).not.toContain('photo.svg');
    expect(summary.exitCode).toBe(1);
  });
});

describe('atomic writes', () => {
  test('a write that cannot finish leaves neither a partial file nor a temporary one', async () => {
    const target = join(root, 'chart.svg');
    await mkdir(target); // renaming a file onto a folder fails
    expect(() => writeFileAtomic(target, '<svg/>')).toThrow();
    expect(await readdir(root)).toEqual(['chart.svg', 'patterns']);
    expect((await stat(target)).isDirectory()).toBe(true);
  });
});

describe('default formats', () => {
  test('without --formats: the chart, the steps and the model, no PNG', async () => {
    const summary = await convertPaths(['patterns/fan.ffp'], { out: 'out', cwd: root, jobs: 1 });
    expect(summary.exitCode).toBe(0);
    const written = (await readdir(outDir())).filter((f) => !f.endsWith('.hash')).sort();
    expect(written).toEqual(DEFAULT_OUTPUT_FORMATS.map((f) => `fan.${f}`).sort());
    expect(written).not.toContain('fan.png');
  });
});
