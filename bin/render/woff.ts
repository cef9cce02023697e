/**
 * WOFF 1.0 to a plain sfnt (TrueType) font, with Node's own zlib: the font
 * subsetter and the PNG rasteriser both want sfnt, and this is much quicker
 * to start than a WebAssembly WOFF2 decoder in every worker thread.
 * Source: W3C, "WOFF File Format 1.0" (2012), sections 3-5: the header, the
 * table directory, and zlib-compressed tables stored whole when compression
 * would not shrink them.
 */
import { inflateSync } from 'node:zlib';

const HEADER = 44;
const WOFF_ENTRY = 20;
const SFNT_ENTRY = 16;

const pad4 = (n: number): number => (n + 3) & ~3;

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString('latin1', 0, 4) !== 'wOFF') throw new Error('not a WOFF 1.0 font');
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = HEADER + i * WOFF_ENTRY;
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const stored = woff.subarray(offset, offset + compLength);
    return {
      tag: woff.readUInt32BE(at),
      checksum: woff.readUInt32BE(at + 16),
      data: compLength < origLength ? inflateSync(stored) : stored,
    };
  });
  // The sfnt offset table's binary-search fields (OpenType spec, "Table Directory").
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  let offset = 12 + numTables * SFNT_ENTRY;
  const size = tables.reduce((n, t) => n + pad4(t.data.length), offset);
  const out = Buffer.alloc(size);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  tables.forEach((t, i) => {
    const at = 12 + i * SFNT_ENTRY;
    out.writeUInt32BE(t.tag, at);
    out.writeUInt32BE(t.checksum, at + 4);
    out.writeUInt32BE(offset, at + 8);
    out.writeUInt32BE(t.data.length, at + 12);
    t.data.copy(out, offset);
    offset += pad4(t.data.length);
  });
  return out;
}
