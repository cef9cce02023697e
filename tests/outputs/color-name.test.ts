import { describe, expect, it } from 'vitest';
import { colorName } from '../../shared/color-name.js';

describe('colorName', () => {
  it("keeps the designer's name when there is one", () => {
    expect(colorName({ name: 'deep teal', hex: '#dc143c' })).toBe('deep teal');
  });

  it('falls back to the CSS name of the hex', () => {
    // Source: CSS Color Module Level 4, section 6.1 "Named Colors": crimson #dc143c, darkolivegreen #556b2f, goldenrod #daa520.
    expect(colorName({ name: '', hex: '#dc143c' })).toBe('crimson');
    expect(colorName({ name: '', hex: '#556B2F' })).toBe('darkolivegreen');
    expect(colorName({ name: '', hex: '#daa520' })).toBe('goldenrod');
  });

  it('takes the first of two names for one colour, and nothing for a colour with no name', () => {
    // Source: CSS Color 4, 6.1: aqua and cyan are both #00ffff; gray and grey both #808080.
    expect(colorName({ name: '', hex: '#00ffff' })).toBe('aqua');
    expect(colorName({ name: '', hex: '#808080' })).toBe('gray');
    expect(colorName({ name: '', hex: '#123456' })).toBe('');
  });
});
