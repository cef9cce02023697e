/**
 * Scene to SVG elements: tags and attributes in a fixed order, values as
 * strings. Both emitters walk this same tree, which is how the text output
 * and the svg.js drawing stay the same chart.
 */
import { round2 } from './geometry.js';
import type { BeadPrim, DataAttrs, HatchPattern, PathPrim, Primitive, RectPrim, Scene, TextPrim } from './scene-types.js';

export interface SvgNode {
  tag: string;
  attrs: Array<[string, string]>;
  text?: string;
  children?: SvgNode[];
}

/** One embedded font face: a subset of the bundled font, base64-encoded by the caller. */
export interface EmbeddedFont {
  family: string;
  weight: 400 | 700;
  /** TrueType: subsetting to it is fast, and every SVG viewer reads it. */
  base64: string;
}

const num = (n: number): string => String(n);

const dataAttrs = (data: DataAttrs): Array<[string, string]> => {
  const out: Array<[string, string]> = [];
  if (data.unit !== undefined) out.push(['data-unit', num(data.unit)]);
  if (data.row !== undefined) out.push(['data-row', num(data.row)]);
  if (data.pass !== undefined) out.push(['data-pass', num(data.pass)]);
  if (data.kind !== undefined) out.push(['data-kind', data.kind]);
  if (data.key !== undefined) out.push(['data-key', data.key]);
  return out;
};

function textNode(p: Omit<TextPrim, 'kind' | 'data' | 'role'> & { cls: string }, data: DataAttrs): SvgNode {
  const attrs: Array<[string, string]> = [
    ['id', p.id],
    ['class', p.cls],
    ['x', num(p.x)],
    ['y', num(p.y)],
    ['font-size', num(p.size)],
    ['fill', p.color],
  ];
  if (p.anchor !== 'start') attrs.push(['text-anchor', p.anchor]);
  if (p.bold) attrs.push(['font-weight', 'bold']);
  return { tag: 'text', attrs: [...attrs, ...dataAttrs(data)], text: p.text };
}

function bead(p: BeadPrim): SvgNode[] {
  const attrs: Array<[string, string]> = [
    ['id', p.id],
    ['class', p.gap ? 'ff-bead ff-gap' : 'ff-bead'],
    ['x', num(round2(p.x - p.length / 2))],
    ['y', num(round2(p.y - p.thickness / 2))],
    ['width', num(p.length)],
    ['height', num(p.thickness)],
    ['rx', num(Math.min(p.thickness, p.length) / 2)],
  ];
  if (p.angle !== 0) attrs.push(['transform', `rotate(${num(p.angle)} ${num(p.x)} ${num(p.y)})`]);
  attrs.push(['fill', p.fill], ['stroke', p.stroke], ['stroke-width', num(p.strokeWidth)]);
  attrs.push(['data-bead', num(p.bead)], ['data-unit', num(p.unit)], ['data-row', num(p.row)]);
  const nodes: SvgNode[] = [{ tag: 'rect', attrs }];
  if (p.label) {
    const { text, color, size, x, y } = p.label;
    nodes.push(textNode({ id: `${p.id}-key`, cls: 'ff-bead-label', x, y, size, text, color, anchor: 'middle', bold: true }, {}));
  }
  return nodes;
}

const strokeAttrs = (stroke: string | null, width: number): Array<[string, string]> =>
  stroke === null ? [] : [['stroke', stroke], ['stroke-width', num(width)]];

function rect(p: RectPrim): SvgNode {
  const fill = typeof p.fill === 'string' ? p.fill : `url(#${p.fill.pattern})`;
  const attrs: Array<[string, string]> = [
    ['id', p.id],
    ['class', `ff-${p.role}`],
    ['x', num(p.x)],
    ['y', num(p.y)],
    ['width', num(p.width)],
    ['height', num(p.height)],
    ['fill', fill],
    ...strokeAttrs(p.stroke, p.strokeWidth),
  ];
  return { tag: 'rect', attrs: [...attrs, ...dataAttrs(p.data)] };
}

function path(p: PathPrim): SvgNode {
  const attrs: Array<[string, string]> = [['id', p.id], ['class', `ff-${p.role}`], ['d', p.d], ['fill', p.fill ?? 'none'], ...strokeAttrs(p.stroke, p.strokeWidth)];
  if (p.dash !== undefined) attrs.push(['stroke-dasharray', p.dash]);
  if (p.stroke !== null && p.fill === null) attrs.push(['stroke-linecap', 'round']);
  return { tag: 'path', attrs: [...attrs, ...dataAttrs(p.data)] };
}

function primitive(p: Primitive): SvgNode[] {
  switch (p.kind) {
    case 'bead':
      return bead(p);
    case 'text':
      return [textNode({ ...p, cls: `ff-${p.role}` }, p.data)];
    case 'rect':
      return [rect(p)];
    case 'path':
      return [path(p)];
  }
}

const pattern = (h: HatchPattern): SvgNode => ({
  tag: 'pattern',
  attrs: [
    ['id', h.id],
    ['patternUnits', 'userSpaceOnUse'],
    ['width', num(h.size)],
    ['height', num(h.size)],
  ],
  children: [{ tag: 'path', attrs: [['d', h.d], ['fill', 'none'], ['stroke', h.stroke], ['stroke-width', num(h.strokeWidth)]] }],
});

/** Root attributes of the chart's `<svg>`, for emitters that create the root themselves. */
export function rootAttrs(scene: Scene): Array<[string, string]> {
  return [
    ['viewBox', `0 0 ${num(scene.width)} ${num(scene.height)}`],
    ['width', `${num(scene.width)}mm`],
    ['height', `${num(scene.height)}mm`],
    ['font-family', scene.fontFamily],
    ['role', 'img'],
    ['aria-labelledby', 'ff-chart-title ff-chart-desc'],
    ['data-theme', scene.theme],
  ];
}

/** The children of the root, in document order. */
export function sceneChildren(scene: Scene, fonts: readonly EmbeddedFont[] = []): SvgNode[] {
  const nodes: SvgNode[] = [
    { tag: 'title', attrs: [['id', 'ff-chart-title']], text: scene.title },
    { tag: 'desc', attrs: [['id', 'ff-chart-desc']], text: scene.desc },
  ];
  if (fonts.length > 0) {
    const css = fonts.map((f) => `@font-face{font-family:'${f.family}';font-weight:${f.weight};src:url(data:font/ttf;base64,${f.base64}) format('truetype');}`);
    nodes.push({ tag: 'style', attrs: [], text: css.join('\n') });
  }
  if (scene.patterns.length > 0) nodes.push({ tag: 'defs', attrs: [], children: scene.patterns.map(pattern) });
  for (const item of scene.items) nodes.push(...primitive(item));
  return nodes;
}
