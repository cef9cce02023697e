/**
 * Every example's model against its golden JSON, and every model (examples
 * and generated shapes) against the published JSON Schema, validated with
 * ajv (a reference JSON Schema 2020-12 validator).
 */
import { describe, expect, test } from 'vitest';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { compile } from '../../shared/compile.js';
import { compileAst } from '../../shared/weave-model.js';
import type { Model } from '../../shared/model.js';
import { fanRows, panelRows, pattern, tubeRows } from './build-ast.js';
import { expectGolden } from '../golden.js';

const schema = JSON.parse(readFileSync('shared/schema/model.schema.json', 'utf8')) as object;
const validate = new Ajv2020({ allErrors: true, strict: true }).compile(schema);
const valid = (m: Model) => {
  const ok = validate(JSON.parse(JSON.stringify(m)));
  return ok ? [] : validate.errors!.map((e) => `${e.instancePath} ${e.message ?? ''}`);
};

const examples = existsSync('examples')
  ? readdirSync('examples')
      .filter((f) => f.endsWith('.ffp'))
      .sort()
  : [];
const goldenDir = 'tests/engine/golden';

describe.runIf(examples.length > 0)('examples', () => {
  test.each(examples)('%s: model matches its golden JSON and the schema', (file) => {
    const { value, diagnostics } = compile(readFileSync(join('examples', file), 'utf8'));
    expect(diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(valid(value.model)).toEqual([]);
    const text = `${JSON.stringify(value.model, null, 1)}\n`;
    expectGolden(join(goldenDir, file.replace(/\.ffp$/, '.model.json')), text);
  });
});

describe('schema', () => {
  test.each([
    ['panel', pattern('flat', panelRows(4, 3))],
    ['fan', pattern('flat', fanRows(4))],
    ['tube', pattern('tube', tubeRows(5, 3))],
    ['round with increases', pattern('round', ['AAAA AAA AA', 'AAA +AAA AA +AAA A', 'BBB BB BB BB BB B'])],
    ['broken rows', pattern('flat', ['AAAA AAA AAA', 'AAA AAA AA', 'AAA AA'])],
    ['placed order', pattern('flat', ['DABC ACB CAB'], 'placed')],
  ])('%s validates', (_name, ast) => {
    expect(valid(compileAst(ast).value.model)).toEqual([]);
  });

  test('the schema rejects a model that breaks it', () => {
    const m = compileAst(pattern('flat', panelRows(2, 2))).value.model;
    const broken = { ...m, beads: m.beads.map((b, i) => (i === 0 ? { ...b, units: [0, 1, 2] } : b)) };
    expect(valid(broken as Model)).not.toEqual([]);
  });
});

test('a model of a pattern the parser had to recover from still validates', () => {
  // Row numbers are kept as written (here the parser recovered a row without one), so they may be 0.
  expect(valid(compile('\u0000 row row ((((\nrow 2: AAAA').value.model)).toEqual([]);
});

describe.runIf(examples.length > 0)('examples meet the closed forms of their shapes', () => {
  // Source: NOTATION.md section 8 (panel: Weisstein, MathWorld "Grid Graph"; Euler: Levin, "Discrete Mathematics: An Open Introduction").
  test.each(examples)('%s', (file) => {
    const m = compile(readFileSync(join('examples', file), 'utf8')).value.model;
    const widths = m.rows.map((r) => r.units.length);
    const R = widths.length;
    const euler = m.junctions.length - m.beads.length + m.units.length + m.beads.filter((b) => b.gap).length;
    if (m.header.layout === 'tube') {
      expect(new Set(widths).size).toBe(1);
      expect(m.beads.length).toBe(widths[0]! * (2 * R + 1));
      expect(euler).toBe(0);
    } else if (m.header.layout === 'round') {
      expect(euler).toBe(0);
    } else {
      expect(euler).toBe(1);
      if (new Set(widths).size === 1) expect(m.beads.length).toBe(widths[0]! * (R + 1) + R * (widths[0]! + 1));
      if (widths.every((w, i) => w === 2 * i + 1)) expect(m.beads.length).toBe(2 * R * R + 3 * R - 1);
    }
  });
});
