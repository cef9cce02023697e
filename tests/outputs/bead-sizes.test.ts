import { describe, expect, it } from 'vitest';
import { BEAD_SIZES } from '../../shared/bead-sizes.js';

/**
 * Beads per gram across published supplier size charts, as the low and high
 * ends of what those charts print (figures from memory, not from one chart:
 * makers and finishes differ by 10-20%, NOTATION.md section 6).
 */
const PUBLISHED: Record<string, { low: number; high: number; typical: number }> = {
  '15/0 round': { low: 200, high: 300, typical: 250 },
  '11/0 round': { low: 95, high: 130, typical: 110 },
  '8/0 round': { low: 30, high: 45, typical: 36 },
  '6/0 round': { low: 10, high: 18, typical: 13 },
  '11/0 cylinder': { low: 165, high: 220, typical: 190 },
};

describe('beads-per-gram table', () => {
  it.each(BEAD_SIZES.map((b) => [`${b.size} ${b.shape}`, b] as const))(
    '%s lies within the published spread',
    (name, b) => {
      const spread = PUBLISHED[name];
      expect(spread, `no published figure for ${name}`).toBeDefined();
      expect(b.perGram.low).toBeLessThanOrEqual(b.perGram.high);
      expect(b.perGram.low).toBeGreaterThanOrEqual(spread!.low);
      expect(b.perGram.high).toBeLessThanOrEqual(spread!.high);
      expect(b.perGram.low).toBeLessThanOrEqual(spread!.typical);
      expect(b.perGram.high).toBeGreaterThanOrEqual(spread!.typical);
    },
  );

  it('gets lighter per bead as the size number grows (more beads per gram)', () => {
    const rounds = ['6/0', '8/0', '11/0', '15/0'].map((s) =>
      BEAD_SIZES.find((b) => b.size === s && b.shape === 'round')!,
    );
    for (let i = 1; i < rounds.length; i++) expect(rounds[i]!.perGram.low).toBeGreaterThan(rounds[i - 1]!.perGram.high);
  });
});
