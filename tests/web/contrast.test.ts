/**
 * Every text and background pair the app's styles use (web/src/styles.css)
 * reaches the WCAG 2.x contrast of 4.5:1 for normal text, in both themes.
 * The colours are read from Tailwind's own palette (tailwindcss/colors), so a change of
 * Tailwind's palette would show here.
 */
import { describe, expect, it } from 'vitest';
import { formatHex, parse } from 'culori';
import colors from 'tailwindcss/colors';
import { color as oneDark } from '@codemirror/theme-one-dark';
import { contrastRatio } from '../../shared/chart/contrast.js';
import { FFP_COLORS } from '../../web/src/lib/ffp-language.js';

function color(name: string): string {
  const [hue, shade] = name.split('-') as [string, string | undefined];
  const entry = (colors as unknown as Record<string, string | Record<string, string>>)[hue];
  const value = typeof entry === 'string' ? entry : entry?.[shade ?? ''];
  if (!value) throw new Error(`Tailwind has no colour ${name}`);
  // formatHex clamps oklch colours just outside sRGB, as a browser displays them.
  return formatHex(parse(value))!;
}

// [text, background, where]
const LIGHT: [string, string, string][] = [
  ['slate-900', 'white', 'body text'],
  ['slate-600', 'white', 'muted text'],
  ['teal-800', 'white', 'links'],
  ['red-800', 'white', 'errors'],
  ['amber-900', 'white', 'warnings'],
  ['white', 'teal-800', 'primary button'],
  ['slate-900', 'slate-100', 'button hover, code blocks'],
  ['slate-900', 'amber-50', 'small-parts caution'],
  ['slate-600', 'slate-100', 'muted text on code blocks'],
];
const DARK: [string, string, string][] = [
  ['slate-100', 'slate-900', 'body text'],
  ['slate-300', 'slate-900', 'muted text'],
  ['teal-300', 'slate-900', 'links'],
  ['red-300', 'slate-900', 'errors'],
  ['amber-200', 'slate-900', 'warnings'],
  ['slate-900', 'teal-300', 'primary button'],
  ['slate-100', 'slate-800', 'buttons, inputs, caution'],
  ['slate-300', 'slate-800', 'muted text on panels'],
  ['teal-300', 'slate-800', 'links on panels'],
];

describe('text contrast', () => {
  it('computes the W3C worked values first', () => {
    // Source: WCAG 2.x, definition of contrast ratio: black on white is 21:1, a colour on itself 1:1.
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrastRatio('#777777', '#777777')).toBe(1);
    // Source: WebAIM contrast checker, #767676 on white is 4.54:1 (the lightest grey that passes AA).
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });

  it.each([...LIGHT.map((p) => ['light', ...p]), ...DARK.map((p) => ['dark', ...p])])(
    '%s theme, %s on %s (%s): at least 4.5:1',
    (_theme, text, bg) => {
      expect(contrastRatio(color(text!), color(bg!))).toBeGreaterThanOrEqual(4.5);
    },
  );
});

// The editor's highlight colours are written out as hex; each must be the Tailwind shade it names.
const FFP_SHADES = {
  light: {
    comment: 'slate-600',
    key: 'teal-800',
    row: 'violet-800',
    number: 'blue-800',
    color: 'rose-800',
    mark: 'fuchsia-800',
  },
  dark: {
    comment: 'slate-400',
    key: 'teal-300',
    row: 'violet-300',
    number: 'blue-300',
    color: 'rose-300',
    mark: 'fuchsia-300',
  },
} as const;

describe('editor highlighting contrast', () => {
  // The light editor is white; the dark one has the one-dark theme's background, read from the package.
  const backgrounds = { light: '#ffffff', dark: oneDark.background };
  it.each(
    (['light', 'dark'] as const).flatMap((theme) =>
      Object.entries(FFP_COLORS[theme]).map(([part, hex]) => [theme, part, hex] as const),
    ),
  )('%s editor, %s (%s): the Tailwind shade it names, at least 4.5:1', (theme, part, hex) => {
    expect(hex).toBe(color(FFP_SHADES[theme][part as keyof (typeof FFP_SHADES)['light']]));
    expect(contrastRatio(hex, backgrounds[theme])).toBeGreaterThanOrEqual(4.5);
  });
});
