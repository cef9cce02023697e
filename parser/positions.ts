/**
 * Offsets to lines and columns as NOTATION.md section 7 counts them: 1-based,
 * columns in code points, a tab is one column. Chevrotain counts UTF-16 code
 * units, so every range is built here from offsets rather than taken from the
 * tokens' own line and column.
 */
import type { SourceRange } from '../shared/diagnostic.js';

export class LineIndex {
  private readonly starts: number[] = [0];
  /** Only files with characters outside the BMP pay for code-point counting. */
  private readonly astral: boolean;
  private last = 0;

  constructor(private readonly text: string) {
    for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) this.starts.push(i + 1);
    this.astral = /[\uD800-\uDBFF][\uDC00-\uDFFF]/.test(text);
  }

  get lineCount(): number {
    return this.starts.length;
  }

  /** Offset of the first character of a 1-based line. */
  lineStart(line: number): number {
    return this.starts[Math.min(Math.max(line, 1), this.starts.length) - 1]!;
  }

  /** 0-based index of the line holding `offset`; ranges are built in order, so try the last line first. */
  private lineOf(offset: number): number {
    const s = this.starts;
    const i = this.last;
    if (s[i]! <= offset && (i + 1 >= s.length || offset < s[i + 1]!)) return i;
    let lo = 0;
    let hi = s.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (s[mid]! <= offset) lo = mid;
      else hi = mid - 1;
    }
    this.last = lo;
    return lo;
  }

  position(offset: number): { line: number; column: number } {
    const clamped = Math.min(Math.max(offset, 0), this.text.length);
    const i = this.lineOf(clamped);
    const start = this.starts[i]!;
    return { line: i + 1, column: this.codePoints(start, clamped) + 1 };
  }

  /** Code points in [from, to); a pair split by `to` counts as one. */
  private codePoints(from: number, to: number): number {
    if (!this.astral) return to - from;
    let n = 0;
    for (let k = from; k < to; k++) {
      if (k > from && isLow(this.text.charCodeAt(k)) && isHigh(this.text.charCodeAt(k - 1))) continue;
      n++;
    }
    return n;
  }

  /** The `length` code units of the text from `offset`. */
  textAt(offset: number, length: number): string {
    return this.text.slice(offset, offset + length);
  }

  /** A range over code-unit offsets [offset, endOffset). */
  range(offset: number, endOffset: number): SourceRange {
    const a = this.position(offset);
    const i = a.line - 1;
    // Most ranges are one token on one line of plain text: no second search.
    if (!this.astral && endOffset >= offset && (i + 1 >= this.starts.length || endOffset < this.starts[i + 1]!)) {
      return {
        line: a.line,
        column: a.column,
        endLine: a.line,
        endColumn: a.column + (endOffset - offset),
        offset,
        endOffset,
      };
    }
    const b = this.position(endOffset);
    return { line: a.line, column: a.column, endLine: b.line, endColumn: b.column, offset, endOffset };
  }

  /** The UTF-16 index in its line of a 1-based code-point column (for tools that slice strings). */
  unitColumn(line: number, column: number): number {
    const start = this.lineStart(line);
    if (!this.astral) return column - 1;
    let k = start;
    for (let n = 1; n < column && k < this.text.length && this.text[k] !== '\n'; n++) {
      k += isHigh(this.text.charCodeAt(k)) && isLow(this.text.charCodeAt(k + 1)) ? 2 : 1;
    }
    return k - start;
  }
}

const isHigh = (c: number): boolean => c >= 0xd800 && c <= 0xdbff;
const isLow = (c: number): boolean => c >= 0xdc00 && c <= 0xdfff;
