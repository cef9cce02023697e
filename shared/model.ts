/**
 * The unit model: the `fourfold.model/1` JSON shape (NOTATION.md section 5).
 * Built by the weave engine (`weave.ts`, then `layout.ts`); read by tally,
 * steps, the chart scene, the server and the web app. Ids are dense integers
 * from 0 in build order, so they double as array indexes and stay stable for
 * the same input.
 *
 * Geometry is in unit sides (one unit is 1 x 1), x to the right and y UP
 * (row 1 at the bottom); the chart flips y when it draws.
 */
import type { Diagnostic } from './diagnostic.js';
import type { BeadShape, KeyOrder, Layout, Mark } from '../parser/ast.js';

export type Place = 'base' | 'far' | 'top' | 'near';
export type Corner = 'base|far' | 'far|top' | 'top|near' | 'near|base';
export type Direction = 'forward' | 'backward';

export interface Point {
  x: number;
  y: number;
}

export interface PaletteEntry {
  key: string;
  hex: string; // '#rrggbb'
  name: string;
}

export interface ModelHeader {
  title: string;
  designer?: string;
  beads: { size: string; shape: BeadShape };
  layout: Layout;
  order: KeyOrder;
  thread?: string;
  description?: string;
  license?: string;
  notes: string[];
}

export interface Junction {
  id: number;
  x: number;
  y: number;
}

export interface Bead {
  id: number;
  /** Colour key in the palette. */
  color: string;
  /** The unit that picked it up, then the unit that shares it (if any). */
  units: number[];
  /** The place it takes in each of `units`, same order. */
  places: Place[];
  /** Its two ends. Equal for the base bead of an increase in a round (a loop). */
  junctions: [number, number];
  /** Centre, angle in degrees counter-clockwise from +x, and drawn length, in unit sides. */
  x: number;
  y: number;
  angle: number;
  length: number;
  /** True for the short bead under a round increase that lies across a gap. */
  gap?: boolean;
}

export interface Unit {
  id: number;
  row: number;
  /** 1-based position in its row, in the order of work. */
  index: number;
  mark: Mark;
  /** Bead id at each place, or null where the place is empty (a failed unit). */
  places: Record<Place, number | null>;
  /** Centre of the cell and the angle of its base side (0 for flat and tube). */
  x: number;
  y: number;
  angle: number;
  direction: Direction;
  startCorner: Corner;
  /** Where the unit was written (for repeats, the unit inside the group). */
  source: { line: number; column: number; endLine: number; endColumn: number };
  /** The unit could not be built as written; a diagnostic says why. */
  failed?: boolean;
}

export type PassKind = 'pickup' | 'close' | 'position';

export interface ThreadPass {
  bead: number;
  /** The unit the pass belongs to; a `position` pass belongs to the unit the thread is leaving (its `moveOn`). */
  unit: number;
  kind: PassKind;
  /** The junction the thread enters the bead at and leaves it by. */
  from: number;
  to: number;
}

export interface StepAction {
  kind: 'pickup' | 'pass';
  bead: number;
  place: Place;
}

/** One per unit, so `steps[unit.id]` is that unit's step; a failed unit's step has no actions. */
export interface UnitStep {
  unit: number;
  direction: Direction;
  startCorner: Corner;
  /** Place of the first new bead. */
  firstPlace: Place;
  /** True when the unit's new beads are not all one colour, so the cue is shown. */
  cue: boolean;
  /** Going round: pick-ups and passes in thread order. */
  actions: StepAction[];
  /** Beads passed through to reach the next unit's start corner (empty for the last, and where the thread is already there). */
  moveOn: number[];
}

export interface RowInfo {
  row: number;
  word: 'row' | 'round';
  /** Unit ids in order of work. */
  units: number[];
  /** New beads picked up in this row. */
  beads: number;
  /** Which way the row runs on the chart: flat rows alternate; closed rows go round. */
  heading: 'right' | 'left' | 'around';
  notes: string[];
  line: number;
}

export interface LayoutInfo {
  kind: Layout;
  /** Bounding box of all junctions, in unit sides (a tube reaches to x = circumference). */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  /** Tube: x of the seam line on the unrolled chart (0; x = circumference is the same line). */
  seamX?: number;
  /** Round: radius of the centre opening, in unit sides. */
  centerRadius?: number;
  /** Bead size for this pattern (outside diameter, length along the hole), in mm. */
  beadMm: { diameter: number; length: number };
  /** One unit side in mm for this bead size, and the finished size. */
  unitMm: number;
  widthMm: number;
  heightMm: number;
}

export interface Model {
  schema: 'fourfold.model/1';
  header: ModelHeader;
  palette: PaletteEntry[];
  layout: LayoutInfo;
  rows: RowInfo[];
  units: Unit[];
  beads: Bead[];
  junctions: Junction[];
  thread: ThreadPass[];
  steps: UnitStep[];
  diagnostics: Diagnostic[];
}
