/**
 * Scene to SVG elements: tags and attributes in a fixed order. Both emitters
 * are driven by this one walk (they differ only in the sink that receives
 * it), which is how the text output and the svg.js drawing stay the same
 * chart. The walk builds no tree of its own: a 5,000-bead chart would
 * otherwise allocate tens of thousands of short-lived arrays.
 *
 * The bulk of a chart (cells, beads, their key letters, cues, unit numbers)
 * is drawn in one group per kind: the attributes an SVG child inherits
 * (fill, stroke, font settings) are written once on the group, and a child
 * repeats one only where its own value differs. That halves a large chart's
 * size without changing a pixel.
 */
import { round2, round2Text } from './geometry.js';
import type {
  BeadPrim,
  DataAttrs,
  HatchPattern,
  PathPrim,
  PolygonPrim,
  Primitive,
  RectPrim,
  Scene,
  TextPrim,
} from './scene-types.js';

/** Numbers written as one attribute: polygon corners `x,y x,y ...`, or a turn `rotate(a x y)`. */
export interface NumberList {
  form: 'points' | 'rotate';
  numbers: readonly number[];
}

/** An attribute value; undefined leaves the attribute out. */
export type AttrValue = string | number | NumberList | undefined;

/**
 * What an emitter does with the walk. `element` is one whole element with
 * its attributes (names from a fixed list per kind of element, values in
 * the same order) and optional text; `open`/`close` wrap elements that hold
 * others. A sink reads `values` before it returns: the walk fills the same
 * arrays again for the next element.
 */
export interface SvgSink {
  element(tag: string, names: readonly string[], values: readonly AttrValue[], text?: string): void;
  open(tag: string, names: readonly string[], values: readonly AttrValue[]): void;
  close(tag: string): void;
}

/** A scene number (already rounded to 2 decimals) as text: the same digits as `String(n)` gives. */
export function formatNumber(n: number): string {
  const cents = Math.round(n * 100);
  return Number.isSafeInteger(cents) && Math.abs(n * 100 - cents) <= 1e-6 ? round2Text(n) : String(n);
}

/** A number list as attribute text, for sinks that set strings. */
export function formatNumberList(list: NumberList): string {
  const n = list.numbers.map(formatNumber);
  if (list.form === 'rotate') return `rotate(${n.join(' ')})`;
  const pairs: string[] = [];
  for (let i = 0; i < n.length; i += 2) pairs.push(`${n[i]},${n[i + 1]}`);
  return pairs.join(' ');
}

/** One embedded font face: a subset of the bundled font, base64-encoded by the caller. */
export interface EmbeddedFont {
  family: string;
  weight: 400 | 700;
  /** TrueType: subsetting to it is fast, and every SVG viewer reads it. */
  base64: string;
}

const DATA_NAMES = ['data-unit', 'data-row', 'data-pass', 'data-kind', 'data-key'] as const;

/** Fills `values` from index `at` with the data attributes, in DATA_NAMES order. */
function putData(values: AttrValue[], at: number, d: DataAttrs): AttrValue[] {
  values[at] = d.unit;
  values[at + 1] = d.row;
  values[at + 2] = d.pass;
  values[at + 3] = d.kind;
  values[at + 4] = d.key;
  return values;
}

/** `ff-<role>`, made once per role rather than once per element. */
const classes = new Map<string, string>();
const classOf = (role: string): string => {
  let c = classes.get(role);
  if (c === undefined) classes.set(role, (c = `ff-${role}`));
  return c;
};

/** What a group writes for its children; a child leaves out what equals it. */
interface Inherited {
  fill?: string;
  stroke?: string;
  strokeWidth?: number;
  size?: number;
  anchor?: TextPrim['anchor'];
  bold?: boolean;
}
const NOTHING: Inherited = {};
const own = <T>(value: T, inherited: T | undefined): T | undefined => (value === inherited ? undefined : value);

const GROUP_NAMES = ['class', 'fill', 'stroke', 'stroke-width', 'font-size', 'text-anchor', 'font-weight'];

function group(sink: SvgSink, role: string, inherited: Inherited): void {
  sink.open('g', GROUP_NAMES, [
    classOf(role),
    inherited.fill,
    inherited.stroke,
    inherited.strokeWidth,
    inherited.size,
    inherited.anchor,
    inherited.bold ? 'bold' : undefined,
  ]);
}

const TEXT_NAMES = [
  'id',
  'class',
  'x',
  'y',
  'font-size',
  'fill',
  'text-anchor',
  'font-weight',
  'stroke',
  'stroke-width',
  'stroke-linejoin',
  'paint-order',
  ...DATA_NAMES,
];
const textValues: AttrValue[] = [];

