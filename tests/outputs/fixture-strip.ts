/**
 * A hand-built model of `row 1: ABCD BCA` (the first two units of NOTATION.md
 * section 4's worked check), written out bead by bead so the output tests do
 * not depend on the engine: unit 1 lays far A, top B, near C, base D and
 * closes through A; unit 2 goes backward from its top|near corner, lays top B,
 * far C, base A and closes through the shared bead.
 *
 * Junctions: 0 (0,0) 1 (1,0) 2 (1,1) 3 (0,1) 4 (2,0) 5 (2,1).
 */
import type { Bead, Model, Place, ThreadPass } from '../../shared/model.js';

const src = { line: 11, column: 8, endLine: 11, endColumn: 12 };

function bead(
  id: number,
  color: string,
  units: number[],
  places: Place[],
  j: [number, number],
  x: number,
  y: number,
  angle: number,
): Bead {
  return { id, color, units, places, junctions: j, x, y, angle, length: 0.8 };
}

export function stripModel(): Model {
  const beads: Bead[] = [
    bead(0, 'A', [0, 1], ['far', 'near'], [1, 2], 1, 0.5, 90),
    bead(1, 'B', [0], ['top'], [2, 3], 0.5, 1, 0),
    bead(2, 'C', [0], ['near'], [3, 0], 0, 0.5, 90),
    bead(3, 'D', [0], ['base'], [0, 1], 0.5, 0, 0),
    bead(4, 'B', [1], ['top'], [2, 5], 1.5, 1, 0),
    bead(5, 'C', [1], ['far'], [5, 4], 2, 0.5, 90),
    bead(6, 'A', [1], ['base'], [4, 1], 1.5, 0, 0),
  ];
  const pass = (b: number, unit: number, kind: ThreadPass['kind'], from: number, to: number): ThreadPass => ({
    bead: b,
    unit,
    kind,
    from,
    to,
  });
  const thread: ThreadPass[] = [
    pass(0, 0, 'pickup', 1, 2),
    pass(1, 0, 'pickup', 2, 3),
    pass(2, 0, 'pickup', 3, 0),
    pass(3, 0, 'pickup', 0, 1),
    pass(0, 0, 'close', 1, 2),
    pass(4, 1, 'pickup', 2, 5),
    pass(5, 1, 'pickup', 5, 4),
    pass(6, 1, 'pickup', 4, 1),
    pass(0, 1, 'close', 1, 2),
  ];
  return {
    schema: 'fourfold.model/1',
    header: {
      title: 'Two <Units> & Co',
      designer: 'Ines Marlow',
      beads: { size: '11/0', shape: 'round' },
      layout: 'flat',
      order: 'pickup',
      notes: ['Keep the tension firm.'],
    },
    palette: [
      { key: 'A', hex: '#f4f1ea', name: 'chalk' },
      { key: 'B', hex: '#2e6f8e', name: 'deep teal' },
      { key: 'C', hex: '#c98b2b', name: 'honey' },
      { key: 'D', hex: '#7a2e3b', name: 'garnet "dark"' },
      { key: 'E', hex: '#000000', name: 'unused' },
    ],
    layout: {
      kind: 'flat',
      bounds: { minX: 0, minY: 0, maxX: 2, maxY: 1 },
      beadMm: { diameter: 2.2, length: 1.6 },
      unitMm: 3.8,
      widthMm: 7.6,
      heightMm: 3.8,
    },
    rows: [{ row: 1, word: 'row', units: [0, 1], beads: 7, heading: 'right', notes: ['Leave a long tail.'], line: 11 }],
    units: [
      {
        id: 0,
        row: 1,
        index: 1,
        mark: '',
        places: { base: 3, far: 0, top: 1, near: 2 },
        x: 0.5,
        y: 0.5,
        angle: 0,
        direction: 'forward',
        startCorner: 'base|far',
        source: src,
      },
      {
        id: 1,
        row: 1,
        index: 2,
        mark: '',
        places: { base: 6, far: 5, top: 4, near: 0 },
        x: 1.5,
        y: 0.5,
        angle: 0,
        direction: 'backward',
        startCorner: 'top|near',
        source: { ...src, column: 13, endColumn: 16 },
      },
    ],
    beads,
    junctions: [
      { id: 0, x: 0, y: 0 },
      { id: 1, x: 1, y: 0 },
      { id: 2, x: 1, y: 1 },
      { id: 3, x: 0, y: 1 },
      { id: 4, x: 2, y: 0 },
      { id: 5, x: 2, y: 1 },
    ],
    thread,
    steps: [
      {
        unit: 0,
        direction: 'forward',
        startCorner: 'base|far',
        firstPlace: 'far',
        cue: true,
        actions: [
          { kind: 'pickup', bead: 0, place: 'far' },
          { kind: 'pickup', bead: 1, place: 'top' },
          { kind: 'pickup', bead: 2, place: 'near' },
          { kind: 'pickup', bead: 3, place: 'base' },
          { kind: 'pass', bead: 0, place: 'far' },
        ],
        moveOn: [],
      },
      {
        unit: 1,
        direction: 'backward',
        startCorner: 'top|near',
        firstPlace: 'top',
        cue: true,
        actions: [
          { kind: 'pickup', bead: 4, place: 'top' },
          { kind: 'pickup', bead: 5, place: 'far' },
          { kind: 'pickup', bead: 6, place: 'base' },
          { kind: 'pass', bead: 0, place: 'near' },
        ],
        moveOn: [],
      },
    ],
    diagnostics: [],
  };
}
