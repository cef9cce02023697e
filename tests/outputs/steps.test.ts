import { describe, expect, it } from 'vitest';
import { XMLValidator } from 'fast-xml-parser';
import { buildSteps } from '../../shared/steps.js';
import {
  renderStepsHtml,
  renderStepsMarkdown,
  renderStepsText,
  rowHeading,
  unitHeading,
} from '../../shared/steps-render.js';
import { compile } from '../../shared/compile.js';
import { tally } from '../../shared/tally.js';
import { stripModel } from './fixture-strip.js';

describe('steps document on a hand-built strip', () => {
  const model = stripModel();
  const doc = buildSteps(model);
  const row = doc.rows[0]!;

  it('has a glossary of the words a beginner might not know, before any row', () => {
    expect(doc.glossary.map((g) => g.term)).toEqual(['unit', 'pick up', 'pass through', 'side beads', 'cue']);
    const text = renderStepsText(doc);
    expect(text.indexOf('pick up:')).toBeLessThan(text.indexOf('Row 1'));
    // No increase or fresh ring in this piece, so those words are not explained.
    expect(text).not.toContain('increase');
  });

  it('gives each row a header whose bead count matches the pick-ups and the tally', () => {
    const t = tally(model, { beadsPerGram: { low: 100, high: 120 } }).value;
    expect(row.beads).toBe(t.rows[0]!.beads);
    expect(row.units).toBe(2);
    expect(row.direction).toBe('working left to right');
    expect(row.notes).toEqual(['Leave a long tail.']);
  });

  it('says where the first bead goes only when the colours differ', () => {
    expect(row.steps.map((s) => s.cue)).toEqual(['first bead on the right side', 'first bead on top']);
    const plain = stripModel();
    plain.steps[1]!.cue = false;
    expect(buildSteps(plain).rows[0]!.steps[1]!.cue).toBeUndefined();
  });

  it('names what to pick up and what closes the unit, by key, name and place', () => {
    const [pick, close] = row.steps[1]!.round;
    expect(pick!.kind).toBe('pickup');
    expect(pick!.beads.map((b) => b.key).join('')).toBe('BCA');
    // Unit 2 is worked right of unit 1, so the bead it shares is on its left.
    expect(close).toEqual({ kind: 'pass', beads: [{ key: 'A', name: 'chalk', where: 'left side' }] });
    expect(renderStepsText(doc)).toContain('Pass through the left side (A chalk) to close the unit.');
  });

  it('counts the side beads the row shows after each unit (strip: units + 1)', () => {
    expect(row.steps.map((s) => s.sideBeads)).toEqual([2, 3]);
  });

  it('says what to pass through to move on, from where the needle is', () => {
    const m = stripModel();
    m.steps[0]!.moveOn = [1, 0];
    const moveOn = buildSteps(m).rows[0]!.steps[0]!.moveOn;
    expect(moveOn.map((b) => b.where)).toEqual(['top', 'right side']);
    expect(renderStepsText(buildSteps(m))).toContain(
      'To move on, pass through the top (B deep teal), then the right side (A chalk).',
    );
  });

  it('renders HTML that is well-formed XML, with every text escaped', () => {
    const html = renderStepsHtml(doc);
    expect(XMLValidator.validate(html)).toBe(true);
    // The validator does reject what a browser would silently repair.
    expect(XMLValidator.validate(html.replace('</dl>', ''))).not.toBe(true);
    expect(html).toContain('<title>Two &lt;Units&gt; &amp; Co</title>');
    expect(html).not.toContain('<Units>');
    expect(html).toContain('garnet &quot;dark&quot;');
  });

  it('escapes Markdown in names and titles', () => {
    const m = stripModel();
    m.palette[1]!.name = '*bold* [link](x)';
    const out = renderStepsMarkdown(buildSteps(m));
    expect(out).toContain('\\*bold\\* \\[link\\](x)');
    expect(out.startsWith('# Two \\<Units\\> \\& Co\n')).toBe(true);
  });

  it('says that a ring of four closes through its own first bead, and only there', () => {
    // common practice: a fresh ring of four beads is closed by passing through the first bead again (NOTATION.md 4, rule 1).
    const [first, second] = row.steps;
    const passes = (s: typeof first) => s!.round.filter((m) => m.kind === 'pass').flatMap((m) => m.beads);
    expect(passes(first).map((b) => b.where)).toEqual(['right side, the first bead of this unit']);
    expect(passes(second).some((b) => b.where.includes('first bead of this unit'))).toBe(false);
  });

  it('starts with the thread length and the tail, before the first row, in every format', () => {
    // common practice: a working thread of about an arm's span, a tail to hold (the tally's defaults, 150 cm and 15 cm).
    expect(doc.start).toContain('about 150 cm');
    expect(doc.start).toContain('row 1, unit 1');
    expect(doc.start).toContain('about 15 cm from the end');
    const text = renderStepsText(doc);
    expect(text).toContain(`\nStarting:\n  ${doc.start}\n\nRow 1:`);
    expect(renderStepsMarkdown(doc)).toContain(`## Starting\n\n${doc.start}\n`);
    expect(renderStepsHtml(doc)).toContain(`<h2>Starting</h2>\n<p>${doc.start}</p>`);
  });

  it('ends with how to secure the thread and the starting tail, in every format', () => {
    // common practice: end off by passing back through a few units, a knot between beads, then trimming.
    expect(doc.finish).toMatch(/^When the last unit is done, take the needle back through/);
    expect(doc.finish).toContain('tail left at the start');
    const text = renderStepsText(doc);
    expect(text.endsWith(`\nFinishing:\n  ${doc.finish}\n`)).toBe(true);
    expect(renderStepsMarkdown(doc)).toContain(`## Finishing\n\n${doc.finish}\n`);
    expect(renderStepsHtml(doc)).toContain(`<h2>Finishing</h2>\n<p>${doc.finish}</p>`);
  });

  it('is plain JSON for --format json', () => {
    expect(JSON.parse(JSON.stringify(doc))).toEqual(doc);
    expect(doc.schema).toBe('fourfold.steps/1');
  });
});

