/**
 * A small hand-made model for scene tests that must not wait for the weave
 * engine: a flat strip of `n` units in row 1 with the geometry NOTATION.md
 * section 5 describes (unit squares on a grid, y up). Colours cycle through
 * the palette so neighbouring beads differ. Not a weave engine: the thread
 * and the steps are only as detailed as the chart needs.
 */
import type { Bead, Junction, Model, Place, ThreadPass, Unit, UnitStep } from '../../shared/model.js';

const range = { line: 1, column: 1, endLine: 1, endColumn: 1 };

export function stripModel(
  n: number,
  palette: Array<[string, string, string]> = [
    ['A', '#f4f1ea', 'chalk'],
    ['B', '#2e6f8e', 'deep teal'],
    ['C', '#c98b2b', 'honey'],
  ],
): Model {
  const junctions: Junction[] = [];
  for (let i = 0; i <= n; i++) junctions.push({ id: 2 * i, x: i, y: 0 }, { id: 2 * i + 1, x: i, y: 1 });
  const beads: Bead[] = [];
  const units: Unit[] = [];
  const steps: UnitStep[] = [];
  const thread: ThreadPass[] = [];
  const add = (unit: number, place: Place, a: number, b: number): number => {
    const ja = junctions[a]!;
    const jb = junctions[b]!;
    const id = beads.length;
    const horizontal = ja.y === jb.y;
    beads.push({
      id,
      color: palette[id % palette.length]![0],
      units: [unit],
      places: [place],
      junctions: [a, b],
      x: (ja.x + jb.x) / 2,
      y: (ja.y + jb.y) / 2,
      angle: horizontal ? 0 : 90,
      length: 0.8,
    });
    thread.push({ bead: id, unit, kind: 'pickup', from: a, to: b });
    return id;
  };
  let near = -1;
  for (let i = 0; i < n; i++) {
    const first = near < 0;
    if (first) near = add(i, 'near', 2 * i, 2 * i + 1);
    else {
      beads[near]!.units.push(i);
      beads[near]!.places.push('near');
    }
    const far = add(i, 'far', 2 * i + 2, 2 * i + 3);
    const top = add(i, 'top', 2 * i + 3, 2 * i + 1);
    const base = add(i, 'base', 2 * i, 2 * i + 2);
    thread.push({ bead: far, unit: i, kind: 'close', from: 2 * i + 2, to: 2 * i + 3 });
    units.push({
      id: i,
      row: 1,
      index: i + 1,
      mark: '',
      places: { base, far, top, near },
      x: i + 0.5,
      y: 0.5,
      angle: 0,
      direction: 'forward',
      startCorner: 'base|far',
      source: range,
    });
    steps.push({
      unit: i,
      direction: 'forward',
      startCorner: 'base|far',
      firstPlace: 'far',
      cue: true,
      actions: [],
      moveOn: [],
    });
    near = far;
  }
  return {
    schema: 'fourfold.model/1',
    header: {
      title: 'Test Strip',
      designer: 'Oriel Vance',
      beads: { size: '11/0', shape: 'round' },
      layout: 'flat',
      order: 'pickup',
      notes: [],
    },
    palette: palette.map(([key, hex, name]) => ({ key, hex, name })),
    layout: {
      kind: 'flat',
      bounds: { minX: 0, minY: 0, maxX: n, maxY: 1 },
      beadMm: { diameter: 2.2, length: 1.6 },
      unitMm: 2.6,
      widthMm: 2.6 * n,
      heightMm: 2.6,
    },
    rows: [
      { row: 1, word: 'row', units: units.map((u) => u.id), beads: beads.length, heading: 'right', notes: [], line: 1 },
    ],
    units,
    beads,
    junctions,
    thread,
    steps,
    diagnostics: [],
  };
}
