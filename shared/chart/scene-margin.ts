/**
 * What sits around the piece: the title block above it, the legend and (at
 * true size) the 1 cm scale bar below it. Sizes are in page mm and do not
 * follow the chart's scale, so the text stays readable at any bead size.
 */
import { colorName } from '../color-name.js';
import type { Model } from '../model.js';
import { labelColor } from './contrast.js';
import { round2 } from './geometry.js';
import { ADVANCE, CAP_HEIGHT } from './scene-beads.js';
import type { HatchPattern, Primitive, TextPrim } from './scene-types.js';
import type { Theme } from './themes.js';

const TITLE = 5;
const INFO = 3;
const LEGEND = 3;
const SWATCH = 4.5;
/** Swatch to text. */
const SWATCH_GAP = 1.5;
/** Between one legend column's counts and the next column's swatches. */
const COLUMN_GAP = 6;

/**
 * Width of a line of text: JetBrains Mono (the embedded face) gives every
 * character the same advance, 0.6 em (600 of its 1000 units per em), so a
 * count of characters measures the text exactly.
 */
export const textWidth = (text: string, size: number): number => [...text].length * ADVANCE * size;

const text = (
  id: string,
  role: TextPrim['role'],
  x: number,
  y: number,
  size: number,
  value: string,
  color: string,
  bold = false,
): TextPrim => ({
  kind: 'text',
  id,
  role,
  x: round2(x),
  y: round2(y),
  size,
  text: value,
  color,
  anchor: 'start',
  bold,
  data: {},
});

/** Beads per colour key, each bead once however many units hold it. */
export function countsByKey(model: Model): Map<string, number> {
  const counts = new Map<string, number>();
  for (const bead of model.beads) counts.set(bead.color, (counts.get(bead.color) ?? 0) + 1);
  return counts;
}

export const infoLine = (model: Model): string => {
  const { beads } = model.header;
  const { widthMm, heightMm } = model.layout;
  return `${beads.size} ${beads.shape} · finished ${round2(widthMm)} × ${round2(heightMm)} mm · ${model.beads.length} beads`;
};

export function titleBlock(
  model: Model,
  theme: Theme,
  left: number,
  top: number,
): { items: TextPrim[]; height: number; width: number } {
  const lines: TextPrim[] = [];
  let y = top + TITLE * CAP_HEIGHT;
  lines.push(text('ff-title', 'title', left, y, TITLE, model.header.title, theme.ink, true));
  if (model.header.designer) {
    y += INFO * 1.6;
    lines.push(text('ff-designer', 'info', left, y, INFO, `by ${model.header.designer}`, theme.muted));
  }
  y += INFO * 1.6;
  lines.push(text('ff-info', 'info', left, y, INFO, infoLine(model), theme.muted));
  const width = Math.max(...lines.map((l) => textWidth(l.text, l.size)));
  return { items: lines, height: y - top + INFO * 0.6, width };
}

/** Hatch kinds for the print legend, so colours stay apart in greyscale. */
const HATCHES = [
  'M0 0',
  'M0 0.5H1',
  'M0.5 0V1',
  'M0 1L1 0',
  'M0 0L1 1',
  'M0 0.5H1M0.5 0V1',
  'M0 1L1 0M0 0L1 1',
  'M0.35 0.5H0.65M0.5 0.35V0.65',
];

export function hatch(index: number, theme: Theme): HatchPattern {
  const kind = index % HATCHES.length;
  const size = round2(1.2 + 0.7 * Math.floor(index / HATCHES.length));
  const d = HATCHES[kind]!.replace(/-?\d+(\.\d+)?/g, (n) => String(round2(Number(n) * size)));
  return { id: `ff-hatch-${index}`, size, d, stroke: theme.ink, strokeWidth: 0.22 };
}

/** What the legend calls a colour: the designer's name, else its CSS name, else its hex. */
export const legendName = (entry: { name: string; hex: string }): string => colorName(entry) || entry.hex;

/**
 * Swatch, name, count per colour, in as many columns as fit. Every entry
 * shares one measured width, so names start and counts end on the same line
 * in every column, and the longest name stays two character cells clear of
 * its count, so "deep teal" and "36" read as two columns.
 */
