import { describe, expect, test } from 'vitest';
import { contrastRatio, labelColor, relativeLuminance } from '../../shared/chart/contrast.js';

// Source: WCAG 2.x definitions of relative luminance and contrast ratio
// (W3C, "Web Content Accessibility Guidelines 2.1", section Definitions):
// L = 0.2126 R + 0.7152 G + 0.0722 B on linearised sRGB; ratio (L1 + 0.05) / (L2 + 0.05).
describe('WCAG 2.x contrast', () => {
  test('worked values: black on white is 21:1, a colour on itself is 1:1', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 10);
    expect(contrastRatio('#ffffff', '#ffffff')).toBe(1);
    expect(contrastRatio('#777777', '#777777')).toBe(1);
  });

  test('luminance of the primaries is their coefficient in the formula', () => {
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 12);
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#ff0000')).toBeCloseTo(0.2126, 12);
    expect(relativeLuminance('#00ff00')).toBeCloseTo(0.7152, 12);
    expect(relativeLuminance('#0000ff')).toBeCloseTo(0.0722, 12);
  });

  // Source: the WebAIM contrast checker shows 4.54:1 for #767676 on white, the
  // lightest grey that passes AA for normal text (from memory).
  test('#767676 on white is just above 4.5:1', () => {
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    expect(contrastRatio('#777777', '#ffffff')).toBeLessThan(4.5);
  });

  test('the label takes the colour of higher contrast, and that is always at least 4.5:1', () => {
    expect(labelColor('#ffffff')).toBe('#000000');
    expect(labelColor('#000000')).toBe('#ffffff');
    expect(labelColor('#2e6f8e')).toBe('#ffffff');
    expect(labelColor('#f4f1ea')).toBe('#000000');
    // Every grey and a sweep of hues: the better of black and white never falls below sqrt(21).
    for (let v = 0; v < 256; v++) {
      for (const hex of [
        [v, v, v],
        [v, 255 - v, 128],
        [255, v, 0],
        [0, v, 255],
      ].map((c) => `#${c.map((n) => n.toString(16).padStart(2, '0')).join('')}`)) {
        expect(contrastRatio(hex, labelColor(hex))).toBeGreaterThanOrEqual(Math.sqrt(21) - 1e-9);
      }
    }
  });
});
