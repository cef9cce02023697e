/**
 * Model to scene: lays the page out (title block, piece, legend, scale bar)
 * and collects every primitive in drawing order. Pure; the same model and
 * options always give the same scene.
 */
import type { Result } from '../diagnostic.js';
import type { Model } from '../model.js';
import { round2, type PageTransform } from './geometry.js';
import { beadClearance } from './clearance.js';
import { BEAD_THICKNESS, beads, cells, cues, failures, unitNumbers } from './scene-beads.js';
import { legend, SCALE_BAR_HEIGHT, scaleBar, titleBlock } from './scene-margin.js';
import { gutterWidth, rowNumbers, seam } from './scene-rows.js';
import { letterBoxes, threadOverlay } from './scene-thread.js';
import type { Primitive, Scene, SceneOptions } from './scene-types.js';
import { themes } from './themes.js';

export type { Scene, SceneOptions } from './scene-types.js';

/** mm per unit side when not at true size: big enough to read a key letter on screen and paper. */
export const DEFAULT_SCALE = 8;
const MARGIN = 6;
const GAP = 5;
export const FONT_FAMILY = "'JetBrains Mono', monospace";

const textOf = (items: readonly Primitive[]): string => {
  const chars = new Set<string>();
  for (const item of items) {
    const text = item.kind === 'text' ? item.text : item.kind === 'bead' ? item.label?.text : undefined;
    for (const ch of text ?? '') chars.add(ch);
  }
  return [...chars].sort().join('');
};

function description(model: Model): string {
  if (model.header.description) return model.header.description;
  const layout = model.layout.kind;
  return `Right-angle-weave chart, ${layout} layout: ${model.rows.length} ${layout === 'flat' ? 'rows' : 'rounds'}, ${model.units.length} units, ${model.beads.length} beads.`;
}

export function buildScene(model: Model, options: SceneOptions = {}): Result<Scene> {
  const theme = themes[options.theme ?? 'light'];
  const scale = options.scale === 'mm' ? model.layout.unitMm : DEFAULT_SCALE;
  const { bounds } = model.layout;
  const pad = scale * BEAD_THICKNESS;
  const gutter = gutterWidth(model, scale);

  const title = titleBlock(model, theme, MARGIN, MARGIN);
  const pieceTop = MARGIN + title.height + GAP;
  const pieceLeft = MARGIN + gutter;
  const pieceWidth = (bounds.maxX - bounds.minX) * scale + 2 * pad;
  const pieceHeight = (bounds.maxY - bounds.minY) * scale + 2 * pad;
  const t: PageTransform = { scale, left: pieceLeft + pad, top: pieceTop + pad, minX: bounds.minX, maxY: bounds.maxY };

  const contentWidth = Math.max(gutter + pieceWidth, title.width, 60);
  const legendTop = pieceTop + pieceHeight + GAP;
  const key = legend(model, theme, MARGIN, legendTop, contentWidth);
  const barTop = legendTop + key.height + GAP;
  const bottom = options.scale === 'mm' ? barTop + SCALE_BAR_HEIGHT : legendTop + key.height;
  const width = round2(Math.max(contentWidth, key.width) + 2 * MARGIN);
  const height = round2(bottom + MARGIN);

  const items: Primitive[] = [];
  if (theme.background !== null) {
    items.push({
      kind: 'rect',
      id: 'ff-background',
      role: 'background',
      x: 0,
      y: 0,
      width,
      height,
      fill: theme.background,
      stroke: null,
      strokeWidth: 0,
      data: {},
    });
  }
  // Appended one by one: spreading a list of thousands of beads into push() puts them all on the stack.
  const add = (list: readonly Primitive[]): void => {
    for (const item of list) items.push(item);
  };
  add(cells(model, t, theme));
  add(seam(model, t, theme));
  const beadItems = beads(model, t, theme);
  add(beadItems);
  add(failures(model, t, theme));
  add(cues(model, t, theme));
  if (options.numbers) {
    add(unitNumbers(model, t, theme, model.layout.kind === 'round', beadClearance(beadItems, scale)));
  }
  add(rowNumbers(model, t, theme, pieceLeft));

  const diagnostics = [];
  if (options.thread !== undefined) {
    const overlay = threadOverlay(model, options.thread, t, theme, letterBoxes(beadItems));
    add(overlay.value);
    diagnostics.push(...overlay.diagnostics);
  }
  add(title.items);
  add(key.items);
  if (options.scale === 'mm') add(scaleBar(theme, MARGIN, barTop));

  return {
    value: {
      width,
      height,
      title: model.header.title,
      desc: description(model),
      theme: theme.name,
      fontFamily: FONT_FAMILY,
      glyphs: textOf(items),
      patterns: key.patterns,
      items,
    },
    diagnostics,
  };
}
