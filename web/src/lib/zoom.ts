/**
 * Zoom and pan by moving the chart's viewBox: the drawing is never redrawn,
 * so a 5,000-bead chart pans as smoothly as a small one.
 */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export const MIN_ZOOM = 1;
export const MAX_ZOOM = 16;

/** Zoom by `factor` (> 1 zooms in) keeping the point (px, py) in box units where it is on screen. */
export function zoomAt(box: Box, full: Box, factor: number, px: number, py: number): Box {
  const scale = full.w / box.w;
  const next = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, scale * factor));
  const w = full.w / next;
  const h = full.h / next;
  return clamp({ x: px - ((px - box.x) * w) / box.w, y: py - ((py - box.y) * h) / box.h, w, h }, full);
}

export function pan(box: Box, full: Box, dx: number, dy: number): Box {
  return clamp({ ...box, x: box.x + dx, y: box.y + dy }, full);
}

/** Keep the view inside the chart, so a reader cannot lose it off the edge. */
export function clamp(box: Box, full: Box): Box {
  return {
    ...box,
    x: Math.min(full.x + full.w - box.w, Math.max(full.x, box.x)),
    y: Math.min(full.y + full.h - box.h, Math.max(full.y, box.y)),
  };
}

export const boxText = (b: Box): string => `${b.x} ${b.y} ${b.w} ${b.h}`;
