/**
 * Scene to SVG elements: tags and attributes in a fixed order. Both emitters
 * are driven by this one walk (they differ only in the sink that receives
 * it), which is how the text output and the svg.js drawing stay the same
 * chart. The walk builds no tree of its own: a 5,000-bead chart would
 * otherwise allocate tens of thousands of short-lived arrays.
 */
import { round2, round2Text } from './geometry.js';
import type {
  BeadPrim,
  DataAttrs,
  HatchPattern,
  PathPrim,
  Primitive,
  RectPrim,
  Role,
  Scene,
  TextPrim,
} from './scene-types.js';

/** An attribute value; undefined leaves the attribute out. */
export type AttrValue = string | number | undefined;

/**
 * What an emitter does with the walk. `element` is one whole element with
 * its attributes (names from a fixed list per kind of element, values in
 * the same order) and optional text; `open`/`close` wrap elements that hold
 * others. Whole elements keep the text emitter to one string per element.
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

/** One embedded font face: a subset of the bundled font, base64-encoded by the caller. */
export interface EmbeddedFont {
  family: string;
  weight: 400 | 700;
  /** TrueType: subsetting to it is fast, and every SVG viewer reads it. */
  base64: string;
}

const DATA_NAMES = ['data-unit', 'data-row', 'data-pass', 'data-kind', 'data-key'] as const;
/** `values` with the data attributes' values after them, in DATA_NAMES order; no second array. */
const withData = (values: AttrValue[], d: DataAttrs): AttrValue[] => {
  values.push(d.unit, d.row, d.pass, d.kind, d.key);
  return values;
};

/** `ff-<role>`, made once per role rather than once per element. */
const classes = new Map<Role, string>();
const classOf = (role: Role): string => {
  let c = classes.get(role);
  if (c === undefined) classes.set(role, (c = `ff-${role}`));
  return c;
};

type TextFields = Pick<TextPrim, 'id' | 'x' | 'y' | 'size' | 'text' | 'color' | 'anchor' | 'bold'>;

const TEXT_NAMES = ['id', 'class', 'x', 'y', 'font-size', 'fill', 'text-anchor', 'font-weight', ...DATA_NAMES];

function text(sink: SvgSink, p: TextFields, cls: string, data: DataAttrs | null): void {
  const values: AttrValue[] = [
    p.id,
    cls,
    p.x,
    p.y,
    p.size,
    p.color,
    p.anchor === 'start' ? undefined : p.anchor,
    p.bold ? 'bold' : undefined,
  ];
  sink.element('text', TEXT_NAMES, data ? withData(values, data) : values, p.text);
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

function bead(sink: SvgSink, p: BeadPrim): void {
  sink.element('rect', BEAD_NAMES, [
    p.id,
    p.gap ? 'ff-bead ff-gap' : 'ff-bead',
    round2(p.x - p.length / 2),
    round2(p.y - p.thickness / 2),
    p.length,
    p.thickness,
    round2(Math.min(p.thickness, p.length) / 2),
    p.angle === 0 ? undefined : `rotate(${formatNumber(p.angle)} ${formatNumber(p.x)} ${formatNumber(p.y)})`,
    p.fill,
    p.stroke,
    p.strokeWidth,
    p.bead,
    p.unit,
    p.row,
  ]);
  if (p.label) {
    const { label } = p;
    text(
      sink,
      {
        id: `${p.id}-key`,
        x: label.x,
        y: label.y,
        size: label.size,
        text: label.text,
        color: label.color,
        anchor: 'middle',
        bold: true,
      },
      'ff-bead-label',
      null,
    );
  }
}

const RECT_NAMES = ['id', 'class', 'x', 'y', 'width', 'height', 'fill', 'stroke', 'stroke-width', ...DATA_NAMES];

function rect(sink: SvgSink, p: RectPrim): void {
  const fill = typeof p.fill === 'string' ? p.fill : `url(#${p.fill.pattern})`;
  const stroke = p.stroke ?? undefined;
  const values: AttrValue[] = [
    p.id,
    classOf(p.role),
    p.x,
    p.y,
    p.width,
    p.height,
    fill,
    stroke,
    stroke === undefined ? undefined : p.strokeWidth,
  ];
  sink.element('rect', RECT_NAMES, withData(values, p.data));
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

function path(sink: SvgSink, p: PathPrim): void {
  const stroke = p.stroke ?? undefined;
  const values: AttrValue[] = [
    p.id,
    classOf(p.role),
    p.d,
    p.fill ?? 'none',
    stroke,
    stroke === undefined ? undefined : p.strokeWidth,
    p.dash,
    stroke !== undefined && p.fill === null ? 'round' : undefined,
  ];
  sink.element('path', PATH_NAMES, withData(values, p.data));
}

function primitive(sink: SvgSink, p: Primitive): void {
  switch (p.kind) {
    case 'bead':
      return bead(sink, p);
    case 'text':
      return text(sink, p, classOf(p.role), p.data);
    case 'rect':
      return rect(sink, p);
    case 'path':
      return path(sink, p);
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
  for (const item of scene.items) primitive(sink, item);
}
