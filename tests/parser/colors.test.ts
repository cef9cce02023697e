/**
 * Colour names against the reference list of CSS Color Module Level 4 named
 * colours in the npm package `color-name` (a devDependency; not what the
 * parser itself uses, which is culori's table).
 */
import colorNames from 'color-name';
import { describe, expect, test } from 'vitest';
import { parse } from '../../parser/index.js';

const hex = ([r, g, b]: readonly number[]): string =>
  '#' + [r, g, b].map((n) => n!.toString(16).padStart(2, '0')).join('');
const paletteOf = (colour: string) => parse(`title: C\ncolors:\n  A ${colour}\nrow 1: AAAA\n`);

describe('CSS Color 4 names (reference: color-name)', () => {
  const names = Object.entries(colorNames);

  test('the reference list has the 148 names of CSS Color 4', () => {
    // Source: CSS Color Module Level 4, section 6.1 "Named Colors" (148 keywords, incl. rebeccapurple).
    expect(names.length).toBe(148);
  });

  test.each(names)('%s parses to the same RGB', (name, rgb) => {
    const r = paletteOf(name);
    expect(r.diagnostics).toEqual([]);
    expect(r.value.colors[0]!.hex).toBe(hex(rgb));
    expect(paletteOf(name.toUpperCase()).value.colors[0]!.hex).toBe(hex(rgb));
  });

  test('nothing else is accepted as a name', () => {
    const known = new Set(names.map(([n]) => n));
    // Near misses, other specs' keywords and CSS words that are not named colours.
    for (const word of [
      'transparent',
      'currentcolor',
      'grey50',
      'tela',
      'rebeccapurpl',
      'bluegreen',
      'darkgrey2',
      'none',
      'inherit',
      'x',
    ]) {
      expect(known.has(word)).toBe(false);
      const r = paletteOf(word);
      expect(r.value.colors[0]!.hex).toBeNull();
      expect(r.diagnostics.map((d) => d.id)).toContain('bad-color');
    }
  });

  test('an unknown name gets a did-you-mean from the list', () => {
    expect(paletteOf('tela').diagnostics[0]!.message).toContain("; did you mean 'teal'?");
    expect(paletteOf('rebecapurple').diagnostics[0]!.message).toContain("; did you mean 'rebeccapurple'?");
  });

  test('hex colours: #RGB and #RRGGBB in any case, normalised to lower-case #rrggbb', () => {
    expect(paletteOf('#FA0').value.colors[0]!.hex).toBe('#ffaa00');
    expect(paletteOf('#2E6F8E').value.colors[0]!.hex).toBe('#2e6f8e');
    for (const bad of ['#ff', '#ffff', '#12345g', '#1234567']) expect(paletteOf(bad).value.colors[0]!.hex).toBeNull();
  });
});
