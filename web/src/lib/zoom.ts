/**
 * Zoom and pan by moving the chart's viewBox: the drawing is never redrawn,
 * so a 5,000-bead chart pans as smoothly as a small one. The view keeps the
 * shape of the box on the page (its height over its width, `aspect`), which
 * may be wider than the chart when the box is held to the screen's height.
 */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface Point {
  x: number;
  y: number;
}

export const MAX_ZOOM = 16;

/**
 * The chart across the box's whole width: a tall band is shown at a size one
 * can read and panned up and down, centred on `at` (the reader's unit) or
 * from the top. A chart wider than the box's shape is shown whole, centred.
 */
export function fitWidth(full: Box, aspect: number, at?: Point): Box {
  const w = full.w;
  const h = w * aspect;
  return clamp({ x: full.x, y: at ? at.y - h / 2 : full.y, w, h }, full);
}

/**
 * Zoom by `factor` (> 1 zooms in) keeping the point (px, py) in box units
 * where it is on screen; out no further than the whole chart in view.
 */
export function zoomAt(box: Box, full: Box, factor: number, px: number, py: number): Box {
  const aspect = box.h / box.w;
  const widest = Math.max(full.w, full.h / aspect);
  const w = Math.min(widest, Math.max(full.w / MAX_ZOOM, box.w / factor));
  const h = w * aspect;
  return clamp({ x: px - ((px - box.x) * w) / box.w, y: py - ((py - box.y) * h) / box.h, w, h }, full);
}

export function pan(box: Box, full: Box, dx: number, dy: number): Box {
  return clamp({ ...box, x: box.x + dx, y: box.y + dy }, full);
}

/** The same view in a box of another shape (the window was resized): the width and the top left stay. */
export const reshape = (box: Box, full: Box, aspect: number): Box => clamp({ ...box, h: box.w * aspect }, full);

/** Pans just enough to bring `p` back into the middle when it is near or past an edge; otherwise the view stays. */
export function reveal(box: Box, full: Box, p: Point): Box {
  const inside = (v: number, start: number, size: number) => v >= start + size * 0.1 && v <= start + size * 0.9;
  if (inside(p.x, box.x, box.w) && inside(p.y, box.y, box.h)) return box;
  return clamp({ ...box, x: p.x - box.w / 2, y: p.y - box.h / 2 }, full);
}

/** Keep the view inside the chart, so a reader cannot lose it off the edge; a view larger than the chart centres it. */
export function clamp(box: Box, full: Box): Box {
  const axis = (start: number, size: number, fullStart: number, fullSize: number) =>
    size >= fullSize
      ? fullStart + (fullSize - size) / 2
      : Math.min(fullStart + fullSize - size, Math.max(fullStart, start));
  return { ...box, x: axis(box.x, box.w, full.x, full.w), y: axis(box.y, box.h, full.y, full.h) };
}

export const boxText = (b: Box): string => `${b.x} ${b.y} ${b.w} ${b.h}`;
