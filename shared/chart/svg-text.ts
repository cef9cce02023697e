/**
 * Scene to SVG text, for the CLI, batch conversion and the server's
 * downloads. Plain string building: fast, and byte-identical for the same
 * scene and font.
 */
import { formatNumber, rootAttrs, sceneChildren, type EmbeddedFont, type SvgSink } from './elements.js';
import type { Scene } from './scene-types.js';

export type { EmbeddedFont } from './elements.js';

const SPECIAL = /[&<>"]/;
const escape = (s: string): string =>
  SPECIAL.test(s) ? s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;') : s;

/**
 * Collects the walk as text; an element left open with no content closes as
 * `<tag/>`. Pieces go into arrays joined once per element and once at the
 * end: appending them to one growing string makes a rope of hundreds of
 * thousands of nodes, and collecting those costs more than all the rest.
 */
class TextSink implements SvgSink {
  private readonly chunks: string[] = ['<?xml version="1.0" encoding="UTF-8"?>\n'];
  private readonly element: string[] = [];
  /** The last opened tag still lacks its '>'. */
  private pending = false;

  private flush(end: string): void {
    this.element.push(end);
    this.chunks.push(this.element.join(''));
    this.element.length = 0;
    this.pending = false;
  }

  open(tag: string): void {
    if (this.pending) this.flush('>\n');
    this.element.push('<', tag);
    this.pending = true;
  }

  attr(name: string, value: string | number): void {
    this.element.push(' ', name, '="', typeof value === 'number' ? formatNumber(value) : escape(value), '"');
  }

  text(text: string): void {
    this.element.push('>', escape(text));
    this.pending = false;
  }

  close(tag: string): void {
    this.flush(this.pending ? '/>\n' : `</${tag}>\n`);
  }

  result(): string {
    return this.chunks.join('');
  }
}

export function sceneToSvg(scene: Scene, fonts: readonly EmbeddedFont[] = []): string {
  const sink = new TextSink();
  sink.open('svg');
  sink.attr('xmlns', 'http://www.w3.org/2000/svg');
  rootAttrs(sink, scene);
  sceneChildren(sink, scene, fonts);
  sink.close('svg');
  return sink.result();
}