describe('the unit that closes a round', () => {
  it('is named in the heading of the last unit of every row of a tube, and nowhere in a flat piece', () => {
    const tube = compile('title: T\nlayout: tube\ncolors:\n  A red\nround 1: AAAA AAA AAA AA\nround 2: AAA AA AA A\n');
    const doc = buildSteps(tube.value.model);
    for (const row of doc.rows) {
      expect(row.steps.map((s) => s.closes === true)).toEqual([false, false, false, true]);
      expect(unitHeading(row.steps[3]!)).toMatch(/^Unit 4 \(joins up with unit 1/);
    }
    expect(
      buildSteps(stripModel())
        .rows.flatMap((r) => r.steps)
        .some((s) => s.closes),
    ).toBe(false);
  });
});

describe('rows that leave beads of the row below uncovered', () => {
  const stepsOf = (lines: string[]) => {
    const compiled = compile(['title: T', ...lines, ''].join('\n'));
    expect(compiled.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    return buildSteps(compiled.value.model);
  };

  it('counts the skips at the start and the end of a narrowing flat row, in the heading', () => {
    const doc = stepsOf(['colors:', '  A red', 'row 1: AAAA AAA AAA AAA', 'row 2: - AAA AA -']);
    expect(doc.rows[0]!.uncovered).toBeUndefined();
    expect(doc.rows[1]!.uncovered).toEqual({ start: 1, end: 1, along: 0 });
    expect(renderStepsText(doc)).toContain(
      'Row 2: 2 units, 5 new beads, working right to left, leaving 1 bead of row 1 uncovered at the start and 1 at the end\n',
    );
  });

  it('counts a flat row that stops short without a skip, and a skip inside a round', () => {
    const flat = stepsOf(['colors:', '  A red', 'row 1: AAAA AAA AAA', 'row 2: AAA']);
    // Row 2 is worked right to left, so the two bare tops are at its end.
    expect(flat.rows[1]!.uncovered).toEqual({ start: 0, end: 2, along: 0 });
    const round = stepsOf([
      'layout: round',
      'colors:',
      '  A red',
      'round 1: AAAA (AAA)x4 AA',
      'round 2: AAA AA - AA AA A',
    ]);
    expect(round.rows[1]!.uncovered).toEqual({ start: 0, end: 0, along: 1 });
    expect(rowHeading(round.rows[1]!)).toMatch(/, leaving 1 bead of round 1 uncovered along the way$/);
  });
});
