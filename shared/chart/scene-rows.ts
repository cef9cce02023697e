/**
 * Row numbers with an arrow for the direction of work, and the seam of a
 * tube. Flat pieces and tubes number rows in the left margin; a round puts
 * its number in the hole of the round's first unit, since rounds have no
 * margin to line up in.
 */
import type { Model, Point, RowInfo } from '../model.js';
import { arrowhead, pointPath, round2, roundPoints, toPage, unitVector, type PageTransform } from './geometry.js';
import { ADVANCE, CAP_HEIGHT } from './scene-beads.js';
import type { PathPrim, Primitive } from './scene-types.js';
import type { Theme } from './themes.js';

export const rowNumberSize = (scale: number): number => round2(Math.min(3.2, Math.max(1.6, 0.42 * scale)));

/** Room the left margin needs for "NN >" at the given size. */
export const gutterWidth = (model: Model, scale: number): number => {
  if (model.layout.kind === 'round') return 0;
  const digits = String(Math.max(1, model.rows.length)).length;
  const size = rowNumberSize(scale);
  return round2(digits * ADVANCE * size + size * 1.6);
};

/** Which way the row runs on the page, from its first unit toward its second. */
function heading(model: Model, row: RowInfo, t: PageTransform): Point {
  const [a, b] = row.units.map((id) => model.units[id]);
  if (a && b) return unitVector(toPage(t, a), toPage(t, b));
  if (row.heading === 'left') return { x: -1, y: 0 };
  if (row.heading === 'right' || !a) return { x: 1, y: 0 };
  // A one-unit round runs along its base side.
  const rad = (a.angle * Math.PI) / 180;
  return { x: Math.cos(rad), y: -Math.sin(rad) };
}

export function rowNumbers(model: Model, t: PageTransform, theme: Theme, chartLeft: number): Primitive[] {
  const size = rowNumberSize(t.scale);
  const out: Primitive[] = [];
  for (const row of model.rows) {
    const first = model.units[row.units[0] ?? -1];
    if (!first) continue;
    const p = toPage(t, first);
    const dir = heading(model, row, t);
    const inRound = model.layout.kind === 'round';
    const textX = inRound ? p.x : chartLeft - size * 1.5;
    const arrowDir = inRound ? dir : { x: dir.x < 0 ? -1 : 1, y: 0 };
    const arrowSize = inRound ? 0.12 * t.scale : size * 0.6;
    // Flat and tube: centred in the strip between the number and the chart.
    const arrowMid = inRound
      ? { x: p.x + dir.x * 0.3 * t.scale, y: p.y + dir.y * 0.3 * t.scale }
      : { x: chartLeft - 0.75 * size, y: p.y };
    const arrowTip = { x: arrowMid.x + (arrowDir.x * arrowSize) / 2, y: arrowMid.y + (arrowDir.y * arrowSize) / 2 };
    out.push({
      kind: 'text',
      id: `ff-row-${row.row}`,
      role: 'row-number',
      x: round2(textX),
      y: round2(p.y + (size * CAP_HEIGHT) / 2),
      size: inRound ? round2(0.26 * t.scale) : size,
      text: String(row.row),
      color: theme.ink,
      anchor: inRound ? 'middle' : 'end',
      bold: true,
      data: { row: row.row },
    });
    out.push({
      kind: 'polygon',
      id: `ff-row-${row.row}-arrow`,
      role: 'row-arrow',
      points: roundPoints(arrowhead(arrowTip, arrowDir, arrowSize)),
      fill: theme.ink,
      data: { row: row.row },
    });
  }
  return out;
}

/** The tube's seam: a dashed line down the unrolled chart where its edges join. */
export function seam(model: Model, t: PageTransform, theme: Theme): PathPrim[] {
  const x = model.layout.seamX;
  if (model.layout.kind !== 'tube' || x === undefined) return [];
  const { minY, maxY } = model.layout.bounds;
  const top = toPage(t, { x, y: maxY + 0.25 });
  const bottom = toPage(t, { x, y: minY - 0.25 });
  return [
    {
      kind: 'path',
      id: 'ff-seam',
      role: 'seam',
      d: pointPath([top.x, top.y, bottom.x, bottom.y], false),
      fill: null,
      stroke: theme.seam,
      strokeWidth: round2(Math.max(0.3, 0.05 * t.scale)),
      dash: `${round2(0.2 * t.scale)} ${round2(0.1 * t.scale)}`,
      data: {},
    },
  ];
}
