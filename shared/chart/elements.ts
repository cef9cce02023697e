/**
 * Scene to SVG elements: tags and attributes in a fixed order. Both emitters
 * are driven by this one walk (they differ only in the sink that receives
 * it), which is how the text output and the svg.js drawing stay the same
 * chart. The walk builds no tree of its own: a 5,000-bead chart would
 * otherwise allocate tens of thousands of short-lived arrays.
 */
import { round2 } from './geometry.js';
import type { BeadPrim, DataAttrs, HatchPattern, PathPrim, Primitive, RectPrim, Scene, TextPrim } from './scene-types.js';

/** What an emitter does with the walk: open an element, set attributes, add text, close it. */
export interface SvgSink {
  open(tag: string): void;
  attr(name: string, value: string | number): void;
  text(text: string): void;
  close(tag: string): void;
}

/**
 * A scene number (already rounded to 2 decimals) as text: the same digits
 * as `String(n)` gives, built from whole hundredths because formatting small
 * integers is several times faster than formatting doubles.
 */
export function formatNumber(n: number): string {
  const cents = Math.round(n * 100);
  if (!Number.isSafeInteger(cents) || Math.abs(n * 100 - cents) > 1e-6) return String(n);
  const abs = Math.abs(cents);
  const whole = Math.floor(abs / 100);
  const frac = abs % 100;
  const sign = cents < 0 ? '-' : '';
  if (frac === 0) return `${sign}${whole}`;
  return `${sign}${whole}.${frac < 10 ? `0${frac}` : frac % 10 === 0 ? frac / 10 : frac}`;
}

/** One embedded font face: a subset of the bundled font, base64-encoded by the caller. */
export interface EmbeddedFont {
  family: string;
  weight: 400 | 700;
  /** TrueType: subsetting to it is fast, and every SVG viewer reads it. */
  base64: string;
}

function dataAttrs(sink: SvgSink, data: DataAttrs): void {
  if (data.unit !== undefined) sink.attr('data-unit', data.unit);
  if (data.row !== undefined) sink.attr('data-row', data.row);
  if (data.pass !== undefined) sink.attr('data-pass', data.pass);
  if (data.kind !== undefined) sink.attr('data-kind', data.kind);
  if (data.key !== undefined) sink.attr('data-key', data.key);
}

type TextFields = Pick<TextPrim, 'id' | 'x' | 'y' | 'size' | 'text' | 'color' | 'anchor' | 'bold'>;

function text(sink: SvgSink, p: TextFields, cls: string, data: DataAttrs | null): void {
  sink.open('text');
  sink.attr('id', p.id);
  sink.attr('class', cls);
  sink.attr('x', p.x);
  sink.attr('y', p.y);
  sink.attr('font-size', p.size);
  sink.attr('fill', p.color);
  if (p.anchor !== 'start') sink.attr('text-anchor', p.anchor);
  if (p.bold) sink.attr('font-weight', 'bold');
  if (data) dataAttrs(sink, data);
  sink.text(p.text);
  sink.close('text');
}

function bead(sink: SvgSink, p: BeadPrim): void {
  sink.open('rect');
  sink.attr('id', p.id);
  sink.attr('class', p.gap ? 'ff-bead ff-gap' : 'ff-bead');
  sink.attr('x', round2(p.x - p.length / 2));
  sink.attr('y', round2(p.y - p.thickness / 2));
  sink.attr('width', p.length);
  sink.attr('height', p.thickness);
  sink.attr('rx', round2(Math.min(p.thickness, p.length) / 2));
  if (p.angle !== 0) sink.attr('transform', `rotate(${p.angle} ${p.x} ${p.y})`);
  sink.attr('fill', p.fill);
  sink.attr('stroke', p.stroke);
  sink.attr('stroke-width', p.strokeWidth);
  sink.attr('data-bead', p.bead);
  sink.attr('data-unit', p.unit);
  sink.attr('data-row', p.row);
  sink.close('rect');
  if (p.label) {
    const { label } = p;
    text(sink, { id: `${p.id}-key`, x: label.x, y: label.y, size: label.size, text: label.text, color: label.color, anchor: 'middle', bold: true }, 'ff-bead-label', null);
  }
}

