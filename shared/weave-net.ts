/**
 * The bead net's shape, shared by the stages that build and read it. Places
 * and corners are small integers so the whole net is numbers in arrays:
 * place 0 base, 1 far, 2 top, 3 near; corner k sits between place k and place
 * k+1 (0 base|far, 1 far|top, 2 top|near, 3 near|base). The bead at place p
 * runs from corner p-1 to corner p.
 */
import type { SourceRange } from './diagnostic.js';
import type { KeyOrder, Layout, Mark } from '../parser/ast.js';

export const BASE = 0;
export const FAR = 1;
export const TOP = 2;
export const NEAR = 3;

export interface WeaveUnit {
  row: number;
  /** 1-based position among the units of its row, in the order of work. */
  index: number;
  mark: Mark;
  keys: string;
  range: SourceRange;
  /** Its id: its beads and corners are at 4 * id + place (or corner) in the net's unit arrays. */
  id: number;
  /** Bit p is set when place p holds a bead placed by an earlier unit. */
  shared: number;
  failed: boolean;
  /** Grid column (flat and tube) and the row's heading on the grid (+1 right, -1 left). */
  col: number;
  heading: 1 | -1;
  /** 0-based position of the unit's row among the built rows. */
  rowIndex: number;
}

export interface WeaveRow {
  row: number;
  word: 'row' | 'round';
  units: number[];
  heading: 'right' | 'left' | 'around';
  notes: string[];
  line: number;
}

export interface Weave {
  layout: Layout;
  order: KeyOrder;
  units: WeaveUnit[];
  rows: WeaveRow[];
  /** Bead at each place (base, far, top, near) of each unit, four a unit; -1 where there is none. */
  unitBeads: number[];
  /** Junction at each corner (base|far, far|top, top|near, near|base) of each unit, four a unit; -1 where none. */
  unitCorners: number[];
  /** Per bead: its two ends, the unit that picks it up and its place there, the unit that shares it (-1) and its place. */
  beadEnds: number[];
  beadOwner: number[];
  beadOwnerPlace: number[];
  beadSharer: number[];
  beadSharerPlace: number[];
  junctionCount: number;
}

export const popcount = (mask: number): number =>
  (mask & 1) + ((mask >> 1) & 1) + ((mask >> 2) & 1) + ((mask >> 3) & 1);

/** The bead at place `p` of unit `u` (-1 for none). */
export const beadAt = (w: Weave, u: number, p: number): number => w.unitBeads[4 * u + p]!;
/** The junction at corner `k` of unit `u` (-1 for none). */
export const cornerAt = (w: Weave, u: number, k: number): number => w.unitCorners[4 * u + k]!;