function text(sink: SvgSink, p: TextPrim, inherited: Inherited): void {
  const grouped = inherited !== NOTHING;
  const v = textValues;
  v[0] = p.id;
  v[1] = grouped ? undefined : classOf(p.role);
  v[2] = p.x;
  v[3] = p.y;
  v[4] = own(p.size, inherited.size);
  v[5] = own(p.color, inherited.fill);
  v[6] = own(p.anchor, inherited.anchor ?? 'start');
  v[7] = p.bold === (inherited.bold ?? false) ? undefined : p.bold ? 'bold' : 'normal';
  const halo = p.halo;
  v[8] = halo?.color;
  v[9] = halo?.width;
  v[10] = halo && 'round';
  // The outline is painted first, so it widens the glyphs' edge without eating into them.
  v[11] = halo && 'stroke';
  sink.element('text', TEXT_NAMES, putData(v, 12, p.data), p.text);
}

const BEAD_NAMES = [
  'id',
  'class',
  'x',
  'y',
  'width',
  'height',
  'rx',
  'transform',
  'fill',
  'stroke',
  'stroke-width',
  'data-bead',
  'data-unit',
  'data-row',
];
const beadValues: AttrValue[] = [];
const turn: { form: 'rotate'; numbers: number[] } = { form: 'rotate', numbers: [0, 0, 0] };

function bead(sink: SvgSink, p: BeadPrim, inherited: Inherited): void {
  const v = beadValues;
  v[0] = p.id;
  v[1] = p.gap ? 'ff-gap' : undefined;
  v[2] = round2(p.x - p.length / 2);
  v[3] = round2(p.y - p.thickness / 2);
  v[4] = p.length;
  v[5] = p.thickness;
  v[6] = round2(Math.min(p.thickness, p.length) / 2);
  if (p.angle === 0) v[7] = undefined;
  else {
    turn.numbers[0] = p.angle;
    turn.numbers[1] = p.x;
    turn.numbers[2] = p.y;
    v[7] = turn;
  }
  v[8] = p.fill;
  v[9] = own(p.stroke, inherited.stroke);
  v[10] = own(p.strokeWidth, inherited.strokeWidth);
  v[11] = p.bead;
  v[12] = p.unit;
  v[13] = p.row;
  sink.element('rect', BEAD_NAMES, v);
}

/** A key letter belongs to the capsule before it in the document order of its group; it needs no id. */
const LABEL_NAMES = ['x', 'y', 'font-size', 'fill'];
const labelValues: AttrValue[] = [];

function beadLabel(sink: SvgSink, p: BeadPrim, inherited: Inherited): void {
  const { label } = p;
  if (!label) return;
  const v = labelValues;
  v[0] = label.x;
  v[1] = label.y;
  v[2] = own(label.size, inherited.size);
  v[3] = label.color;
  sink.element('text', LABEL_NAMES, v, label.text);
}

const RECT_NAMES = ['id', 'class', 'x', 'y', 'width', 'height', 'fill', 'stroke', 'stroke-width', ...DATA_NAMES];
const rectValues: AttrValue[] = [];

function rect(sink: SvgSink, p: RectPrim): void {
  const v = rectValues;
  const stroke = p.stroke ?? undefined;
  v[0] = p.id;
  v[1] = classOf(p.role);
  v[2] = p.x;
  v[3] = p.y;
  v[4] = p.width;
  v[5] = p.height;
  v[6] = typeof p.fill === 'string' ? p.fill : `url(#${p.fill.pattern})`;
  v[7] = stroke;
  v[8] = stroke === undefined ? undefined : p.strokeWidth;
  sink.element('rect', RECT_NAMES, putData(v, 9, p.data));
}

const PATH_NAMES = [
  'id',
  'class',
  'd',
  'fill',
  'stroke',
  'stroke-width',
  'stroke-dasharray',
  'stroke-linecap',
  ...DATA_NAMES,
];
const pathValues: AttrValue[] = [];

function path(sink: SvgSink, p: PathPrim): void {
  const v = pathValues;
  const stroke = p.stroke ?? undefined;
  v[0] = p.id;
  v[1] = classOf(p.role);
  v[2] = p.d;
  v[3] = p.fill ?? 'none';
  v[4] = stroke;
  v[5] = stroke === undefined ? undefined : p.strokeWidth;
  v[6] = p.dash;
  v[7] = stroke !== undefined && p.fill === null ? 'round' : undefined;
  sink.element('path', PATH_NAMES, putData(v, 8, p.data));
}

const POLYGON_NAMES = ['id', 'class', 'points', 'fill', ...DATA_NAMES];
const polygonValues: AttrValue[] = [];
const corners = { form: 'points' as const, numbers: [] as readonly number[] };

function polygon(sink: SvgSink, p: PolygonPrim, inherited: Inherited): void {
  const v = polygonValues;
  corners.numbers = p.points;
  v[0] = p.id;
  v[1] = inherited === NOTHING ? classOf(p.role) : undefined;
  v[2] = corners;
  v[3] = own(p.fill, inherited.fill);
  sink.element('polygon', POLYGON_NAMES, putData(v, 4, p.data));
}

