/**
 * The human form of diagnostics, for the terminal and the golden error files:
 *
 *   file:line:col: severity[id]: message
 *     2 | row 1: BBBB
 *   > 3 | row 2: *AAAA BA +AAAA
 *       |                 ^^^^^
 *   hint: ...
 *
 * ANSI colour only when asked for; the caller decides (TTY, NO_COLOR).
 */
import { codeFrameColumns } from '@babel/code-frame';
import type { Diagnostic, Severity } from './diagnostic.js';

export interface FormatOptions {
  /** ANSI colours; off unless true. */
  color?: boolean;
}

const ANSI: Record<Severity | 'bold' | 'dim' | 'reset', string> = {
  error: '\u001b[1;31m',
  warning: '\u001b[1;33m',
  info: '\u001b[1;36m',
  bold: '\u001b[1m',
  dim: '\u001b[2m',
  reset: '\u001b[0m',
};

export function formatDiagnostic(d: Diagnostic, source: string, file: string, options: FormatOptions = {}): string {
  return formatOne(d, source.split('\n'), file, options);
}

/** Every diagnostic of one file, separated by blank lines, ending in a newline (or empty). */
export function formatDiagnostics(
  diagnostics: readonly Diagnostic[],
  source: string,
  file: string,
  options: FormatOptions = {},
): string {
  const lines = source.split('\n');
  return diagnostics.map((d) => formatOne(d, lines, file, options) + '\n').join('\n');
}

function formatOne(d: Diagnostic, lines: readonly string[], file: string, options: FormatOptions): string {
  const paint = (style: keyof typeof ANSI, s: string): string =>
    options.color ? `${ANSI[style]}${s}${ANSI.reset}` : s;
  const r = d.range;
  const out = [
    `${paint('bold', `${file}:${r.line}:${r.column}:`)} ${paint(d.severity, `${d.severity}[${d.id}]`)}: ${d.message}`,
  ];
  const frame = codeFrame(d, lines, options.color === true);
  if (frame !== '') out.push(frame);
  if (d.hint) out.push(`${paint('dim', 'hint:')} ${d.hint}`);
  return out.join('\n');
}

/** At most this many characters of a source line are shown, around the span. */
const WINDOW = 100;
const BEFORE = 40;

/**
 * code-frame counts columns in string indexes, ours count code points, so each
 * shown line is cut to a window of code points around the span (a 10,000
 * character line stays readable), control characters are made visible, and
 * the columns are given in the cut lines' own indexes.
 */
function codeFrame(d: Diagnostic, lines: readonly string[], color: boolean): string {
  const r = d.range;
  if (r.line > lines.length || (lines.length === 1 && lines[0] === '')) return '';
  const from = Math.max(0, r.column - 1 - BEFORE);
  const shown: string[] = [];
  for (let n = 1; n <= r.endLine && n <= lines.length; n++) {
    if (n < r.line - 1) shown.push('');
    else shown.push(clip([...(lines[n - 1] ?? '').replace(/\r$/, '')], from));
  }
  // Columns inside the cut lines: the ellipsis at the front is one character.
  const lead = from > 0 ? 1 : 0;
  const col = (line: number, column: number): number => {
    const cps = [...(lines[line - 1] ?? '')].slice(from, Math.max(from, column - 1));
    return lead + Math.min(cps.join('').length, WINDOW) + 1;
  };
  const start = { line: r.line, column: col(r.line, r.column) };
  const end = { line: r.endLine, column: col(r.endLine, r.endColumn) };
  const empty = end.line === start.line && end.column <= start.column;
  return codeFrameColumns(shown.join('\n'), empty ? { start } : { start, end }, {
    highlightCode: false,
    forceColor: color,
    linesAbove: 1,
    linesBelow: 0,
  });
}

function clip(cps: string[], from: number): string {
  const cut = cps.slice(from, from + WINDOW).join('');
  // C0, DEL and C1 controls (U+009B starts an escape on some terminals) and the bidirectional
  // embeddings and isolates, which would reorder the printed line so the caret misses its place.
  // eslint-disable-next-line no-control-regex -- control characters are exactly what is matched
  const visible = cut.replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, '\ufffd');
  return (from > 0 ? '…' : '') + visible + (cps.length > from + WINDOW ? '…' : '');
}
