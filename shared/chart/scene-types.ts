/**
 * The chart scene: a flat list of drawing primitives in page millimetres
 * (x right, y DOWN, origin top left), with every number already rounded and
 * every colour already chosen. Both emitters (svg-text.ts, svg-dom.ts) lower
 * it through elements.ts and add nothing of their own.
 */
import type { ThemeName } from './themes.js';

/** What a primitive is on the chart; lowered to `class="ff-<role>"`. */
export type Role =
  | 'background'
  | 'cell'
  | 'bead-label'
  | 'cue'
  | 'row-number'
  | 'row-arrow'
  | 'unit-number'
  | 'seam'
  | 'failed'
  | 'thread'
  | 'thread-number'
  | 'legend-swatch'
  | 'legend-hatch'
  | 'legend-key'
  | 'legend-name'
  | 'legend-count'
  | 'title'
  | 'info'
  | 'scale-bar'
  | 'scale-label';

/** Extra `data-*` attributes, in a fixed order (unit, row, pass, kind, key). */
export interface DataAttrs {
  unit?: number;
  row?: number;
  pass?: number;
  kind?: string;
  key?: string;
}

/** A bead: a capsule centred at (x, y), turned `angle` degrees clockwise. */
export interface BeadPrim {
  kind: 'bead';
  id: string;
  bead: number;
  unit: number;
  row: number;
  x: number;
  y: number;
  angle: number;
  length: number;
  thickness: number;
  fill: string;
  stroke: string;
  strokeWidth: number;
  /** The short bead under a round increase, lying across its gap. */
  gap: boolean;
  /** Key letter in the colour of higher contrast; absent on beads too short to hold it. */
  label?: { text: string; color: string; size: number; x: number; y: number };
}

export interface TextPrim {
  kind: 'text';
  id: string;
  role: Role;
  x: number;
  /** Baseline. */
  y: number;
  size: number;
  text: string;
  color: string;
  anchor: 'start' | 'middle' | 'end';
  bold: boolean;
  /** An outline in the page's colour behind the glyphs, for text drawn over beads of any colour. */
  halo?: { color: string; width: number };
  data: DataAttrs;
}

export interface RectPrim {
  kind: 'rect';
  id: string;
  role: Role;
  x: number;
  y: number;
  width: number;
  height: number;
  /** A fill colour or the id of a pattern in `Scene.patterns`. */
  fill: string | { pattern: string };
  stroke: string | null;
  strokeWidth: number;
  data: DataAttrs;
}

export interface PathPrim {
  kind: 'path';
  id: string;
  role: Role;
  d: string;
  fill: string | null;
  stroke: string | null;
  strokeWidth: number;
  /** SVG dash array, e.g. "1 0.6"; absent for a solid line. */
  dash?: string;
  data: DataAttrs;
}

/** A filled shape with straight sides (cells, cues, arrowheads), lowered to `<polygon>`. */
export interface PolygonPrim {
  kind: 'polygon';
  id: string;
  role: Role;
  /** Page corners as x0, y0, x1, y1, ..., rounded like every other number. */
  points: number[];
  fill: string;
  data: DataAttrs;
}

export type Primitive = BeadPrim | TextPrim | RectPrim | PathPrim | PolygonPrim;

/** A hatch for the print theme's legend: lines in `d` repeated every `size` mm. */
export interface HatchPattern {
  id: string;
  size: number;
  d: string;
  stroke: string;
  strokeWidth: number;
}

export interface Scene {
  /** Page size in mm; the viewBox is `0 0 width height`. */
  width: number;
  height: number;
  title: string;
  desc: string;
  theme: ThemeName;
  /** CSS font-family list: the embedded font first, then a generic fallback. */
  fontFamily: string;
  /** Every character any text primitive uses, sorted, for the font subset. */
  glyphs: string;
  patterns: HatchPattern[];
  items: Primitive[];
}

export interface SceneOptions {
  theme?: ThemeName;
  /** Unit numbers in each cell. */
  numbers?: boolean;
  /** Row whose thread path is overlaid. */
  thread?: number;
  /** 'mm': true size, one unit side is the pattern's unit size in mm, plus a 1 cm scale bar. */
  scale?: 'mm';
}
