/**
 * What sits around the piece: the title block above it, the legend and (at
 * true size) the 1 cm scale bar below it. Sizes are in page mm and do not
 * follow the chart's scale, so the text stays readable at any bead size.
 */
import type { Model } from '../model.js';
import { labelColor } from './contrast.js';
import { round2 } from './geometry.js';
import { CAP_HEIGHT } from './scene-beads.js';
import { ADVANCE } from './scene-rows.js';
import type { HatchPattern, Primitive, TextPrim } from './scene-types.js';
import type { Theme } from './themes.js';

const TITLE = 5;
const INFO = 3;
const LEGEND = 3;
const SWATCH = 4.5;

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

export function legend(
  model: Model,
  theme: Theme,
  left: number,
  top: number,
  maxWidth: number,
): { items: Primitive[]; patterns: HatchPattern[]; height: number; width: number } {
  const counts = countsByKey(model);
  const countWidth = Math.max(1, ...[...counts.values()].map((c) => String(c).length));
  const nameOf = (p: { name: string; hex: string }): string => p.name || p.hex;
  const nameWidth = Math.max(1, ...model.palette.map((p) => [...nameOf(p)].length));
  const entryWidth = SWATCH + 1.5 + (nameWidth + countWidth + 2) * ADVANCE * LEGEND + 4;
  const columns = Math.max(1, Math.min(model.palette.length, Math.floor(maxWidth / entryWidth)));
  const rowHeight = SWATCH + 1.5;
  const items: Primitive[] = [];
  const patterns: HatchPattern[] = [];
  model.palette.forEach((entry, i) => {
    const x = left + (i % columns) * entryWidth;
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
    const key = text(
      `ff-legend-${entry.key}-key`,
      'legend-key',
      x + SWATCH / 2,
      baseline,
      LEGEND,
      entry.key,
      theme.patternedLegend ? theme.ink : labelColor(entry.hex),
      true,
    );
    key.anchor = 'middle';
    // On a hatched swatch the letter sits beside the swatch, where the ink has paper behind it.
    if (theme.patternedLegend) key.x = round2(x + SWATCH + 1.5 + (ADVANCE * LEGEND) / 2);
    items.push({ ...key, data });
    const nameX = x + SWATCH + 1.5 + (theme.patternedLegend ? 2 * ADVANCE * LEGEND : 0);
    items.push({
      ...text(`ff-legend-${entry.key}-name`, 'legend-name', nameX, baseline, LEGEND, nameOf(entry), theme.ink),
      data,
    });
    const countX = nameX + (nameWidth + 1 + countWidth) * ADVANCE * LEGEND;
    items.push({
      ...text(
        `ff-legend-${entry.key}-count`,
        'legend-count',
        countX,
        baseline,
        LEGEND,
        String(counts.get(entry.key) ?? 0),
        theme.muted,
      ),
      anchor: 'end',
      data,
    });
  });
  const rows = Math.ceil(model.palette.length / columns);
  return { items, patterns, height: rows * rowHeight, width: columns * entryWidth };
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
