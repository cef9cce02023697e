import { describe, expect, it } from 'vitest';
import { CSV_HEADER, materialOptions, renderTallyCsv, renderTallyTable } from '../../bin/commands/tally.js';
import { tally } from '../../shared/tally.js';
import { stripModel } from './fixture-strip.js';

/**
 * A reader for RFC 4180 CSV (section 2: fields split by commas, records by
 * CRLF, a quoted field may hold commas, line breaks and doubled quotes),
 * written from the RFC's grammar so the test does not trust our writer.
 */
function parseCsv(text: string): string[][] {
  const records: string[][] = [];
  let field = '';
  let record: string[] = [];
  let quoted = false;
  const endField = () => {
    record.push(field);
    field = '';
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted && ch === '"' && text[i + 1] === '"') {
      field += '"';
      i++;
    } else if (ch === '"') {
      quoted = !quoted;
    } else if (!quoted && ch === ',') {
      endField();
    } else if (!quoted && ch === '\r' && text[i + 1] === '\n') {
      endField();
      records.push(record);
      record = [];
      i++;
    } else {
      field += ch;
    }
  }
  if (field !== '' || record.length) {
    endField();
    records.push(record);
  }
  return records;
}

const options = materialOptions({
  name: 'tally',
  operands: ['x'],
  options: { spare: 0.1, workingLengthMm: 1500, tailMm: 150 },
});

describe('tally CSV', () => {
  const model = stripModel();
  model.palette[0]!.name = 'chalk, "matte"\nwhite';
  const t = tally(model, { beadsPerGram: { low: 100, high: 120 } }).value;

  it('parses back to the same figures, names with commas, quotes and line breaks included', () => {
    const rows = parseCsv(renderTallyCsv(t));
    expect(rows[0]).toEqual(CSV_HEADER);
    expect(rows.every((r) => r.length === CSV_HEADER.length)).toBe(true);
    const col = (name: string) => CSV_HEADER.indexOf(name);
    const colours = rows.filter((r) => r[0] === 'color');
    expect(
      colours.map((r) => [r[col('key')], r[col('name')], Number(r[col('beads')]), Number(r[col('buy_grams')])]),
    ).toEqual(t.colors.map((c) => [c.key, c.name, c.count, c.buyGrams]));
    const perRow = rows.filter((r) => r[0] === 'row').map((r) => Number(r[col('beads')]));
    const total = rows.find((r) => r[0] === 'total')!;
    expect(perRow.reduce((a, b) => a + b, 0)).toBe(Number(total[col('beads')]));
    expect(Number(rows.find((r) => r[0] === 'thread')![col('thread_mm')])).toBe(t.thread.mm);
  });
});

describe('tally table', () => {
  const t = tally(stripModel(), { beadsPerGram: { low: 100, high: 120 } }).value;

  it('shows colours, rows with a running total, thread and size in mm and inches', () => {
    const out = renderTallyTable(t, options, false);
    expect(out).toMatch(/A\s+chalk\s+2\s+0\.02-0\.02 g\s+1 g/);
    expect(out).toMatch(/^\s+1\s+2\s+7\s+7$/m);
    expect(out).toContain('1 thread of 150 cm with a 15 cm tail at each end');
    // 7.6 mm / 25.4 mm per inch = 0.30 in.
    expect(out).toContain('7.6 x 3.8 mm (0.30 x 0.15 in)');
  });

  it('draws truecolour swatches only when colour is on', () => {
    expect(renderTallyTable(t, options, false)).not.toContain('\x1b[');
    expect(renderTallyTable(t, options, true)).toContain('\x1b[48;2;46;111;142m');
  });

  it('lines the columns up on a colour terminal as without colour: escapes take no room', () => {
    const esc = String.fromCharCode(27);
    const shown = (s: string): string => s.replace(new RegExp(`${esc}\\[[0-9;]*m`, 'g'), '');
    const colourLines = renderTallyTable(t, options, true)
      .split('\n')
      .slice(3, 3 + 1 + t.colors.length);
    const plainLines = renderTallyTable(t, options, false)
      .split('\n')
      .slice(3, 3 + 1 + t.colors.length);
    // The swatch is four cells wide plus two of gap, so every line is six wider, header included.
    colourLines.forEach((line, i) => {
      expect(shown(line).length).toBe(plainLines[i]!.length + 6);
    });
  });

  it('reads the options args.ts hands over, with the design defaults', () => {
    expect(materialOptions({ name: 'kit', operands: [], options: {} })).toEqual({
      spare: 0.1,
      workingLengthMm: 1500,
      tailMm: 150,
    });
    expect(materialOptions({ name: 'kit', operands: [], options: { pack: 5 } }).packGrams).toBe(5);
  });
});