function stroke(sink: SvgSink, color: string | null, width: number): void {
  if (color === null) return;
  sink.attr('stroke', color);
  sink.attr('stroke-width', width);
}

function rect(sink: SvgSink, p: RectPrim): void {
  sink.open('rect');
  sink.attr('id', p.id);
  sink.attr('class', `ff-${p.role}`);
  sink.attr('x', p.x);
  sink.attr('y', p.y);
  sink.attr('width', p.width);
  sink.attr('height', p.height);
  sink.attr('fill', typeof p.fill === 'string' ? p.fill : `url(#${p.fill.pattern})`);
  stroke(sink, p.stroke, p.strokeWidth);
  dataAttrs(sink, p.data);
  sink.close('rect');
}

function path(sink: SvgSink, p: PathPrim): void {
  sink.open('path');
  sink.attr('id', p.id);
  sink.attr('class', `ff-${p.role}`);
  sink.attr('d', p.d);
  sink.attr('fill', p.fill ?? 'none');
  stroke(sink, p.stroke, p.strokeWidth);
  if (p.dash !== undefined) sink.attr('stroke-dasharray', p.dash);
  if (p.stroke !== null && p.fill === null) sink.attr('stroke-linecap', 'round');
  dataAttrs(sink, p.data);
  sink.close('path');
}

function primitive(sink: SvgSink, p: Primitive): void {
  switch (p.kind) {
    case 'bead':
      return bead(sink, p);
    case 'text':
      return text(sink, p, `ff-${p.role}`, p.data);
    case 'rect':
      return rect(sink, p);
    case 'path':
      return path(sink, p);
  }
}

function pattern(sink: SvgSink, h: HatchPattern): void {
  sink.open('pattern');
  sink.attr('id', h.id);
  sink.attr('patternUnits', 'userSpaceOnUse');
  sink.attr('width', h.size);
  sink.attr('height', h.size);
  sink.open('path');
  sink.attr('d', h.d);
  sink.attr('fill', 'none');
  sink.attr('stroke', h.stroke);
  sink.attr('stroke-width', h.strokeWidth);
  sink.close('path');
  sink.close('pattern');
}

/** Attributes of the chart's `<svg>` root, for emitters that create the root themselves. */
export function rootAttrs(sink: Pick<SvgSink, 'attr'>, scene: Scene): void {
  sink.attr('viewBox', `0 0 ${scene.width} ${scene.height}`);
  sink.attr('width', `${scene.width}mm`);
  sink.attr('height', `${scene.height}mm`);
  sink.attr('font-family', scene.fontFamily);
  sink.attr('role', 'img');
  sink.attr('aria-labelledby', 'ff-chart-title ff-chart-desc');
  sink.attr('data-theme', scene.theme);
}

const plain = (sink: SvgSink, tag: string, id: string | null, content: string): void => {
  sink.open(tag);
  if (id !== null) sink.attr('id', id);
  sink.text(content);
  sink.close(tag);
};

/** The children of the root, in document order. */
export function sceneChildren(sink: SvgSink, scene: Scene, fonts: readonly EmbeddedFont[] = []): void {
  plain(sink, 'title', 'ff-chart-title', scene.title);
  plain(sink, 'desc', 'ff-chart-desc', scene.desc);
  if (fonts.length > 0) {
    const css = fonts.map((f) => `@font-face{font-family:'${f.family}';font-weight:${f.weight};src:url(data:font/ttf;base64,${f.base64}) format('truetype');}`);
    plain(sink, 'style', null, css.join('\n'));
  }
  if (scene.patterns.length > 0) {
    sink.open('defs');
    for (const h of scene.patterns) pattern(sink, h);
    sink.close('defs');
  }
  for (const item of scene.items) primitive(sink, item);
}
