/**
 * The bundled JetBrains Mono (from @fontsource/jetbrains-mono, Latin set) for
 * charts: subsets for embedding in SVG, and whole font files for the PNG
 * rasteriser, which reads fonts from files only. Everything is cached per
 * process, since batch conversion renders thousands of charts.
 */
import { createHash } from 'node:crypto';
import { mkdir, readFile, rename, stat, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { setFlagsFromString } from 'node:v8';
import subsetFont from 'subset-font';
import type { EmbeddedFont } from '../../shared/chart/elements.js';
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
    useBaselineWasmOnly();
    cached = Promise.all(
      WEIGHTS.map(async (weight) => ({
        family: FONT_FAMILY,
        weight,
        base64: (await subsetFont(await sfnt(weight), text, { targetFormat: 'sfnt' })).toString('base64'),
      })),
    );
    if (subsetCache.size >= SUBSET_CACHE_LIMIT) subsetCache.delete(subsetCache.keys().next().value as string);
    subsetCache.set(text, cached);
  }
  return cached;
}

let filesCache: Promise<string[]> | undefined;

/**
 * The two faces as .ttf files in the temp folder, named by their content hash
 * so processes and workers share them; written to a temporary name and renamed
 * so a reader never sees half a file.
 */
export function fontFiles(): Promise<string[]> {
  filesCache ??= Promise.all(
    WEIGHTS.map(async (weight) => {
      const bytes = await sfnt(weight);
      const hash = createHash('sha256').update(bytes).digest('hex').slice(0, 16);
      const dir = join(tmpdir(), 'fourfold-fonts');
      const file = join(dir, `jetbrains-mono-${weight}-${hash}.ttf`);
      const present = await stat(file).then(
        (s) => s.size === bytes.length,
        () => false,
      );
      if (!present) {
        await mkdir(dir, { recursive: true });
        const temp = `${file}.${process.pid}.${Math.random().toString(36).slice(2)}.tmp`;
        await writeFile(temp, bytes);
        await rename(temp, file);
      }
      return file;
    }),
  );
  return filesCache;
}
