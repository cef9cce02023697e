/**
 * Scene to SVG text, for the CLI, batch conversion and the server's
 * downloads: byte-identical for the same scene and font.
 *
 * The text is written as UTF-8 bytes straight into one growing byte array
 * and decoded once at the end, numbers as digits with no string of their
 * own. Building it from strings instead (pieces joined per element, or one
 * growing string) keeps hundreds of thousands of small strings alive until
 * the end, and copying them from one young generation to the next cost
 * more than everything else together.
 */
import { ROOT_NAMES, rootValues, sceneChildren, type AttrValue, type EmbeddedFont, type SvgSink } from './elements.js';
import type { Scene } from './scene-types.js';

export type { EmbeddedFont } from './elements.js';

const ENTITY: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' };
const AMP = 38;
const LT = 60;
const GT = 62;
const QUOT = 34;

const encoder = new TextEncoder();
const decoder = new TextDecoder();
const bytesOf = (s: string): Uint8Array => encoder.encode(s);

/** ` name="` as bytes, once per list of attribute names (they are constants in elements.ts). */
const prefixes = new WeakMap<readonly string[], Uint8Array[]>();
const prefixesOf = (names: readonly string[]): Uint8Array[] => {
  let p = prefixes.get(names);
  if (p === undefined) prefixes.set(names, (p = names.map((name) => bytesOf(` ${name}="`))));
  return p;
};

interface TagBytes {
  open: Uint8Array;
  close: Uint8Array;
}
const tags = new Map<string, TagBytes>();
const tagBytes = (tag: string): TagBytes => {
  let t = tags.get(tag);
  if (t === undefined) tags.set(tag, (t = { open: bytesOf(`<${tag}`), close: bytesOf(`</${tag}>\n`) }));
  return t;
};

const XML_DECL = bytesOf('<?xml version="1.0" encoding="UTF-8"?>\n');
const QUOTE = bytesOf('"');
const EMPTY_END = bytesOf('/>\n');
const TEXT_START = bytesOf('>');
const OPEN_END = bytesOf('>\n');
const SVG_NAMES = ['xmlns', ...ROOT_NAMES];

/**
 * Free bytes kept after every element start and every string written, so
 * the fixed pieces and numbers between them need no check of their own: an
 * element's names, quotes and numbers take well under this.
 */
const SLACK = 2048;

class TextSink implements SvgSink {
  /** Sized from the scene (an element is rarely over 256 bytes), so a large chart is not copied as it grows; always well above SLACK, so the XML declaration needs no check either. */
  bytes: Uint8Array;

  constructor(items: number) {
    this.bytes = new Uint8Array(Math.max(1 << 16, items * 256));
  }
  length = 0;

  private room(n: number): void {
    if (this.length + n > this.bytes.length) this.grow(n);
  }

  private grow(n: number): void {
    const grown = new Uint8Array(Math.max(this.bytes.length * 2, this.length + n));
    grown.set(this.bytes.subarray(0, this.length));
    this.bytes = grown;
  }

  /** A fixed piece; shorter than SLACK, so there is room for it. */
  put(a: Uint8Array): void {
    const { bytes } = this;
    let at = this.length;
    for (let i = 0; i < a.length; i++) bytes[at++] = a[i]!;
    this.length = at;
  }

  /** `s` as UTF-8, with the four characters XML reserves as entities. */
  text(s: string): void {
    this.room(s.length + SLACK);
    const { bytes } = this;
    let at = this.length;
    for (let i = 0; i < s.length; i++) {
      const c = s.charCodeAt(i);
      if (c >= 128 || c === AMP || c === LT || c === GT || c === QUOT) {
        this.length = at;
        return this.rest(s.slice(i));
      }
      bytes[at++] = c;
    }
    this.length = at;
  }

  /** The rare rest of a string that needs escaping or is not ASCII (names, titles). */
  private rest(s: string): void {
    const escaped = s.replace(/[&<>"]/g, (ch) => ENTITY[ch]!);
    this.room(escaped.length * 3 + SLACK);
    this.length += encoder.encodeInto(escaped, this.bytes.subarray(this.length)).written;
  }

  private digits(n: number): void {
    if (n >= 10) this.digits(Math.floor(n / 10));
    this.bytes[this.length++] = 48 + (n % 10);
  }

  /**
   * A scene number (already rounded to 2 decimals): the same digits as
   * `formatNumber` in elements.ts, which the svg.js emitter uses.
   */
  number(n: number): void {
    const cents = Math.round(n * 100);
    if (!Number.isSafeInteger(cents) || Math.abs(n * 100 - cents) > 1e-6) return this.text(String(n));
    const abs = Math.abs(cents);
    if (cents < 0) this.bytes[this.length++] = 45;
    this.digits(Math.floor(abs / 100));
    const frac = abs % 100;
    if (frac === 0) return;
    this.bytes[this.length++] = 46;
    this.bytes[this.length++] = 48 + Math.floor(frac / 10);
    if (frac % 10 !== 0) this.bytes[this.length++] = 48 + (frac % 10);
  }

  private startTag(tag: TagBytes, names: readonly string[], values: readonly AttrValue[]): void {
    const p = prefixesOf(names);
    this.room(SLACK);
    this.put(tag.open);
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (v === undefined) continue;
      this.put(p[i]!);
      if (typeof v === 'number') this.number(v);
      else this.text(v);
      this.put(QUOTE);
    }
  }

  element(tag: string, names: readonly string[], values: readonly AttrValue[], text?: string): void {
    const t = tagBytes(tag);
    this.startTag(t, names, values);
    if (text === undefined) return this.put(EMPTY_END);
    this.put(TEXT_START);
    this.text(text);
    this.put(t.close);
  }

  open(tag: string, names: readonly string[], values: readonly AttrValue[]): void {
    this.startTag(tagBytes(tag), names, values);
    this.put(OPEN_END);
  }

  close(tag: string): void {
    this.room(SLACK);
    this.put(tagBytes(tag).close);
  }
}

export function sceneToSvg(scene: Scene, fonts: readonly EmbeddedFont[] = []): string {
  const sink = new TextSink(scene.items.length);
  sink.put(XML_DECL);
  sink.open('svg', SVG_NAMES, ['http://www.w3.org/2000/svg', ...rootValues(scene)]);
  sceneChildren(sink, scene, fonts);
  sink.close('svg');
  return decoder.decode(sink.bytes.subarray(0, sink.length));
}
