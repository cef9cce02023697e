/**
 * The two calls the chart view makes into shared/chart/svg-dom.ts: draw the
 * scene into the page, and lay one unit's thread passes over it. The font
 * comes from the app's own @fontsource files, so nothing is embedded here.
 */
import { drawScene, type ChartHandle } from '../../../shared/chart/svg-dom.js';
import type { Scene } from '../../../shared/chart/scene.js';

export function drawChart(host: HTMLElement, scene: Scene): ChartHandle {
  host.replaceChildren();
  const chart = drawScene(scene, host);
  // The page sizes the chart (the box keeps its aspect ratio); the mm size is for files.
  chart.svg.attr({ width: '100%', height: '100%' });
  return chart;
}

/**
 * The thread passes of one unit from a scene built with `thread: row`, as a
 * nested drawing in the chart's coordinates. Returns how to take it away.
 */
export function drawThread(chart: ChartHandle, threadScene: Scene, unit: number): () => void {
  const items = threadScene.items.filter(
    (p) =>
      (p.kind === 'path' || p.kind === 'text') &&
      (p.role === 'thread' || p.role === 'thread-number') &&
      p.data.unit === unit,
  );
  const overlay = drawScene({ ...threadScene, items, patterns: [] }, chart.svg);
  overlay.svg.attr({
    width: threadScene.width,
    height: threadScene.height,
    x: 0,
    y: 0,
    'aria-hidden': 'true',
    role: null,
    'aria-labelledby': null,
    class: 'ff-thread-overlay',
  });
  // The main chart already has the title and description; ids must stay unique.
  for (const el of overlay.svg.find('title, desc')) el.remove();
  return () => overlay.remove();
}
