import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { ChartView } from '../../web/src/components/chart-view.js';
import { localTally } from '../../web/src/lib/compiled.js';
import { fitWidth, zoomAt, pan, reveal, reshape, MAX_ZOOM, type Box } from '../../web/src/lib/zoom.js';
import { beadInfo } from '../../web/src/lib/bead-info.js';
import { modelOf } from './helpers.js';

// Source: NOTATION.md section 8, a flat panel of n units by r rows has n(r+1) + r(n+1) beads.
const n = 3;
const r = 2;
const panel =
  'title: Chart Panel\ncolors:\n  A #f4f1ea chalk\n  B #2e6f8e deep teal\nrow 1: BBBB AAA BBB\nrow 2: AAA BB AA\n';

describe('chart view', () => {
  it('draws one element per bead, as many as the tally counts and the closed form gives', () => {
    const model = modelOf(panel);
    const { container } = render(<ChartView model={model} dark={false} />);
    const beads = container.querySelectorAll('[data-bead]');
    expect(beads).toHaveLength(n * (r + 1) + r * (n + 1));
    expect(beads).toHaveLength(localTally(model).beads);
    // The box has the chart's proportions before and after drawing, so nothing below it moves.
    const box = screen.getByTestId('chart');
    expect(box.style.aspectRatio).toMatch(/^\d+(\.\d+)? \/ \d+(\.\d+)?$/);
  });

  it('outlines the current unit’s beads, draws only its thread passes, and picks a unit from a clicked bead', () => {
    const model = modelOf(panel);
    const onPick = vi.fn();
    const current = model.rows[1]!.units[1]!;
    const { container } = render(<ChartView model={model} dark={false} current={current} onPick={onPick} />);
    const outlined = [...container.querySelectorAll('[data-bead].ff-highlight')].map((el) =>
      Number(el.getAttribute('data-bead')),
    );
    const picked = model.steps
      .find((s) => s.unit === current)!
      .actions.filter((a) => a.kind === 'pickup')
      .map((a) => a.bead);
    expect(outlined.sort()).toEqual([...picked].sort());
    const passes = model.thread.filter((p) => p.unit === current).length;
    expect(container.querySelectorAll('.ff-thread-overlay .ff-thread')).toHaveLength(passes);

    const bead = model.beads.find((b) => b.units[0] === model.rows[0]!.units[2])!;
    const el = container.querySelector(`[data-bead="${bead.id}"]`)!;
    fireEvent.pointerDown(el, { clientX: 5, clientY: 5 });
    fireEvent.pointerUp(el, { clientX: 5, clientY: 5 });
    expect(onPick).toHaveBeenCalledWith(bead.units[0]);
  });

  it('zooms with the buttons by changing the viewBox only', async () => {
    const model = modelOf(panel);
    const { container } = render(<ChartView model={model} dark={false} />);
    const svg = container.querySelector('svg')!;
    const before = svg.getAttribute('viewBox')!.split(' ').map(Number);
    const count = container.querySelectorAll('[data-bead]').length;
    await userEvent.click(screen.getByRole('button', { name: 'Zoom in' }));
    const after = svg.getAttribute('viewBox')!.split(' ').map(Number);
    expect(after[2]).toBeCloseTo(before[2]! / 1.25, 5);
    expect(container.querySelectorAll('[data-bead]')).toHaveLength(count);
    await userEvent.click(screen.getByRole('button', { name: 'Fit' }));
    expect(svg.getAttribute('viewBox')!.split(' ').map(Number)).toEqual(before);
  });

  describe('in a box held wider than the chart (a tall band under the height limit)', () => {
    // jsdom lays nothing out; the box is given the size a browser would, 800 by 400 px.
    const size = (name: 'clientWidth' | 'clientHeight', v: number) =>
      vi.spyOn(HTMLElement.prototype, name, 'get').mockReturnValue(v);
    afterEach(() => vi.restoreAllMocks());
    const band =
      'title: Tall Band\ncolors:\n  A #f4f1ea chalk\n  B #2e6f8e deep teal\nrow 1: BBBB AAA BBB\nrows 2-30: AAA BB AA\n';

    it('fits the chart to the box’s width at load, centred on the reader’s unit, and Fit comes back to it', async () => {
      size('clientWidth', 800);
      size('clientHeight', 400);
      const model = modelOf(band);
      const current = model.rows[0]!.units[1]!;
      const { container } = render(<ChartView model={model} dark={false} current={current} />);
      const svg = container.querySelector('svg')!;
      const [x, y, w, h] = svg.getAttribute('viewBox')!.split(' ').map(Number) as [number, number, number, number];
      const width = Number(svg.querySelector('.ff-background')!.getAttribute('width'));
      expect(x).toBe(0);
      expect(w).toBeCloseTo(width, 5);
      // The view has the box's shape, so nothing is letterboxed: 400 / 800.
      expect(h / w).toBeCloseTo(0.5, 5);
      // Row 1 is at the bottom of the chart: the view is scrolled there, not left at the title.
      expect(y).toBeGreaterThan(0);
      const unitBeads = [...container.querySelectorAll(`[data-bead][data-unit="${current}"]`)];
      expect(unitBeads.length).toBeGreaterThan(0);
      await userEvent.click(screen.getByRole('button', { name: 'Zoom in' }));
      await userEvent.click(screen.getByRole('button', { name: 'Fit' }));
      expect(svg.getAttribute('viewBox')).toBe(`${x} ${y} ${w} ${h}`);
      // Zooming out goes past the fit to the whole chart in view.
      for (let i = 0; i < 12; i++) await userEvent.click(screen.getByRole('button', { name: 'Zoom out' }));
      const whole = svg.getAttribute('viewBox')!.split(' ').map(Number);
      expect(whole[3]).toBeCloseTo(Number(svg.querySelector('.ff-background')!.getAttribute('height')), 5);
    });
  });

  it('picks the current unit with Enter on the chart, for a reader without a pointer', async () => {
    const model = modelOf(panel);
    const onPick = vi.fn();
    const current = model.rows[1]!.units[0]!;
    const { rerender } = render(<ChartView model={model} dark={false} current={current} onPick={onPick} />);
    // Where a pick is only a step (share links, the preview), Enter does nothing and the help does not offer it.
    screen.getByTestId('chart').focus();
    await userEvent.keyboard('{Enter}');
    expect(onPick).not.toHaveBeenCalled();
    expect(screen.queryByText(/Enter picks/)).toBeNull();
    rerender(<ChartView model={model} dark={false} current={current} onPick={onPick} enterPicks />);
    expect(screen.getByText(/Enter picks the current unit for a note/)).toBeTruthy();
    await userEvent.keyboard('{Enter}');
    expect(onPick).toHaveBeenCalledWith(current);
  });

  it('zooms with two fingers round their middle, and picks nothing when they lift', () => {
    // jsdom lays nothing out: the chart is given a 200 x 100 px box at the page's corner.
    vi.spyOn(Element.prototype, 'getBoundingClientRect').mockReturnValue(new DOMRect(0, 0, 200, 100));
    // jsdom has no PointerEvent; without one every pointer would have the same (absent) id.
    class TouchPointer extends MouseEvent {
      readonly pointerId: number;
      constructor(type: string, init: PointerEventInit = {}) {
        super(type, init);
        this.pointerId = init.pointerId ?? 0;
      }
    }
    vi.stubGlobal('PointerEvent', TouchPointer);
    const model = modelOf(panel);
    const onPick = vi.fn();
    const { container } = render(<ChartView model={model} dark={false} onPick={onPick} />);
    const svg = container.querySelector('svg')!;
    const before = svg.getAttribute('viewBox')!.split(' ').map(Number) as [number, number, number, number];
    const bead = container.querySelector('[data-bead]')!;
    fireEvent.pointerDown(bead, { pointerId: 1, clientX: 50, clientY: 50 });
    fireEvent.pointerDown(bead, { pointerId: 2, clientX: 150, clientY: 50 });
    // The fingers spread from 100 to 200 px apart: twice the zoom.
    fireEvent.pointerMove(bead, { pointerId: 2, clientX: 250, clientY: 50 });
    const after = svg.getAttribute('viewBox')!.split(' ').map(Number) as [number, number, number, number];
    expect(after[2]).toBeCloseTo(before[2] / 2, 5);
    // The middle between the fingers (100 px across, half the box) stays where it was on the chart.
    const middle = before[0] + 0.5 * before[2];
    expect(after[0] + 0.5 * after[2]).toBeCloseTo(middle, 5);
    fireEvent.pointerUp(bead, { pointerId: 2, clientX: 250, clientY: 50 });
    fireEvent.pointerUp(bead, { pointerId: 1, clientX: 50, clientY: 50 });
    expect(onPick).not.toHaveBeenCalled();
    vi.restoreAllMocks();
  });

  it('tells where a bead sits in each unit that holds it, and its colour', () => {
    const model = modelOf(panel);
    const shared = model.beads.find((b) => b.units.length === 2)!;
    const info = beadInfo(model, shared.id)!;
    expect(info.lines).toHaveLength(3);
    expect(info.lines[2]).toMatch(/^Colour [AB] (chalk|deep teal) \(#[0-9a-f]{6}\)$/);
  });
});

describe('zoom arithmetic', () => {
  const full: Box = { x: 0, y: 0, w: 200, h: 100 };
  it('keeps the point under the pointer fixed and stays inside the chart', () => {
    const z = zoomAt(full, full, 2, 50, 50);
    expect(z).toEqual({ x: 25, y: 25, w: 100, h: 50 });
    // The point at 50 was a quarter across the view before, and is a quarter across after: (50 - 25) / 100.
    expect((50 - z.x) / z.w).toBeCloseTo(50 / 200, 10);
    expect(zoomAt(full, full, 1000, 0, 0).w).toBeCloseTo(200 / MAX_ZOOM, 10);
    expect(zoomAt(full, full, 0.1, 0, 0)).toEqual(full);
    expect(pan(z, full, -1000, 0).x).toBe(0);
    expect(pan(z, full, 1000, 1000)).toEqual({ x: 100, y: 50, w: 100, h: 50 });
  });

  const tall: Box = { x: 0, y: 0, w: 100, h: 400 };
  it('fits the width of a tall chart into a wide box and centres on a point, inside the chart', () => {
    expect(fitWidth(tall, 0.5)).toEqual({ x: 0, y: 0, w: 100, h: 50 });
    expect(fitWidth(tall, 0.5, { x: 50, y: 200 })).toEqual({ x: 0, y: 175, w: 100, h: 50 });
    expect(fitWidth(tall, 0.5, { x: 50, y: 395 })).toEqual({ x: 0, y: 350, w: 100, h: 50 });
    // A box taller than the chart's shape shows it whole, centred: a 100 x 200 view of a 200 x 100 chart.
    expect(fitWidth(full, 1)).toEqual({ x: 0, y: -50, w: 200, h: 200 });
    // Zooming out stops with the whole height in view: 400 / 0.5 = 800 wide, centred.
    expect(zoomAt(fitWidth(tall, 0.5), tall, 0.001, 50, 25)).toEqual({ x: -350, y: 0, w: 800, h: 400 });
  });

  it('pans only when the point leaves the middle of the view, and keeps the width when the box changes shape', () => {
    const view = fitWidth(tall, 0.5);
    expect(reveal(view, tall, { x: 50, y: 25 })).toBe(view);
    expect(reveal(view, tall, { x: 50, y: 300 })).toEqual({ x: 0, y: 275, w: 100, h: 50 });
    expect(reshape(view, tall, 1)).toEqual({ x: 0, y: 0, w: 100, h: 100 });
  });
});