function primitive(sink: SvgSink, p: Primitive, inherited: Inherited): void {
  switch (p.kind) {
    case 'bead':
      return bead(sink, p, inherited);
    case 'text':
      return text(sink, p, inherited);
    case 'rect':
      return rect(sink, p);
    case 'path':
      return path(sink, p);
    case 'polygon':
      return polygon(sink, p, inherited);
  }
}

/** The roles drawn in a group, with what the group's first child gives it to pass on. */
const GROUPED = new Map<string, (first: Primitive) => Inherited>([
  ['cell', (p) => ({ fill: (p as PolygonPrim).fill })],
  ['cue', (p) => ({ fill: (p as PolygonPrim).fill })],
  ['bead', (p) => ({ stroke: (p as BeadPrim).stroke, strokeWidth: (p as BeadPrim).strokeWidth })],
  [
    'unit-number',
    (p) => {
      const t = p as TextPrim;
      return { fill: t.color, size: t.size, anchor: t.anchor, bold: t.bold };
    },
  ],
]);

const groupOf = (p: Primitive): string => (p.kind === 'bead' ? 'bead' : p.role);

/**
 * A run of beads: the capsules, then their key letters in a group of their
 * own, so no neighbouring capsule's end is ever drawn over a letter.
 */
function beadRun(sink: SvgSink, items: readonly Primitive[], from: number, to: number, inherited: Inherited): void {
  group(sink, 'beads', inherited);
  for (let i = from; i < to; i++) bead(sink, items[i] as BeadPrim, inherited);
  sink.close('g');
  let first: BeadPrim | undefined;
  for (let i = from; i < to && first === undefined; i++) if ((items[i] as BeadPrim).label) first = items[i] as BeadPrim;
  if (first === undefined) return;
  const labels: Inherited = { size: first.label!.size, anchor: 'middle', bold: true };
  group(sink, 'bead-labels', labels);
  for (let i = from; i < to; i++) beadLabel(sink, items[i] as BeadPrim, labels);
  sink.close('g');
}

function items(sink: SvgSink, list: readonly Primitive[]): void {
  for (let i = 0; i < list.length;) {
    const first = list[i]!;
    const key = groupOf(first);
    const inheritedOf = GROUPED.get(key);
    if (inheritedOf === undefined) {
      primitive(sink, first, NOTHING);
      i++;
      continue;
    }
    let end = i + 1;
    while (end < list.length && groupOf(list[end]!) === key && list[end]!.kind === first.kind) end++;
    const inherited = inheritedOf(first);
    if (first.kind === 'bead') beadRun(sink, list, i, end, inherited);
    else {
      group(sink, `${key}s`, inherited);
      for (let k = i; k < end; k++) primitive(sink, list[k]!, inherited);
      sink.close('g');
    }
    i = end;
  }
}

const PATTERN_NAMES = ['id', 'patternUnits', 'width', 'height'];
const HATCH_NAMES = ['d', 'fill', 'stroke', 'stroke-width'];

function pattern(sink: SvgSink, h: HatchPattern): void {
  sink.open('pattern', PATTERN_NAMES, [h.id, 'userSpaceOnUse', h.size, h.size]);
  sink.element('path', HATCH_NAMES, [h.d, 'none', h.stroke, h.strokeWidth]);
  sink.close('pattern');
}

export const ROOT_NAMES = ['viewBox', 'width', 'height', 'font-family', 'role', 'aria-labelledby', 'data-theme'];

/** Values for ROOT_NAMES, for emitters that create the root themselves. */
export const rootValues = (scene: Scene): AttrValue[] => [
  `0 0 ${formatNumber(scene.width)} ${formatNumber(scene.height)}`,
  `${formatNumber(scene.width)}mm`,
  `${formatNumber(scene.height)}mm`,
  scene.fontFamily,
  'img',
  'ff-chart-title ff-chart-desc',
  scene.theme,
];

const ID = ['id'];
const NONE: readonly string[] = [];

/** The children of the root, in document order. */
export function sceneChildren(sink: SvgSink, scene: Scene, fonts: readonly EmbeddedFont[] = []): void {
  sink.element('title', ID, ['ff-chart-title'], scene.title);
  sink.element('desc', ID, ['ff-chart-desc'], scene.desc);
  if (fonts.length > 0) {
    const css = fonts.map(
      (f) =>
        `@font-face{font-family:'${f.family}';font-weight:${f.weight};src:url(data:font/ttf;base64,${f.base64}) format('truetype');}`,
    );
    sink.element('style', NONE, [], css.join('\n'));
  }
  if (scene.patterns.length > 0) {
    sink.open('defs', NONE, []);
    for (const h of scene.patterns) pattern(sink, h);
    sink.close('defs');
  }
  items(sink, scene.items);
}
