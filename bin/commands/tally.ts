/**
 * `fourfold tally FILE [--format table|csv|json]`: beads per colour and per
 * row, grams, buy amounts and thread. Also home of what `steps` and `kit`
 * share: reading and compiling a pattern that must be error-free before any
 * material list is printed (a partial count would mislead a buyer).
 */
import { colorName } from '../../shared/color-name.js';
import { hasErrors } from '../../shared/diagnostic.js';
import type { Model } from '../../shared/model.js';
import {
  DEFAULT_SPARE,
  DEFAULT_TAIL_MM,
  DEFAULT_WORKING_LENGTH_MM,
  MM_PER_INCH,
  tally,
  type Tally,
  type TallyOptions,
} from '../../shared/tally.js';
import { EXIT_FAILURE, EXIT_OK, EXIT_PATTERN_ERRORS, useColor, type CliIO, type ParsedCommand } from '../command.js';
import { compilePattern } from '../read-input.js';

/** What each command that needs an error-free pattern would have printed. */
const PRODUCT: Record<string, string> = { tally: 'tally', steps: 'steps', kit: 'kit sheet' };

/** The model of the one operand, or the exit code to return when there is none to use. */
export async function loadModel(cmd: ParsedCommand, io: CliIO): Promise<Model | number> {
  const compiled = await compilePattern(cmd.operands[0]!, io);
  if (typeof compiled === 'number') return compiled;
  if (!hasErrors(compiled.diagnostics)) return compiled.value.model;
  // After a screen of diagnostics, one line says why standard output stayed empty.
  const what = PRODUCT[cmd.name] ?? cmd.name;
  io.stderr.write(`fourfold: no ${what} for '${compiled.file}': fix the errors above first\n`);
  return EXIT_PATTERN_ERRORS;
}

export type MaterialOptions = Required<Omit<TallyOptions, 'packGrams' | 'beadsPerGram'>> &
  Pick<TallyOptions, 'packGrams'>;

/** The materials options as args.ts hands them over (spare a fraction, lengths in mm, pack in grams). */
export function materialOptions(cmd: ParsedCommand): MaterialOptions {
  const o = cmd.options;
  return {
    spare: typeof o.spare === 'number' ? o.spare : DEFAULT_SPARE,
    workingLengthMm: typeof o.workingLengthMm === 'number' ? o.workingLengthMm : DEFAULT_WORKING_LENGTH_MM,
    tailMm: typeof o.tailMm === 'number' ? o.tailMm : DEFAULT_TAIL_MM,
    ...(typeof o.pack === 'number' ? { packGrams: o.pack } : {}),
  };
}

/** The tally of the operand, or an exit code; option problems are usage errors (exit 2). */
export async function loadTally(
  cmd: ParsedCommand,
  io: CliIO,
): Promise<{ model: Model; tally: Tally; options: MaterialOptions } | number> {
  const model = await loadModel(cmd, io);
  if (typeof model === 'number') return model;
  const options = materialOptions(cmd);
  const result = tally(model, options);
  if (hasErrors(result.diagnostics)) {
    for (const d of result.diagnostics) io.stderr.write(`fourfold: ${d.message}\n`);
    return EXIT_FAILURE;
  }
  return { model, tally: result.value, options };
}

