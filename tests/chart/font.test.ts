import { describe, expect, test, vi } from 'vitest';
import { mkdir, mkdtemp, readdir, readFile, rm, utimes, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { PNG } from 'pngjs';
import { embeddedFonts, FONT_FAMILY } from '../../bin/render/font.js';
import { svgToPng } from '../../bin/render/png.js';
import { woffToSfnt } from '../../bin/render/woff.js';

const require = createRequire(import.meta.url);
const fontDir = join(dirname(require.resolve('@fontsource/jetbrains-mono/package.json')), 'files');

// Source: OpenType specification, "Calculating checksums": the sum of the
// table's big-endian uint32 words, zero-padded to 4 bytes, modulo 2^32; the
// 'head' table is summed with its checksumAdjustment field (bytes 8-11) as 0.
function tableChecksum(data: Buffer, isHead: boolean): number {
  const padded = Buffer.alloc((data.length + 3) & ~3);
  data.copy(padded);
  if (isHead) padded.writeUInt32BE(0, 8);
  let sum = 0;
  for (let i = 0; i < padded.length; i += 4) sum = (sum + padded.readUInt32BE(i)) >>> 0;
  return sum;
}

describe('the bundled font', () => {
  test('WOFF to sfnt: every table is whole, by the checksum the font records for it', async () => {
    const sfnt = woffToSfnt(await readFile(join(fontDir, 'jetbrains-mono-latin-400-normal.woff')));
    const numTables = sfnt.readUInt16BE(4);
    expect(sfnt.readUInt32BE(0)).toBe(0x00010000); // TrueType outlines
    expect(numTables).toBeGreaterThan(8);
    const tags: string[] = [];
    for (let i = 0; i < numTables; i++) {
      const at = 12 + i * 16;
      const tag = sfnt.toString('latin1', at, at + 4);
      tags.push(tag);
      const [checksum, offset, length] = [
        sfnt.readUInt32BE(at + 4),
        sfnt.readUInt32BE(at + 8),
        sfnt.readUInt32BE(at + 12),
      ];
      expect(tableChecksum(sfnt.subarray(offset, offset + length), tag === 'head'), tag).toBe(checksum);
    }
    expect(tags).toEqual([...tags].sort());
    expect(tags).toEqual(expect.arrayContaining(['cmap', 'glyf', 'head', 'hmtx', 'loca', 'name']));
  });

  test('the embedded subset is a small TrueType font, the same bytes every time', async () => {
    const [regular, bold] = await embeddedFonts('ABC 123');
    expect([regular!.weight, bold!.weight]).toEqual([400, 700]);
    expect(regular!.family).toBe(FONT_FAMILY);
    const bytes = Buffer.from(regular!.base64, 'base64');
    expect(bytes.readUInt32BE(0)).toBe(0x00010000);
    expect(bytes.length).toBeLessThan(12_000);
    const again = await embeddedFonts('ABCD 123');
    expect(again[0]!.base64).not.toBe(regular!.base64);
    expect((await embeddedFonts('ABC 123'))[0]!.base64).toBe(regular!.base64);
    // Digits are in every subset, so charts that differ only in their numbers share one.
    expect((await embeddedFonts('CBA 98'))[0]!.base64).toBe(regular!.base64);
  });

  test('PNG text is drawn with the bundled font, system fonts being off', async () => {
    const svg = (family: string) =>
      `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 40 10" width="40mm" height="10mm"><rect width="40" height="10" fill="#ffffff"/><text x="1" y="8" font-size="8" font-family="${family}" fill="#000000">WMW</text></svg>`;
    const ink = (png: Buffer) => {
      const image = PNG.sync.read(png);
      let dark = 0;
      for (let i = 0; i < image.data.length; i += 4) if (image.data[i]! < 128) dark++;
      return dark;
    };
    const drawn = ink(await svgToPng(svg(`'${FONT_FAMILY}'`), 96));
    expect(drawn).toBeGreaterThan(200);
    // An unknown family falls back to the bundled font too, so the glyphs come out the same.
    expect(ink(await svgToPng(svg('NoSuchFamily, monospace'), 96))).toBe(drawn);
  });

  test('a subset made once is read from the disk cache by a fresh process, and a damaged entry is made again', () =>
    withCacheDir(async (cacheDir) => {
      const [made, madeBold] = await (await freshFonts())('ABC 123');
      const entries = (await readdir(cacheDir)).sort();
      expect(entries).toEqual([
        expect.stringMatching(/^subset-400-\w+\.ttf$/),
        expect.stringMatching(/^subset-700-\w+\.ttf$/),
      ]);
      const regularEntry = join(cacheDir, entries[0]!);
      expect((await readFile(regularEntry)).toString('base64')).toBe(made!.base64);

      // Another valid face put in the entry comes back as it is: the file is read, not made again.
      await writeFile(regularEntry, Buffer.from(madeBold!.base64, 'base64'));
      expect((await (await freshFonts())('ABC 123'))[0]!.base64).toBe(madeBold!.base64);

      await writeFile(regularEntry, 'not a font');
      const [remade] = await (await freshFonts())('ABC 123');
      expect(remade!.base64).toBe(made!.base64);
      expect((await readFile(regularEntry)).toString('base64')).toBe(made!.base64);
    }));

  test('the disk cache keeps at most SUBSETS_KEPT subsets, the most recently used', () =>
    withCacheDir(async (cacheDir) => {
      const { SUBSETS_KEPT } = await import('../../bin/render/font.js');
      await (
        await freshFonts()
      )('used');
      const used = (await readdir(cacheDir)).sort();
      await mkdir(cacheDir, { recursive: true });
      // Older than anything real, one second apart: the oldest are the first to go.
      const stale = Array.from(
        { length: SUBSETS_KEPT - 2 },
        (_, i) => `subset-400-stale${String(i).padStart(4, '0')}.ttf`,
      );
      for (const [i, name] of stale.entries()) {
        await writeFile(join(cacheDir, name), 'old');
        await utimes(join(cacheDir, name), 1_500_000_000 + i, 1_500_000_000 + i);
      }
      for (const name of used) await utimes(join(cacheDir, name), 1_400_000_000, 1_400_000_000);
      // Reading a subset marks it as used again, so it outlives the stale ones.
      await (
        await freshFonts()
      )('used');
      expect(await readdir(cacheDir)).toHaveLength(SUBSETS_KEPT);
      // Two new subsets (both weights) take the folder over the limit, and it is cut to three quarters.
      await (
        await freshFonts()
      )('new text');
      const left = await readdir(cacheDir);
      // The two weights are stored side by side, so the second may land after the first has pruned.
      expect(left.length).toBeGreaterThanOrEqual((SUBSETS_KEPT * 3) / 4);
      expect(left.length).toBeLessThanOrEqual((SUBSETS_KEPT * 3) / 4 + 1);
      expect(left.filter((n) => !n.includes('stale'))).toHaveLength(4);
      expect(left).toEqual(expect.arrayContaining(used));
      expect(left).not.toContain(stale[0]);
      expect(left).toContain(stale.at(-1));
    }));
});

/**
 * Runs `body` with FOURFOLD_CACHE_DIR set to a fresh folder, handing it that
 * folder's `fonts`, and puts everything back afterwards.
 */
async function withCacheDir(body: (cacheDir: string) => Promise<void>): Promise<void> {
  const saved = process.env.FOURFOLD_CACHE_DIR;
  const root = await mkdtemp(join(tmpdir(), 'fourfold-font-cache-'));
  process.env.FOURFOLD_CACHE_DIR = root;
  try {
    await body(join(root, 'fonts'));
  } finally {
    await rm(root, { recursive: true, force: true });
    if (saved === undefined) delete process.env.FOURFOLD_CACHE_DIR;
    else process.env.FOURFOLD_CACHE_DIR = saved;
    vi.resetModules();
  }
}

/** A fresh copy of the module stands for a new process: its in-memory cache is empty, and it reads the folder anew. */
async function freshFonts(): Promise<typeof embeddedFonts> {
  vi.resetModules();
  return (await import('../../bin/render/font.js')).embeddedFonts;
}
