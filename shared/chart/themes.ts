/**
 * The three chart themes. Everything colour-like the scene draws comes from
 * here, so a theme is one object and the emitters never pick a colour.
 */
export type ThemeName = 'light' | 'dark' | 'print';

export interface Theme {
  name: ThemeName;
  /** Page background; null leaves the page unpainted (saves ink). */
  background: string | null;
  ink: string;
  /** Secondary text: legend names, unit numbers, scale bar caption. */
  muted: string;
  beadStroke: string;
  beadStrokeWidth: number;
  /** Faint cell outline under each unit, so units read as squares. */
  cell: string | null;
  cue: string;
  seam: string;
  failed: string;
  thread: { pickup: string; close: string; position: string };
  /** Outline behind the thread's pass numbers, so they read on a dark bead as on a light one. */
  halo: string;
  /** Print only: legend swatches carry a hatch so colours differ in greyscale too. */
  patternedLegend: boolean;
}

const light: Theme = {
  name: 'light',
  background: '#ffffff',
  ink: '#1b1b1f',
  muted: '#55555f',
  beadStroke: '#3a3a42',
  beadStrokeWidth: 0.25,
  cell: '#ececf0',
  cue: '#1b1b1f',
  seam: '#7a3fb0',
  failed: '#c62828',
  thread: { pickup: '#d0191f', close: '#1f5fbf', position: '#2e7d32' },
  halo: '#ffffff',
  patternedLegend: false,
};

const dark: Theme = {
  name: 'dark',
  background: '#17181c',
  ink: '#ececf1',
  muted: '#a9a9b6',
  beadStroke: '#050507',
  beadStrokeWidth: 0.25,
  cell: '#26272e',
  cue: '#ececf1',
  seam: '#c59bf0',
  failed: '#ff6b6b',
  thread: { pickup: '#ff6b6b', close: '#6aa8ff', position: '#7ad67e' },
  halo: '#17181c',
  patternedLegend: false,
};

const print: Theme = {
  name: 'print',
  background: null,
  ink: '#000000',
  muted: '#333333',
  beadStroke: '#000000',
  beadStrokeWidth: 0.15,
  cell: null,
  cue: '#000000',
  seam: '#000000',
  failed: '#000000',
  thread: { pickup: '#000000', close: '#000000', position: '#000000' },
  halo: '#ffffff',
  patternedLegend: true,
};

export const themes: Record<ThemeName, Theme> = { light, dark, print };

export const isThemeName = (name: string): name is ThemeName => Object.hasOwn(themes, name);
