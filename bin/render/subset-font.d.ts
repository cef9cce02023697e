// The package ships no types; this is the part of its API we use (its README).
declare module 'subset-font' {
  interface SubsetOptions {
    targetFormat?: 'sfnt' | 'truetype' | 'woff' | 'woff2';
    keepAllGlyphs?: boolean;
  }
  export default function subsetFont(
    font: Buffer | Uint8Array,
    text: string | null,
    options?: SubsetOptions,
  ): Promise<Buffer>;
}
