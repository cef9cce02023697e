/**
 * Property tests (fast-check): generated valid patterns survive
 * parse -> format -> parse unchanged, with no errors, and the weave engine
 * agrees their bead counts are right; arbitrary strings and bytes never make
 * the parser throw.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { format, parse, parseBytes } from '../../parser/index.js';
import type { Diagnostic } from '../../shared/diagnostic.js';
import { weave } from '../../shared/weave.js';
import { patternArb } from './generate.js';
import { normalise } from './normalise.js';

const errors = (r: { diagnostics: Diagnostic[] }): Diagnostic[] => r.diagnostics.filter((d) => d.severity === 'error');

describe('generated valid patterns', () => {
  test('parse -> format -> parse gives the same AST, and format is idempotent', () => {
    fc.assert(
      fc.property(patternArb, (text) => {
        const first = parse(text);
        expect(errors(first)).toEqual([]);
        const formatted = format(first.value);
        const second = parse(formatted);
        expect(errors(second)).toEqual([]);
        expect(normalise(second.value)).toEqual(normalise(first.value));
        expect(format(second.value)).toBe(formatted);
      }),
      { numRuns: 200 },
    );
  });

  test('the weave engine finds the bead counts right (the generator follows NOTATION.md section 3)', () => {
    fc.assert(
      fc.property(patternArb, (text) => {
        const r = weave(parse(text).value);
        expect(errors(r).map((d) => d.message)).toEqual([]);
      }),
      { numRuns: 100 },
    );
  });
});

const notationish = fc.string({
  unit: fc.constantFrom(...'row round rows: title:colors: note: ABCab*+-()x2 3#\n\n\t \r😀é\u0000'.split('')),
  maxLength: 200,
});

function wellFormed(text: string, r: ReturnType<typeof parse>): void {
  for (const d of r.diagnostics) {
    expect(d.range.line).toBeGreaterThanOrEqual(1);
    expect(d.range.column).toBeGreaterThanOrEqual(1);
    expect(d.range.offset).toBeLessThanOrEqual(d.range.endOffset);
    expect(d.range.endOffset).toBeLessThanOrEqual(text.length);
    expect(d.id).not.toBe('internal');
  }
  expect(() => format(r.value)).not.toThrow();
}

describe('arbitrary input', () => {
  test('arbitrary strings never make parse throw', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary', maxLength: 200 }), notationish), (text) =>
        wellFormed(text, parse(text)),
      ),
      { numRuns: 400 },
    );
  });

  test('arbitrary bytes never make parseBytes throw', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 200 }), (bytes) => {
        const r = parseBytes(bytes);
        expect(Array.isArray(r.diagnostics)).toBe(true);
        expect(() => format(r.value)).not.toThrow();
      }),
      { numRuns: 300 },
    );
  });
});
