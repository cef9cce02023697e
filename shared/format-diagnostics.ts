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
  const paint = (style: keyof typeof ANSI, s: string): string => (options.color ? `${ANSI[style]}${s}${ANSI.reset}` : s);
  const r = d.range;
  const head = `${paint('bold', `${file}:${r.line}:${r.column}:`)} ${paint(d.severity, `${d.severity}[${d.id}]`)}: ${d.message}`;
  const lines = [head];
  const frame = codeFrame(d, source, options.color === true);
  if (frame !== '') lines.push(frame);
  if (d.hint) lines.push(`${paint('dim', 'hint:')} ${d.hint}`);
  return lines.join('\n');
}

/** Every diagnostic of one file, separated by blank lines, ending in a newline (or empty). */
export function formatDiagnostics(diagnostics: readonly Diagnostic[], source: string, file: string, options: FormatOptions = {}): string {
  return diagnostics.map((d) => formatDiagnostic(d, source, file, options) + '\n').join('\n');
}

/**
 * code-frame counts columns in string indexes, ours count code points, so the
 * columns are converted on their line before they are handed over.
 */
function codeFrame(d: Diagnostic, source: string, color: boolean): string {
  const r = d.range;
  const lines = source.split('\n');
  if (source === '' || r.line > lines.length) return '';
  const col = (line: number, column: number): number => {
    const text = lines[line - 1] ?? '';
    return [...text].slice(0, column - 1).join('').length + 1;
  };
  const start = { line: r.line, column: col(r.line, r.column) };
  const end = { line: r.endLine, column: col(r.endLine, r.endColumn) };
  const empty = end.line === start.line && end.column <= start.column;
  const frame = codeFrameColumns(source.replace(/\r(?=\n)/g, ''), empty ? { start } : { start, end }, {
    highlightCode: false,
    forceColor: color,
    linesAbove: 1,
    linesBelow: 0,
  });
  return frame;
}
