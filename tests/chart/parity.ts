/**
 * Draws a scene with svg.js on svgdom (pinned 0.1.24) in Node, as the web app
 * does in the browser, and returns the markup of the drawn root.
 */
import { registerWindow } from '@svgdotjs/svg.js';
import { createSVGWindow } from 'svgdom';
import type { EmbeddedFont } from '../../shared/chart/elements.js';
import type { Scene } from '../../shared/chart/scene-types.js';
import { drawScene, type ChartHandle } from '../../shared/chart/svg-dom.js';

const window = createSVGWindow();
registerWindow(window, window.document);

export function drawOnSvgdom(
  scene: Scene,
  fonts: readonly EmbeddedFont[] = [],
): { markup: string; handle: ChartHandle } {
  const handle = drawScene(scene, window.document.documentElement, fonts);
  return { markup: handle.svg.node.outerHTML as string, handle };
}