export function legend(
  model: Model,
  theme: Theme,
  left: number,
  top: number,
  maxWidth: number,
): { items: Primitive[]; patterns: HatchPattern[]; height: number; width: number } {
  const counts = countsByKey(model);
  const cell = ADVANCE * LEGEND;
  const names = model.palette.map(legendName);
  const nameWidth = Math.max(cell, ...names.map((n) => textWidth(n, LEGEND)));
  const countWidth = Math.max(cell, ...model.palette.map((p) => textWidth(String(counts.get(p.key) ?? 0), LEGEND)));
  // On a hatched swatch the letter sits beside the swatch, where the ink has paper behind it.
  const nameOffset = SWATCH + SWATCH_GAP + (theme.patternedLegend ? 2 * cell : 0);
  const countOffset = nameOffset + nameWidth + 2 * cell + countWidth;
  const pitch = countOffset + COLUMN_GAP;
  const columns = Math.max(1, Math.min(model.palette.length, Math.floor((maxWidth + COLUMN_GAP) / pitch)));
  const rowHeight = SWATCH + 1.5;
  const items: Primitive[] = [];
  const patterns: HatchPattern[] = [];
  model.palette.forEach((entry, i) => {
    const x = left + (i % columns) * pitch;
    const y = top + Math.floor(i / columns) * rowHeight;
    const data = { key: entry.key };
    items.push({
      kind: 'rect',
      id: `ff-legend-${entry.key}`,
      role: 'legend-swatch',
      x: round2(x),
      y: round2(y),
      width: SWATCH,
      height: SWATCH,
      fill: entry.hex,
      stroke: theme.beadStroke,
      strokeWidth: theme.beadStrokeWidth,
      data,
    });
    if (theme.patternedLegend) {
      const pattern = hatch(i, theme);
      patterns.push(pattern);
      items.push({
        kind: 'rect',
        id: `ff-legend-${entry.key}-hatch`,
        role: 'legend-hatch',
        x: round2(x),
        y: round2(y),
        width: SWATCH,
        height: SWATCH,
        fill: { pattern: pattern.id },
        stroke: null,
        strokeWidth: 0,
        data,
      });
    }
    const baseline = y + SWATCH / 2 + (LEGEND * CAP_HEIGHT) / 2;
    const part = (suffix: string, role: TextPrim['role'], px: number, value: string, color: string, bold = false) => ({
      ...text(`ff-legend-${entry.key}-${suffix}`, role, px, baseline, LEGEND, value, color, bold),
      data,
    });
    const keyX = theme.patternedLegend ? x + SWATCH + SWATCH_GAP + cell / 2 : x + SWATCH / 2;
    const keyColor = theme.patternedLegend ? theme.ink : labelColor(entry.hex);
    items.push({ ...part('key', 'legend-key', keyX, entry.key, keyColor, true), anchor: 'middle' });
    items.push(part('name', 'legend-name', x + nameOffset, names[i]!, theme.ink));
    const count = String(counts.get(entry.key) ?? 0);
    items.push({ ...part('count', 'legend-count', x + countOffset, count, theme.muted), anchor: 'end' });
  });
  const rows = Math.ceil(model.palette.length / columns);
  return { items, patterns, height: rows * rowHeight, width: columns * pitch - COLUMN_GAP };
}

/** A 10 mm bar with end ticks and its caption, for checking a print's scale. */
export function scaleBar(theme: Theme, left: number, top: number): Primitive[] {
  const y = top + 1.5;
  return [
    {
      kind: 'path',
      id: 'ff-scale-bar',
      role: 'scale-bar',
      d: `M${round2(left)} ${round2(top)} V${round2(y)} H${round2(left + 10)} V${round2(top)}`,
      fill: null,
      stroke: theme.ink,
      strokeWidth: 0.3,
      data: {},
    },
    text('ff-scale-label', 'scale-label', left + 11.5, y, INFO, '1 cm', theme.muted),
  ];
}

export const SCALE_BAR_HEIGHT = 4;
