/**
 * Scene to SVG text, for the CLI, batch conversion and the server's
 * downloads. Plain string building: fast, and byte-identical for the same
 * scene and font.
 */
import {
  formatNumber,
  ROOT_NAMES,
  rootValues,
  sceneChildren,
  type AttrValue,
  type EmbeddedFont,
  type SvgSink,
} from './elements.js';
import type { Scene } from './scene-types.js';

export type { EmbeddedFont } from './elements.js';

const SPECIAL = /[&<>"]/;
const escape = (s: string): string =>
  SPECIAL.test(s) ? s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;') : s;

/** ` name="`, made once per attribute name rather than once per element. */
const prefixes = new Map<string, string>();
const prefix = (name: string): string => {
  let p = prefixes.get(name);
  if (p === undefined) prefixes.set(name, (p = ` ${name}="`));
  return p;
};

/** Pieces of the element being written; `join` makes one flat string of them, where `+=` would make a rope. */
const pieces: string[] = [];

function startTag(tag: string, names: readonly string[], values: readonly AttrValue[]): void {
  pieces.push('<', tag);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== undefined) pieces.push(prefix(names[i]!), typeof v === 'number' ? formatNumber(v) : escape(v), '"');
  }
}

function take(): string {
  const s = pieces.join('');
  pieces.length = 0;
  return s;
}

/**
 * One flat string per element, joined once at the end: appending every
 * piece to one growing string instead makes a rope of hundreds of thousands
 * of nodes, and collecting those costs more than all the rest.
 */
class TextSink implements SvgSink {
  readonly chunks: string[] = ['<?xml version="1.0" encoding="UTF-8"?>\n'];

  element(tag: string, names: readonly string[], values: readonly AttrValue[], text?: string): void {
    startTag(tag, names, values);
    if (text === undefined) pieces.push('/>\n');
    else pieces.push('>', escape(text), '</', tag, '>\n');
    this.chunks.push(take());
  }

  open(tag: string, names: readonly string[], values: readonly AttrValue[]): void {
    startTag(tag, names, values);
    pieces.push('>\n');
    this.chunks.push(take());
  }

  close(tag: string): void {
    this.chunks.push(`</${tag}>\n`);
  }
}

export function sceneToSvg(scene: Scene, fonts: readonly EmbeddedFont[] = []): string {
  const sink = new TextSink();
  sink.open('svg', ['xmlns', ...ROOT_NAMES], ['http://www.w3.org/2000/svg', ...rootValues(scene)]);
  sceneChildren(sink, scene, fonts);
  sink.close('svg');
  return sink.chunks.join('');
}