// eslint-disable-next-line no-control-regex -- ANSI escapes are exactly what is matched
const ANSI_ESCAPE = /\x1b\[[0-9;]*m/g;
/** Characters a terminal shows: a swatch's colour escapes take no room. */
const width = (s: string): number => [...s.replace(ANSI_ESCAPE, '')].length;
const padEnd = (s: string, n: number): string => s + ' '.repeat(Math.max(0, n - width(s)));
const padStart = (s: string, n: number): string => ' '.repeat(Math.max(0, n - width(s))) + s;

/** Columns that line up; `right` marks the numeric ones. */
function columns(header: string[], rows: string[][], right: boolean[]): string[] {
  const widths = header.map((h, i) => Math.max(width(h), ...rows.map((r) => width(r[i] ?? ''))));
  const line = (cells: string[]) =>
    `  ${cells.map((c, i) => (right[i] ? padStart(c, widths[i]!) : padEnd(c, widths[i]!))).join('  ')}`.trimEnd();
  return [line(header), ...rows.map(line)];
}

/** A block of background colour (ANSI 24-bit), only ever written when colour is on. */
function swatch(hex: string): string {
  const n = Number.parseInt(hex.slice(1), 16);
  return `\x1b[48;2;${(n >> 16) & 255};${(n >> 8) & 255};${n & 255}m    \x1b[0m`;
}

const metres = (mm: number): string => `${(mm / 1000).toFixed(2)} m`;
const cm = (mm: number): string => `${Math.round(mm / 10)} cm`;
const inches = (mm: number): string => (mm / MM_PER_INCH).toFixed(2);

export function renderTallyTable(t: Tally, o: MaterialOptions, color: boolean): string {
  const out = [`${t.title}: ${t.beads} beads, ${t.units} units`, '', 'Colours'];
  const colourRows = t.colors.map((c) => [
    c.key,
    ...(color ? [swatch(c.hex)] : []),
    colorName(c),
    String(c.count),
    `${c.grams.low.toFixed(2)}-${c.grams.high.toFixed(2)} g`,
    `${c.buyGrams} g`,
  ]);
  const head = ['key', ...(color ? ['    '] : []), 'name', 'count', 'grams', 'buy'];
  out.push(
    ...columns(
      head,
      colourRows,
      head.map((_, i) => i >= head.length - 3),
    ),
  );
  let running = 0;
  const rowRows = t.rows.map((r) => [String(r.row), String(r.units), String(r.beads), String((running += r.beads))]);
  out.push('', 'Rows', ...columns(['row', 'units', 'beads', 'total'], rowRows, [true, true, true, true]));
  const pack = o.packGrams ? `, in whole packs of ${o.packGrams} g` : '';
  out.push(
    '',
    `Buy: the high estimate plus ${Math.round(t.spare * 100)}% spare, rounded up${pack}.`,
    `Thread: ${metres(t.thread.mm)} in all, as ${t.thread.threads} thread${t.thread.threads === 1 ? '' : 's'} of ${cm(o.workingLengthMm)} ` +
      `with a ${cm(o.tailMm)} tail at each end.`,
    `Finished size: ${t.size.widthMm} x ${t.size.heightMm} mm (${inches(t.size.widthMm)} x ${inches(t.size.heightMm)} in).`,
  );
  return `${out.join('\n')}\n`;
}

/** RFC 4180 field: quoted when it holds a comma, quote or line break. */
const csvField = (v: string | number): string => {
  const s = String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};

export const CSV_HEADER = [
  'kind',
  'key',
  'name',
  'hex',
  'row',
  'units',
  'beads',
  'grams_low',
  'grams_high',
  'buy_grams',
  'thread_mm',
  'threads',
];

/** One table for spreadsheets: a line per colour, per row, the totals and the thread. */
export function renderTallyCsv(t: Tally): string {
  const blank = (n: number) => Array<string>(n).fill('');
  const lines: (string | number)[][] = [
    CSV_HEADER,
    ...t.colors.map((c) => [
      'color',
      c.key,
      c.name,
      c.hex,
      '',
      '',
      c.count,
      c.grams.low,
      c.grams.high,
      c.buyGrams,
      '',
      '',
    ]),
    ...t.rows.map((r) => ['row', ...blank(3), r.row, r.units, r.beads, ...blank(5)]),
    ['total', ...blank(4), t.units, t.beads, ...blank(5)],
    ['thread', ...blank(9), t.thread.mm, t.thread.threads],
  ];
  return lines.map((l) => l.map(csvField).join(',')).join('\r\n') + '\r\n';
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const loaded = await loadTally(cmd, io);
  if (typeof loaded === 'number') return loaded;
  const { tally: t, options } = loaded;
  const render: Record<string, () => string> = {
    json: () => `${JSON.stringify(t, null, 2)}\n`,
    csv: () => renderTallyCsv(t),
    table: () => renderTallyTable(t, options, useColor(io, 'stdout')),
  };
  io.stdout.write((render[String(cmd.options.format)] ?? render.table!)());
  return EXIT_OK;
}
