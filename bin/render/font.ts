/**
 * The bundled JetBrains Mono (from @fontsource/jetbrains-mono, Latin set) for
 * charts: subsets for embedding in SVG, and whole font files for the PNG
 * rasteriser, which reads fonts from files only. Everything is cached per
 * process, since batch conversion renders thousands of charts, and on disk
 * in the user's cache folder, since every command and every worker thread of
 * a batch would otherwise make the same few subsets again. The user's own
 * folder, not the shared temp folder, so that nobody else can put a file of
 * their choosing where a chart takes its font from.
 */
import { createHash } from 'node:crypto';
import { mkdir, readdir, readFile, rename, rm, stat, utimes, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { setFlagsFromString } from 'node:v8';
import envPaths from 'env-paths';
import type { EmbeddedFont } from '../../shared/chart/elements.js';
import { ioReason } from '../read-input.js';
import { woffToSfnt } from './woff.js';

export const FONT_FAMILY = 'JetBrains Mono';
const WEIGHTS = [400, 700] as const;
type Weight = (typeof WEIGHTS)[number];

const require = createRequire(import.meta.url);
// The package's exports map only names its CSS files, so find the folder through its package.json.
const fontDir = join(dirname(require.resolve('@fontsource/jetbrains-mono/package.json')), 'files');

const sfntCache = new Map<Weight, Promise<Buffer>>();

/** The whole Latin face as TrueType, which both the subsetter and resvg read directly. */
function sfnt(weight: Weight): Promise<Buffer> {
  let cached = sfntCache.get(weight);
  if (!cached) {
    cached = readFile(join(fontDir, `jetbrains-mono-latin-${weight}-normal.woff`)).then(woffToSfnt);
    sfntCache.set(weight, cached);
  }
  return cached;
}

/** FOURFOLD_CACHE_DIR when set (tests, read-only homes), else the platform's cache folder (`~/.cache/fourfold` on Linux). */
const cacheDir = join(process.env.FOURFOLD_CACHE_DIR || envPaths('fourfold', { suffix: '' }).cache, 'fonts');
const SUBSETTER_VERSION = String((require('subset-font/package.json') as { version?: unknown }).version);
const hashOf = (...parts: Array<string | Buffer>): string => {
  const hash = createHash('sha256');
  for (const part of parts) hash.update(part).update('\0');
  return hash.digest('hex').slice(0, 16);
};

/**
 * `bytes` under `name` in the cache folder, written to a temporary name and
 * renamed so that a reader, in this process or another, never sees half a
 * file.
 */
async function storeInCache(name: string, bytes: Buffer): Promise<string> {
  const file = join(cacheDir, name);
  const temp = `${file}.${process.pid}.${Math.random().toString(36).slice(2)}.tmp`;
  try {
    await mkdir(cacheDir, { recursive: true, mode: 0o700 });
    await writeFile(temp, bytes);
    await rename(temp, file);
  } catch (error) {
    // The original error says what went wrong; a failed clean-up of the temporary name would only hide it.
    await rm(temp, { force: true }).catch(() => {});
    throw error;
  }
  return file;
}

/** The PNG rasteriser's font files could not be written: the machine's problem, not the pattern's or a bug. */
export class FontCacheError extends Error {
  constructor(cause: unknown) {
    super(`cannot write the bundled font for PNG output into '${cacheDir}': ${ioReason(cause)}`, { cause });
  }
}

/** An sfnt's first four bytes: 0x00010000 for TrueType outlines, which the subsetter writes. */
const isTrueType = (bytes: Buffer): boolean => bytes.length > 12 && bytes.readUInt32BE(0) === 0x00010000;

/**
 * One weight subset to `text`, from the disk cache when an earlier run made
 * it. Loading the subsetter and its WebAssembly and making a first subset
 * took about 75 ms of every thread's first chart; reading the cached file
 * takes well under one. The name holds everything the bytes depend on.
 */
async function subset(weight: Weight, text: string): Promise<Buffer> {
  const face = await sfnt(weight);
  const name = `subset-${weight}-${hashOf(face, SUBSETTER_VERSION, text)}.ttf`;
  const file = join(cacheDir, name);
  const cached = await readFile(file).catch(() => null);
  if (cached && isTrueType(cached)) {
    // Its time says it is still in use, so pruning keeps it.
    const now = new Date();
    await utimes(file, now, now).catch(() => {});
    return cached;
  }
  useBaselineWasmOnly();
  const { default: subsetFont } = await import('subset-font');
  const bytes = await subsetFont(face, text, { targetFormat: 'sfnt' });
  // A cache that cannot be written only makes the next run slower.
  await storeInCache(name, bytes)
    .then(pruneSubsets)
    .catch(() => {});
  return bytes;
}

/**
 * Subsets kept on disk: each chart whose text has characters no earlier one
 * had adds two files of a few kilobytes, so an archive of varied patterns
 * converted over months would otherwise grow the folder without end. This
 * many hold the subsets of hundreds of different charts, a few megabytes.
 * Once over it, the folder goes down to three quarters, so that a batch of
 * new charts looks at every file's time once per hundred-odd new subsets,
 * not at each.
 */
export const SUBSETS_KEPT = 512;
const PRUNED_TO = (SUBSETS_KEPT * 3) / 4;

/** Removes the least recently used subsets when there are more than SUBSETS_KEPT; run after each new one. */
async function pruneSubsets(): Promise<void> {
  const names = (await readdir(cacheDir)).filter((n) => n.startsWith('subset-') && n.endsWith('.ttf'));
  if (names.length <= SUBSETS_KEPT) return;
  const used = await Promise.all(
    names.map(async (n) => ({
      n,
      at: await stat(join(cacheDir, n)).then(
        (s) => s.mtimeMs,
        () => 0,
      ),
    })),
  );
  used.sort((a, b) => b.at - a.at);
  // Another lane may prune at the same time; a file already gone is no error.
  await Promise.all(used.slice(PRUNED_TO).map(({ n }) => rm(join(cacheDir, n), { force: true })));
}

const subsetCache = new Map<string, Promise<EmbeddedFont[]>>();
const SUBSET_CACHE_LIMIT = 256;
let baselineWasmOnly = false;

/**
 * The subsetter is WebAssembly that runs a few times per batch. Left to
 * itself, V8 recompiles its hot functions with the optimising tier on
 * background threads after the first call: about 0.4 s of CPU in every
 * thread that subsets, competing with the batch's own threads, for
 * subsets that are then taken from the cache (measured: a process's CPU
 * time for its first two subsets went from about 460 ms to 70 ms). The
 * baseline tier alone is as fast for the first call. V8's flags hold for
 * the whole process, and no other WebAssembly runs in it.
 */
function useBaselineWasmOnly(): void {
  if (baselineWasmOnly) return;
  setFlagsFromString('--liftoff-only');
  baselineWasmOnly = true;
}

/**
 * Always in the subset: the digits and the marks of the chart's own lines
 * (bead counts, sizes, row numbers). Charts mostly differ in their numbers,
 * so with these in every subset a batch of charts needs a handful of subsets
 * instead of one per chart (1,000 generated panels: 27 subsets before, 2
 * after), for at most some 150 bytes of font a glyph the chart did not
 * already use. The space also keeps the face valid when a chart has no text.
 */
const ALWAYS = ' .,/0123456789·×';

/** Both weights subset to `glyphs` (the scene's characters) and ALWAYS, ready for `sceneToSvg`. */
export function embeddedFonts(glyphs: string): Promise<EmbeddedFont[]> {
  const text = [...new Set([...glyphs, ...ALWAYS])].sort().join('');
  let cached = subsetCache.get(text);
  if (!cached) {
    cached = Promise.all(
      WEIGHTS.map(async (weight) => ({
        family: FONT_FAMILY,
        weight,
        base64: (await subset(weight, text)).toString('base64'),
      })),
    );
    if (subsetCache.size >= SUBSET_CACHE_LIMIT) subsetCache.delete(subsetCache.keys().next().value as string);
    subsetCache.set(text, cached);
  }
  return cached;
}

let filesCache: Promise<string[]> | undefined;

/**
 * The two faces as .ttf files in the cache folder, named by their content
 * hash so processes and workers share them.
 */
export function fontFiles(): Promise<string[]> {
  filesCache ??= Promise.all(
    WEIGHTS.map(async (weight) => {
      const bytes = await sfnt(weight);
      const name = `jetbrains-mono-${weight}-${hashOf(bytes)}.ttf`;
      const present = await stat(join(cacheDir, name)).then(
        (s) => s.size === bytes.length,
        () => false,
      );
      if (present) return join(cacheDir, name);
      return storeInCache(name, bytes).catch((error: unknown) => {
        throw new FontCacheError(error);
      });
    }),
  );
  // A later call tries again: the folder may be writable by then.
  filesCache.catch(() => (filesCache = undefined));
  return filesCache;
}
