/**
 * Scene to a live SVG drawn with svg.js, for the web app's interactive
 * chart. The same walk as the text emitter's (elements.ts) drives it, so
 * the drawing holds the same elements, ids and attributes; a parity test
 * checks that on svgdom. The DOM comes from the container the caller passes.
 */
import { SVG, type Dom, type Svg } from '@svgdotjs/svg.js';
import {
  formatNumber,
  formatNumberList,
  ROOT_NAMES,
  rootValues,
  sceneChildren,
  type AttrValue,
  type EmbeddedFont,
  type SvgSink,
} from './elements.js';
import type { Scene } from './scene-types.js';

/** Added to every element of the highlighted unit (its cell, beads, cue and number). */
export const HIGHLIGHT_CLASS = 'ff-highlight';

export interface ChartHandle {
  svg: Svg;
  /** The element carrying `data-bead` for that bead id. */
  bead(id: number): Dom | null;
  /** Elements that belong to a unit (cell, beads it picked up, cue, number, failure mark). */
  unitElements(unit: number): Dom[];
  /** Marks one unit (or none, with null); the previous one is cleared. */
  highlightUnit(unit: number | null): void;
  remove(): void;
}

function setAttrs(el: Svg | Dom, names: readonly string[], values: readonly AttrValue[]): void {
  values.forEach((v, i) => {
    if (v !== undefined)
      el.attr(names[i]!, typeof v === 'number' ? formatNumber(v) : typeof v === 'string' ? v : formatNumberList(v));
  });
}

/** Builds the walk as svg.js elements under the root, in the same order and with the same attributes. */
function domSink(root: Svg): SvgSink {
  const stack: Array<Svg | Dom> = [root];
  const top = (): Svg | Dom => stack[stack.length - 1]!;
  return {
    element(tag, names, values, text) {
      const el = top().element(tag);
      setAttrs(el, names, values);
      if (text !== undefined) el.words(text);
    },
    open(tag, names, values) {
      const el = top().element(tag);
      setAttrs(el, names, values);
      stack.push(el);
    },
    close: () => void stack.pop(),
  };
}

export function drawScene(
  scene: Scene,
  container: Parameters<Svg['addTo']>[0],
  fonts: readonly EmbeddedFont[] = [],
): ChartHandle {
  const svg = SVG().addTo(container);
  // svg.js declares its own namespaces on a new root; the chart uses none of them.
  svg.attr('xmlns:svgjs', null).attr('xmlns:xlink', null).attr('version', null);
  setAttrs(svg, ROOT_NAMES, rootValues(scene));
  sceneChildren(domSink(svg), scene, fonts);

  const query = (selector: string): Dom[] => svg.find(selector).map((el) => el as Dom);
  let highlighted: number | null = null;
  const unitElements = (unit: number): Dom[] => query(`[data-unit="${unit}"]`);

  return {
    svg,
    bead: (id) => query(`[data-bead="${id}"]`)[0] ?? null,
    unitElements,
    highlightUnit(unit) {
      if (highlighted !== null) for (const el of unitElements(highlighted)) el.removeClass(HIGHLIGHT_CLASS);
      highlighted = unit;
      if (unit !== null) for (const el of unitElements(unit)) el.addClass(HIGHLIGHT_CLASS);
    },
    remove: () => void svg.remove(),
  };
}
