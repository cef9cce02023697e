/**
 * `convertOrder`: pick-up order and placed order describe the same piece, so
 * converting and weaving again gives the same bead colours at the same places.
 */
import { describe, expect, test } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { convertOrder } from '../../shared/order.js';
import { compile } from '../../shared/compile.js';
import { compileAst } from '../../shared/weave-model.js';
import { format, parse } from '../../parser/index.js';
import type { Model } from '../../shared/model.js';
import { pattern } from './build-ast.js';

const colours = (m: Model) =>
  m.units.map((u) => ['base', 'far', 'top', 'near'].map((p) => m.beads[u.places[p as 'base']!]!.color).join(''));

describe('convertOrder', () => {
  test('the worked check: row 1: ABCD BCA CAB in pick-up order is DABC ACB CAB in placed order', () => {
    // Source: NOTATION.md section 4, "Worked check".
    const placed = convertOrder(pattern('flat', ['ABCD BCA CAB']), 'placed');
    expect(placed.diagnostics).toEqual([]);
    expect(placed.value.header.order).toBe('placed');
    expect(placed.value.rows[0]!.items.map((i) => (i.type === 'unit' ? i.keys : '?'))).toEqual(['DABC', 'ACB', 'CAB']);
    const back = convertOrder(placed.value, 'pickup');
    expect(back.value.rows[0]!.items.map((i) => (i.type === 'unit' ? i.keys : '?'))).toEqual(['ABCD', 'BCA', 'CAB']);
  });

  test('a group whose repetitions differ once converted is written out in full; others stay grouped', () => {
    const text = [
      'title: Group test',
      'colors:',
      '  A #ffffff',
      '  B #000000',
      'row 1: AAAA (ABB)x2',
      'row 2: AAA (AB)x2',
      'rows 3-4: AAA AA AA',
      '',
    ].join('\n');
    const parsed = parse(text);
    expect(parsed.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const out = format(convertOrder(parsed.value, 'placed').value);
    expect(out).toMatch(/^order:\s+placed$/m);
    const again = compile(out);
    expect(again.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(colours(again.value.model)).toEqual(colours(compile(text).value.model));
    // Row 1's units 2 and 3 go round opposite ways, so (ABB)x2 in pick-up order is not one repeat in placed order.
    expect(out).not.toMatch(/row 1: .*\(/);
    expect(out).toMatch(/rows 3-4: AAA AA AA/);
  });

  test('round trip over random flat pieces and tubes keeps every bead colour in place', () => {
    const unit = (n: number) => fc.stringMatching(new RegExp(`^[ABC]{${n}}$`));
    const rowsArb = fc
      .integer({ min: 2, max: 6 })
      .chain((n) =>
        fc.tuple(
          fc.constantFrom('flat' as const, 'tube' as const),
          fc.array(fc.array(unit(2), { minLength: n - 2, maxLength: n - 2 }), { minLength: 0, maxLength: 4 }),
          fc.tuple(
            unit(4),
            fc.array(unit(3), { minLength: n - 2, maxLength: n - 2 }),
            unit(3),
            unit(2),
            unit(3),
            unit(1),
          ),
        ),
      );
    fc.assert(
      fc.property(rowsArb, ([layout, middles, [first, mids, last3, last2, start3, last1]]) => {
        const row1 = [first, ...mids, layout === 'tube' ? last2 : last3].join(' ');
        const later = middles.map((m) => [start3, ...m, layout === 'tube' ? last1 : (m[0] ?? last2)].join(' '));
        const ast = pattern(layout, [row1, ...later]);
        const before = compileAst(ast);
        expect(before.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
        const placed = convertOrder(ast, 'placed');
        expect(colours(compileAst(placed.value).value.model)).toEqual(colours(before.value.model));
        const back = convertOrder(placed.value, 'pickup');
        expect(colours(compileAst(back.value).value.model)).toEqual(colours(before.value.model));
      }),
      { numRuns: 200 },
    );
  });

  test('a pattern with weave errors is returned unchanged, with the errors', () => {
    const ast = pattern('flat', ['AAAA AA']);
    const r = convertOrder(ast, 'placed');
    expect(r.value).toBe(ast);
    expect(r.diagnostics.map((d) => d.id)).toEqual(['bead-count']);
  });
});

describe('every example converts both ways to the identical piece', () => {
  const files = readdirSync('examples').filter((f) => f.endsWith('.ffp'));
  test.each(files)('%s', (file) => {
    const text = readFileSync(join('examples', file), 'utf8');
    const original = compile(text).value.model;
    const other = original.header.order === 'pickup' ? 'placed' : 'pickup';
    const converted = format(convertOrder(parse(text).value, other).value);
    const again = compile(converted);
    expect(again.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(again.value.model.header.order).toBe(other);
    expect(colours(again.value.model)).toEqual(colours(original));
    const back = compile(format(convertOrder(parse(converted).value, original.header.order).value)).value.model;
    expect(colours(back)).toEqual(colours(original));
  });
});
