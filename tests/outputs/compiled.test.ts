/**
 * The outputs on real models from the engine: every example, plus small
 * patterns whose counts have closed forms (NOTATION.md section 8).
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { XMLValidator } from 'fast-xml-parser';
import { compile } from '../../shared/compile.js';
import { hasErrors } from '../../shared/diagnostic.js';
import { renderKitHtml, renderKitMarkdown } from '../../shared/kit.js';
import { materialChecks } from '../../shared/color-checks.js';
import { expectGolden } from '../golden.js';
import { buildSteps } from '../../shared/steps.js';
import { renderStepsHtml, renderStepsText } from '../../shared/steps-render.js';
import { pathLengthMm, tally } from '../../shared/tally.js';

const GOLDEN = join('tests', 'outputs', 'golden');
const OWN = join('tests', 'outputs', 'patterns');
const patternsIn = (dir: string): string[] =>
  existsSync(dir)
    ? readdirSync(dir)
        .filter((f) => f.endsWith('.ffp'))
        .sort()
        .map((f) => join(dir, f))
    : [];
/** The project's examples, and invented patterns of our own so every layout has a golden file. */
const examples = [...patternsIn('examples'), ...patternsIn(OWN)];
const kitOptions = { workingLengthMm: 1500, tailMm: 150 };

function compiled(text: string) {
  const result = compile(text);
  expect(result.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
  return result.value;
}

const header = (layout = 'flat') =>
  `title: Test piece\nlayout: ${layout}\ncolors:\n  A #f4f1ea chalk\n  B #2e6f8e deep teal\n`;

describe('outputs on closed forms', () => {
  it('counts a strip of n units as 3n + 1 beads, and its thread grows with it', () => {
    // Source: NOTATION.md section 8 (a strip of n units has 3n + 1 beads).
    let lastPath = 0;
    for (const n of [1, 2, 3, 6, 10]) {
      const rest = n > 1 ? ` (ABA)x${n - 1}` : '';
      const { model } = compiled(`${header()}row 1: AAAA${rest}\n`);
      const t = tally(model, {}).value;
      expect(t.beads).toBe(3 * n + 1);
      expect(t.rows.reduce((s, r) => s + r.beads, 0)).toBe(t.beads);
      expect(t.colors.reduce((s, c) => s + c.count, 0)).toBe(t.beads);
      const path = pathLengthMm(model);
      expect(path).toBeGreaterThan(lastPath);
      lastPath = path;
    }
  });

  it('counts a panel of n units by r rows as n(r+1) + r(n+1) beads', () => {
    // Source: edges of an n x r grid graph, Weisstein, MathWorld "Grid Graph"; NOTATION.md section 8.
    const text = `${header()}row 1: AAAA ABA ABA\nrow 2: AAA AB AB\nrow 3: BBB BA BA\n`;
    const t = tally(compiled(text).model, {}).value;
    expect(t.beads).toBe(3 * 4 + 3 * 4);
    expect(t.units).toBe(9);
    expect(t.rows.map((r) => r.beads)).toEqual([10, 7, 7]);
  });
});

describe('outputs of a pattern with errors (the server shows what could be built)', () => {
  it('builds steps and a tally of the part that exists, without throwing', () => {
    const text = `${header()}row 1: AAAA ABA\nrow 2: AAA ABB AB\nrow 3: BBB BA\n`;
    const result = compile(text);
    expect(result.diagnostics.map((d) => d.id)).toContain('bead-count');
    const doc = buildSteps(result.value.model);
    expect(XMLValidator.validate(renderStepsHtml(doc))).toBe(true);
    const t = tally(result.value.model, {}).value;
    expect(t.beads).toBe(result.value.model.beads.length);
    expect(t.rows.reduce((s, r) => s + r.beads, 0)).toBe(t.beads);
  });
});

describe('material checks on written patterns', () => {
  it('warns on the second colour line when two colours look alike', () => {
    const text = 'title: Close\ncolors:\n  A #2e6f8e teal\n  B #f4f1ea chalk\n  C #2f6f8e teal too\nrow 1: AAAA BCB\n';
    const d = materialChecks(compiled(text));
    expect(d.map((x) => [x.id, x.range.line])).toEqual([['similar-colors', 5]]);
  });

  it('warns that a round with no increases cups, on that round line, and that one with many ruffles', () => {
    const base = `${header('round')}round 1: AAAA AAA AAA AAA AAA AA\nround 2: BBB +BBB BB +BBB BB +BBB BB +BBB BB +BBB BB +BB\n`;
    // Round 2 adds 6 units to round 1 (within 0.6-1.4 x 2 pi); round 3 adds none.
    const cup = materialChecks(compiled(`${base}round 3: AAA ${'AA '.repeat(10)}A\n`));
    expect(cup.map((x) => [x.id, x.range.line, /cup/.test(x.message)])).toEqual([['flat-circle', 8, true]]);
    expect(cup[0]!.message).toContain('adds 0 units');
    // 12 units on round 2's 12 top beads plus 9 increases: 9 added, above 1.4 x 2 pi = 8.8.
    const ruffle = materialChecks(compiled(`${base}round 3: AAA ${'+AAA AA '.repeat(9)}AA A\n`));
    expect(ruffle.map((x) => [x.id, /ruffle/.test(x.message)])).toEqual([['flat-circle', true]]);
    expect(ruffle[0]!.message).toContain('adds 9 units');
  });
});

describe.each(examples)('example %s', (file) => {
  const text = readFileSync(file, 'utf8');
  const result = compile(text);
  const { model } = result.value;
  const clean = !hasErrors(result.diagnostics);

  it('tallies every bead once: totals, rows and colours agree with the model', () => {
    const t = tally(model, {}).value;
    expect(t.beads).toBe(model.beads.length);
    expect(t.rows.reduce((s, r) => s + r.beads, 0)).toBe(t.beads);
    expect(t.colors.reduce((s, c) => s + c.count, 0)).toBe(t.beads);
    for (const c of t.colors) {
      expect(c.grams.low).toBeLessThanOrEqual(c.grams.high);
      expect(c.buyGrams).toBeGreaterThanOrEqual(c.grams.high * (1 + t.spare) - 1e-9);
    }
  });

  it('has steps whose pick-ups add up to every bead, as well-formed HTML', () => {
    const doc = buildSteps(model);
    const picked = doc.rows.reduce((s, r) => s + r.beads, 0);
    if (clean) expect(picked).toBe(model.beads.length);
    expect(XMLValidator.validate(renderStepsHtml(doc))).toBe(true);
  });

  it('has a well-formed kit sheet with the caution', () => {
    const t = tally(model, {}).value;
    expect(XMLValidator.validate(renderKitHtml(model, t, kitOptions))).toBe(true);
    expect(renderKitMarkdown(model, t, kitOptions)).toContain('small parts');
  });

  it('material checks run without throwing and point at real lines', () => {
    const lines = text.split('\n').length;
    for (const d of materialChecks(result.value)) expect(d.range.line).toBeLessThanOrEqual(lines);
  });

  it('matches its golden steps text', () => {
    // Examples keep their golden files in golden/; our own patterns keep theirs beside them.
    const dir = file.startsWith(OWN) ? OWN : GOLDEN;
    expectGolden(join(dir, `${basename(file, '.ffp')}.steps.txt`), renderStepsText(buildSteps(model)));
  });
});
