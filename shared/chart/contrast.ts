/**
 * WCAG 2.x relative luminance and contrast ratio, used to pick the colour of
 * each bead's key letter. Colours are '#rrggbb' (the palette is normalised by
 * the parser).
 */

/** sRGB channel (0-255) to linear light, as WCAG 2.x defines it. */
function linear(channel: number): number {
  const c = channel / 255;
  // WCAG 2.x uses 0.03928 as the threshold; sRGB's own is 0.04045. Below 0.04
  // no 8-bit value falls between them, so both give the same result.
  return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

export function parseHex(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

export function relativeLuminance(hex: string): number {
  const [r, g, b] = parseHex(hex);
  return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
}

/** (L1 + 0.05) / (L2 + 0.05) with L1 the lighter of the two: 1 to 21. */
export function contrastRatio(a: string, b: string): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

/**
 * The candidate with the higher contrast against `fill` (the first on a tie).
 * With black and white as candidates the winner always reaches at least
 * sqrt(21) = 4.58:1, above the 4.5:1 that WCAG asks of normal text.
 */
export function labelColor(fill: string, candidates: readonly [string, string] = ['#000000', '#ffffff']): string {
  const [first, second] = candidates;
  return contrastRatio(fill, second) > contrastRatio(fill, first) ? second : first;
}

/** `labelColor` with black and white, once per palette colour rather than once per bead. */
export function labelColors(hexes: Iterable<string>): Map<string, string> {
  return new Map([...hexes].map((hex) => [hex, labelColor(hex)]));
}
