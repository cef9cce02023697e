import { describe, expect, it } from 'vitest';
import { XMLValidator } from 'fast-xml-parser';
import { renderKitHtml, renderKitMarkdown, toolSuggestion } from '../../shared/kit.js';
import { SMALL_PARTS_CAUTION } from '../../shared/caution.js';
import { tally } from '../../shared/tally.js';
import { stripModel } from './fixture-strip.js';

const options = { workingLengthMm: 1500, tailMm: 150 };

describe('kit sheet', () => {
  const model = stripModel();
  const t = tally(model, { beadsPerGram: { low: 100, high: 120 } }).value;

  it('lists each used colour with count and buy amount, and leaves out unused ones', () => {
    const out = renderKitMarkdown(model, t, options);
    expect(out).toContain('| A | #f4f1ea | chalk | 2 | 0.02-0.02 g | 1 g |');
    expect(out).not.toContain('unused');
    // 7.6 mm and 3.8 mm at 25.4 mm to the inch.
    expect(out).toContain('7.6 x 3.8 mm (0.30 x 0.15 in)');
  });

  it('names a colour written without a name by its CSS name', () => {
    const m = stripModel();
    // Source: CSS Color Module Level 4, section 6.1: crimson is #dc143c.
    m.palette[0] = { ...m.palette[0]!, name: '', hex: '#dc143c' };
    const tallied = tally(m, { beadsPerGram: { low: 100, high: 120 } }).value;
    expect(renderKitMarkdown(m, tallied, options)).toContain('| A | #dc143c | crimson | 2 |');
  });

  it('buys whole packs when a pack size is given', () => {
    const packed = tally(model, { beadsPerGram: { low: 100, high: 120 }, packGrams: 5 }).value;
    expect(renderKitMarkdown(model, packed, { ...options, packGrams: 5 })).toContain('1 x 5 g pack (5 g)');
  });

  it('gives thread, needle and thread size, and the small-parts caution', () => {
    const out = renderKitMarkdown(model, t, options);
    expect(out).toContain(`${Math.round(t.thread.mm / 10)} cm of thread in all, as 1 thread of 150 cm`);
    expect(out).toContain('Needle: size 10 or 12 beading needle.');
    expect(out).toContain(SMALL_PARTS_CAUTION);
    expect(renderKitHtml(model, t, options)).toContain(SMALL_PARTS_CAUTION);
  });

  it('has a suggestion for every bead size of NOTATION.md section 2', () => {
    for (const size of ['15/0', '11/0', '8/0', '6/0']) expect(toolSuggestion(size)).not.toBeNull();
    expect(toolSuggestion('3/0')).toBeNull();
  });

  it('renders well-formed, escaped HTML even for hostile names', () => {
    const m = stripModel();
    m.palette[0]!.name = '<script>alert(1)</script>';
    m.palette[1]!.hex = '#fff;background:url(x)';
    const html = renderKitHtml(m, tally(m, { beadsPerGram: { low: 100, high: 120 } }).value, options);
    expect(XMLValidator.validate(html)).toBe(true);
    expect(html).not.toContain('<script>');
    expect(html).not.toContain('url(x)"');
  });
});
