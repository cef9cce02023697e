/**
 * The interactive chart: the shared scene drawn with svg.js (shared/chart/
 * svg-dom.ts), zoom and pan on the viewBox, a hover card for any bead, the
 * current unit's new beads outlined and its thread path drawn over it, and
 * units with open notes marked. The box keeps the chart's aspect ratio before
 * anything is drawn, so nothing below it moves when it appears.
 */
import { useEffect, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import type { Model } from '../../../shared/model.js';
import { buildScene, type Scene } from '../../../shared/chart/scene.js';
import type { ChartHandle } from '../../../shared/chart/svg-dom.js';
import { drawChart, drawThread } from '../lib/draw-chart.js';
import { boxText, fitWidth, pan, reshape, reveal, zoomAt, type Box, type Point } from '../lib/zoom.js';
import { beadInfo, type BeadInfo } from '../lib/bead-info.js';

export interface ChartViewProps {
  model: Model;
  dark: boolean;
  /** The unit whose new beads are outlined and whose thread path is drawn. */
  current?: number;
  /** Units with open notes. */
  noted?: readonly number[];
  onPick?(unitId: number): void;
  /** Enter on the chart picks the current unit: said in the help only where a pick means more than a step (notes). */
  enterPicks?: boolean;
}

/** The middle of a unit's beads in chart units, to keep the reader's unit in view. */
function unitCentre(scene: Scene, unit: number | undefined): Point | undefined {
  if (unit === undefined) return undefined;
  const beads = scene.items.flatMap((p) => (p.kind === 'bead' && p.unit === unit ? [p] : []));
  if (!beads.length) return undefined;
  return {
    x: beads.reduce((t, b) => t + b.x, 0) / beads.length,
    y: beads.reduce((t, b) => t + b.y, 0) / beads.length,
  };
}

export function ChartView({ model, dark, current, noted = [], onPick, enterPicks = false }: ChartViewProps) {
  const figure = useRef<HTMLElement>(null);
  const host = useRef<HTMLDivElement>(null);
  const chart = useRef<ChartHandle | null>(null);
  const drag = useRef<{ x: number; y: number; box: Box; moved: boolean } | null>(null);
  // Pointers down on the chart; two of them pinch: the spread between them zooms round their middle.
  const pointers = useRef(new Map<number, Point>());
  const pinch = useRef<{ spread: number; box: Box; at: Point } | null>(null);
  const pinched = useRef(false);
  const scene = useMemo(() => buildScene(model, { theme: dark ? 'dark' : 'light' }).value, [model, dark]);
  const full: Box = useMemo(() => ({ x: 0, y: 0, w: scene.width, h: scene.height }), [scene]);
  // The box's shape on the page (height over width); until it is measured, the chart's own, which the box reserves.
  const [measured, setMeasured] = useState<number | null>(null);
  const aspect = measured ?? scene.height / scene.width;
  const centre = useMemo(() => unitCentre(scene, current), [scene, current]);
  const fit = () => fitWidth(full, aspect, centre);
  const [box, setBox] = useState<Box>(fit);
  // True until the reader zooms or pans: a view still at its fit is fitted again when the box changes shape.
  const fitted = useRef(true);
  const [hover, setHover] = useState<{ info: BeadInfo; left: number; top: number } | null>(null);
  const currentRow = current === undefined ? undefined : model.units[current]?.row;
  const threadScene = useMemo(
    () =>
      currentRow === undefined ? null : buildScene(model, { theme: dark ? 'dark' : 'light', thread: currentRow }).value,
    [model, dark, currentRow],
  );

  useLayoutEffect(() => {
    const el = host.current;
    if (!el) return;
    const measure = () => {
      if (el.clientWidth > 0 && el.clientHeight > 0) setMeasured(el.clientHeight / el.clientWidth);
    };
    measure();
    const observer = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(measure);
    observer?.observe(el);
    return () => observer?.disconnect();
  }, []);

  useLayoutEffect(() => {
    if (!host.current) return;
    chart.current = drawChart(host.current, scene);
    fitted.current = true;
    return () => chart.current?.remove();
  }, [scene]);

  useLayoutEffect(() => {
    setBox((b) => (fitted.current ? fitWidth(full, aspect, centre) : reshape(b, full, aspect)));
    // The centre is read, not followed: stepping pans through `reveal` below instead of refitting.
  }, [full, aspect]);

  useLayoutEffect(() => {
    if (centre) setBox((b) => reveal(b, full, centre));
  }, [centre, full]);

  // Before paint, so the first frame already shows the fitted view.
  useLayoutEffect(() => {
    chart.current?.svg.attr('viewBox', boxText(box));
  }, [box, scene]);

  useEffect(() => {
    const c = chart.current;
    if (!c) return;
    c.highlightUnit(current ?? null);
    const notedSet = new Set(noted);
    for (const el of c.svg.node.querySelectorAll<SVGElement>('[data-bead]')) {
      const bead = model.beads[Number(el.dataset.bead)];
      el.classList.toggle('ff-noted', bead !== undefined && bead.units.some((u) => notedSet.has(u)));
    }
    return threadScene && current !== undefined ? drawThread(c, threadScene, current) : undefined;
  }, [scene, model, current, noted, threadScene]);

  const moveTo = (next: Box | ((b: Box) => Box)) => {
    fitted.current = false;
    setBox(next);
  };
  const refit = () => {
    fitted.current = true;
    setBox(fit());
  };
  const toChart = (clientX: number, clientY: number) => {
    const rect = chart.current!.svg.node.getBoundingClientRect();
    return {
      x: box.x + ((clientX - rect.left) / rect.width) * box.w,
      y: box.y + ((clientY - rect.top) / rect.height) * box.h,
    };
  };
  const zoom = (factor: number, at?: Point) =>
    moveTo((b) => zoomAt(b, full, factor, at?.x ?? b.x + b.w / 2, at?.y ?? b.y + b.h / 2));

  const spread = () => {
    const [a, b] = [...pointers.current.values()] as [Point, Point];
    return Math.hypot(a.x - b.x, a.y - b.y);
  };
  const onPointerDown = (e: PointerEvent) => {
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    if (pointers.current.size !== 2) {
      drag.current = { x: e.clientX, y: e.clientY, box, moved: false };
      return;
    }
    const [a, b] = [...pointers.current.values()] as [Point, Point];
    pinch.current = { spread: spread(), box, at: toChart((a.x + b.x) / 2, (a.y + b.y) / 2) };
    pinched.current = true;
    drag.current = null;
  };
  const release = (e: PointerEvent) => {
    pointers.current.delete(e.pointerId);
    if (pointers.current.size < 2) pinch.current = null;
  };
  const onPointerMove = (e: PointerEvent) => {
    if (pointers.current.has(e.pointerId)) pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    const p = pinch.current;
    if (p && pointers.current.size === 2) {
      const now = spread();
      if (now > 0 && p.spread > 0) moveTo(zoomAt(p.box, full, now / p.spread, p.at.x, p.at.y));
      return;
    }
    if (drag.current && chart.current) {
      const rect = chart.current.svg.node.getBoundingClientRect();
      const dx = ((drag.current.x - e.clientX) / rect.width) * drag.current.box.w;
      const dy = ((drag.current.y - e.clientY) / rect.height) * drag.current.box.h;
      if (Math.abs(e.clientX - drag.current.x) + Math.abs(e.clientY - drag.current.y) > 3) drag.current.moved = true;
      moveTo(pan(drag.current.box, full, dx, dy));
      return;
    }
    const el = (e.target as Element).closest?.('[data-bead]');
    const info = el ? beadInfo(model, Number(el.getAttribute('data-bead'))) : null;
    // The card is placed in the figure (which holds the toolbar too), just below and right of the pointer.
    const box = figure.current!.getBoundingClientRect();
    setHover(info ? { info, left: e.clientX - box.left + 12, top: e.clientY - box.top + 16 } : null);
  };
  const onPointerUp = (e: PointerEvent) => {
    release(e);
    // Lifting the fingers after a pinch picks nothing.
    const wasGesture = drag.current?.moved || pinched.current;
    if (pointers.current.size === 0) pinched.current = false;
    drag.current = null;
    if (wasGesture || !onPick) return;
    const el = (e.target as Element).closest?.('[data-bead]');
    const unit = el ? model.beads[Number(el.getAttribute('data-bead'))]?.units[0] : undefined;
    if (unit !== undefined) onPick(unit);
  };
  const onKeyDown = (e: KeyboardEvent) => {
    const stepX = box.w / 10;
    const stepY = box.h / 10;
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-stepX, 0],
      ArrowRight: [stepX, 0],
      ArrowUp: [0, -stepY],
      ArrowDown: [0, stepY],
    };
    if (e.key === '+' || e.key === '=') zoom(1.25);
    else if (e.key === '-') zoom(0.8);
    else if (e.key === '0') refit();
    else if (e.key === 'Enter' && enterPicks && current !== undefined && onPick) onPick(current);
    else if (e.shiftKey && moves[e.key]) moveTo((b) => pan(b, full, ...moves[e.key]!));
    else return;
    e.preventDefault();
  };

  return (
    <figure ref={figure} className="relative">
      <div className="no-print mb-2 flex flex-wrap gap-2" role="toolbar" aria-label="Chart zoom">
        <button type="button" className="btn" onClick={() => zoom(1.25)} aria-label="Zoom in">
          +
        </button>
        <button type="button" className="btn" onClick={() => zoom(0.8)} aria-label="Zoom out">
          −
        </button>
        <button type="button" className="btn" onClick={refit}>
          Fit
        </button>
        <span className="muted self-center text-xs">
          Drag to pan; pinch, wheel, + and − to zoom; on the chart, Shift+arrows pan
          {enterPicks ? ' and Enter picks the current unit for a note' : ''}.
        </span>
      </div>
      <div
        ref={host}
        tabIndex={0}
        role="img"
        aria-label={`Chart of ${scene.title}: ${scene.desc}`}
        data-testid="chart"
        className="chart-host relative w-full touch-none overflow-hidden rounded border border-slate-300 dark:border-slate-600"
        style={{ aspectRatio: `${scene.width} / ${scene.height}`, maxHeight: '75vh' }}
        onWheel={(e) => zoom(e.deltaY < 0 ? 1.15 : 1 / 1.15, toChart(e.clientX, e.clientY))}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerCancel={release}
        onPointerLeave={(e) => {
          release(e);
          drag.current = null;
          setHover(null);
        }}
        onKeyDown={onKeyDown}
      />
      {hover && (
        <div
          role="tooltip"
          data-testid="bead-tooltip"
          className="pointer-events-none absolute z-10 rounded border border-slate-400 bg-white p-2 text-xs shadow dark:bg-slate-800"
          style={{ left: hover.left, top: hover.top }}
        >
          {hover.info.lines.map((l) => (
            <p key={l}>{l}</p>
          ))}
        </div>
      )}
    </figure>
  );
}
