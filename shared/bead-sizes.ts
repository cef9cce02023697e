/**
 * Bead sizes by size and shape. Every figure is a general one from memory
 * (common practice across supplier size charts, which differ by 10-20%); no
 * single maker's chart is the source. Diameter is the outside diameter,
 * length is measured along the hole.
 */
import type { BeadShape } from '../parser/ast.js';

export interface BeadSize {
  size: string;
  shape: BeadShape;
  diameterMm: number;
  lengthMm: number;
  /** Beads per gram, low and high. */
  perGram: { low: number; high: number };
}

export const BEAD_SIZES: readonly BeadSize[] = [
  // From memory / common practice: 15/0 rounds are about 1.5 mm across and 1.0 mm long, roughly 250 a gram.
  { size: '15/0', shape: 'round', diameterMm: 1.5, lengthMm: 1.0, perGram: { low: 220, high: 290 } },
  // From memory / common practice: 11/0 rounds are about 2.0 mm across and 1.4 mm long, roughly 110 a gram.
  { size: '11/0', shape: 'round', diameterMm: 2.0, lengthMm: 1.4, perGram: { low: 100, high: 125 } },
  // From memory / common practice: 8/0 rounds are about 3.0 mm across and 2.2 mm long, roughly 36 a gram.
  { size: '8/0', shape: 'round', diameterMm: 3.0, lengthMm: 2.2, perGram: { low: 32, high: 42 } },
  // From memory / common practice: 6/0 rounds are about 4.0 mm across and 3.0 mm long, roughly 14 a gram.
  { size: '6/0', shape: 'round', diameterMm: 4.0, lengthMm: 3.0, perGram: { low: 12, high: 16 } },
  // From memory / common practice: 11/0 cylinders are about 1.6 mm across and 1.3 mm long, roughly 190 a gram.
  { size: '11/0', shape: 'cylinder', diameterMm: 1.6, lengthMm: 1.3, perGram: { low: 175, high: 210 } },
];

/** The table entry for a size and shape; 11/0 round when the pair is not in the table (the header default). */
export function beadSize(size: string, shape: BeadShape): BeadSize {
  return BEAD_SIZES.find((b) => b.size === size && b.shape === shape) ?? BEAD_SIZES[1]!;
}

/**
 * One unit side in mm: the bead along the side plus half a bead's diameter,
 * because the beads at each corner nestle into each other rather than sitting
 * end to end (an estimate from geometry, not a measured figure).
 */
export const unitSideMm = (b: BeadSize): number => b.lengthMm + b.diameterMm / 2;
