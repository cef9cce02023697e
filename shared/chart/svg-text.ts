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
import {
  ROOT_NAMES,
  rootValues,
  sceneChildren,
  type AttrValue,
  type EmbeddedFont,
  type NumberList,
  type SvgSink,
} from './elements.js';
import type { Scene } from './scene-types.js';

export type { EmbeddedFont } from './elements.js';

const ENTITY: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' };
const AMP = 38;
const LT = 60;
const GT = 62;
const QUOT = 34;
const SPACE = 32;
const COMMA = 44;
const CLOSE_PAREN = 41;

const encoder = new TextEncoder();
const decoder = new TextDecoder();
const bytesOf = (s: string): Uint8Array => encoder.encode(s);

/**
 * Each attribute's name as bytes, once per list of names (they are constants
 * in elements.ts): ` name="` for the first attribute an element writes, and
 * `" name="` after a value, which closes that value's quote in the same copy.
 */
interface NameBytes {
  first: Uint8Array[];
  next: Uint8Array[];
}
const nameBytes = new WeakMap<readonly string[], NameBytes>();
const nameBytesOf = (names: readonly string[]): NameBytes => {
  let b = nameBytes.get(names);
  if (b === undefined) {
    b = { first: names.map((name) => bytesOf(` ${name}="`)), next: names.map((name) => bytesOf(`" ${name}="`)) };
    nameBytes.set(names, b);
  }
  return b;
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
const ROTATE = bytesOf('rotate(');
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
  /** Sized from the scene (about 190 bytes an item, with the bulk grouped), so a large chart is not copied as it grows; always well above SLACK, so the XML declaration needs no check either. */
  bytes: Uint8Array;

  constructor(items: number) {
    this.bytes = new Uint8Array(Math.max(1 << 16, items * 200));
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

  /** A whole number from 0 to 2^31 - 1, in small-integer arithmetic; most on a chart have three digits or fewer. */
  private digits(n: number): void {
    const { bytes } = this;
    if (n < 10) {
      bytes[this.length++] = 48 + n;
      return;
    }
    if (n < 1000) {
      const hundreds = (n / 100) | 0;
      const tens = ((n / 10) | 0) % 10;
      if (hundreds > 0) bytes[this.length++] = 48 + hundreds;
      bytes[this.length++] = 48 + tens;
      bytes[this.length++] = 48 + (n % 10);
      return;
    }
    let end = this.length;
    let rest = n;
    do {
      end++;
      rest = (rest / 10) | 0;
    } while (rest > 0);
    this.length = end;
    rest = n;
    do {
      bytes[--end] = 48 + (rest % 10);
      rest = (rest / 10) | 0;
    } while (rest > 0);
  }

  /**
   * A scene number (already rounded to 2 decimals): the same digits as
   * `formatNumber` in elements.ts, which the svg.js emitter uses. Ids and
   * counts, whole and small, take the short way.
   */
  number(n: number): void {
    if ((n | 0) === n && n >= 0) return this.digits(n);
    const cents = Math.round(n * 100);
    if (Math.abs(cents) > 0x7fffffff || Math.abs(n * 100 - cents) > 1e-6) return this.text(String(n));
    const abs = Math.abs(cents);
    if (cents < 0) this.bytes[this.length++] = 45;
    this.digits((abs / 100) | 0);
    const frac = abs % 100;
    if (frac === 0) return;
    this.bytes[this.length++] = 46;
    this.bytes[this.length++] = 48 + ((frac / 10) | 0);
    if (frac % 10 !== 0) this.bytes[this.length++] = 48 + (frac % 10);
  }

  /** Corners as `x,y x,y`, or a turn as `rotate(a x y)`. */
  private numbers(list: NumberList): void {
    const { numbers } = list;
    this.room(numbers.length * 24 + SLACK);
    const rotate = list.form === 'rotate';
    if (rotate) this.put(ROTATE);
    for (let i = 0; i < numbers.length; i++) {
      if (i > 0) this.bytes[this.length++] = rotate || i % 2 === 0 ? SPACE : COMMA;
      this.number(numbers[i]!);
    }
    if (rotate) this.bytes[this.length++] = CLOSE_PAREN;
  }

  /** The last list of names and its bytes: elements come in runs of one kind, so this spares a lookup each. */
  private names: readonly string[] = [];
  private nameBytes: NameBytes = { first: [], next: [] };

  private tag = '';
  private tagBytes: TagBytes = { open: new Uint8Array(), close: new Uint8Array() };

  private tagOf(tag: string): TagBytes {
    if (tag !== this.tag) {
      this.tag = tag;
      this.tagBytes = tagBytes(tag);
    }
    return this.tagBytes;
  }

  private startTag(tag: TagBytes, names: readonly string[], values: readonly AttrValue[]): void {
    if (names !== this.names) {
      this.names = names;
      this.nameBytes = nameBytesOf(names);
    }
    const { first, next } = this.nameBytes;
    this.room(SLACK);
    this.put(tag.open);
    let written = false;
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (v === undefined) continue;
      this.put(written ? next[i]! : first[i]!);
      written = true;
      if (typeof v === 'number') this.number(v);
      else if (typeof v === 'string') this.text(v);
      else this.numbers(v);
    }
    if (written) this.bytes[this.length++] = QUOT;
  }

  element(tag: string, names: readonly string[], values: readonly AttrValue[], text?: string): void {
    const t = this.tagOf(tag);
    this.startTag(t, names, values);
    if (text === undefined) return this.put(EMPTY_END);
    this.put(TEXT_START);
    this.text(text);
    this.put(t.close);
  }

  open(tag: string, names: readonly string[], values: readonly AttrValue[]): void {
    this.startTag(this.tagOf(tag), names, values);
    this.put(OPEN_END);
  }

  close(tag: string): void {
    this.room(SLACK);
    this.put(this.tagOf(tag).close);
  }
}

/** The chart as UTF-8 bytes, ready to write or send: what the CLI, batch conversion and the server use. */
export function sceneToSvgBytes(scene: Scene, fonts: readonly EmbeddedFont[] = []): Uint8Array {
  const sink = new TextSink(scene.items.length);
  sink.put(XML_DECL);
  sink.open('svg', SVG_NAMES, ['http://www.w3.org/2000/svg', ...rootValues(scene)]);
  sceneChildren(sink, scene, fonts);
  sink.close('svg');
  return sink.bytes.subarray(0, sink.length);
}

/** The chart as text, for callers that read it rather than write it. */
export const sceneToSvg = (scene: Scene, fonts: readonly EmbeddedFont[] = []): string =>
  decoder.decode(sceneToSvgBytes(scene, fonts));
