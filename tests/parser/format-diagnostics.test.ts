/** The human output of diagnostics: header line, code frame with caret, hint; ANSI only when asked. */
import { describe, expect, test } from 'vitest';
import { parse } from '../../parser/index.js';
import { formatDiagnostic, formatDiagnostics } from '../../shared/format-diagnostics.js';
import type { Diagnostic } from '../../shared/diagnostic.js';

const ESC = String.fromCharCode(27);
const text = 'title: T\ncolors:\n  A #000\nrow 1: AAAA\nrow 2: AAA QA\n';
const [unknown] = parse(text).diagnostics;

describe('formatDiagnostic', () => {
  test('file:line:col: severity[id]: message, the line with a gutter and a caret under the span, then the hint', () => {
    expect(formatDiagnostic(unknown!, text, 'p.ffp')).toBe(
      [
        "p.ffp:5:12: error[unknown-color]: colour key 'Q' is not in the 'colors:' block",
        '  4 | row 1: AAAA',
        '> 5 | row 2: AAA QA',
        '    |            ^',
        "hint: add a line like '  Q  #2e6f8e  teal' under 'colors:', or use one of: A",
      ].join('\n'),
    );
  });

  test('no ANSI escapes unless colour is asked for', () => {
    expect(formatDiagnostic(unknown!, text, 'p.ffp', { color: false })).not.toMatch(new RegExp(`${ESC}\\[`));
    const coloured = formatDiagnostic(unknown!, text, 'p.ffp', { color: true });
    expect(coloured).toMatch(new RegExp(`${ESC}\\[1;31merror\\[unknown-color\\]`));
  });

  test('the caret sits under the right character after a tab and a non-BMP character', () => {
    const src = 'title: 🐦\ncolors:\n  A #000\nrow 1:\t🐦 AAAA\n';
    const d = parse(src).diagnostics.find((x) => x.id === 'syntax')!;
    const frame = formatDiagnostic(d, src, 'b.ffp').split('\n');
    const line = frame.find((l) => l.startsWith('> 4 |'))!;
    const caret = frame[frame.indexOf(line) + 1]!;
    // code-frame keeps the tab in the caret line so the caret lines up in a terminal.
    expect(caret.indexOf('^') - caret.indexOf('|')).toBe(line.indexOf('🐦') - line.indexOf('|'));
  });

  test('a span over two lines marks both', () => {
    const d: Diagnostic = {
      severity: 'warning',
      id: 'x',
      message: 'm',
      range: { line: 4, column: 8, endLine: 5, endColumn: 4, offset: 0, endOffset: 0 },
    };
    const out = formatDiagnostic(d, text, 'p.ffp');
    expect(out).toContain('> 4 | row 1: AAAA');
    expect(out).toContain('> 5 | row 2: AAA QA');
    expect(out.startsWith('p.ffp:4:8: warning[x]: m')).toBe(true);
  });
});

describe('formatDiagnostics', () => {
  test('one block per diagnostic, blank lines between, nothing for none', () => {
    expect(formatDiagnostics([], text, 'p.ffp')).toBe('');
    const two = formatDiagnostics([unknown!, unknown!], text, 'p.ffp');
    expect(two.split('\n\n')).toHaveLength(2);
    expect(two.endsWith('\n')).toBe(true);
  });

  test('an empty file gives the header line and the hint, with no frame', () => {
    const [d] = parse('').diagnostics;
    expect(formatDiagnostics([d!], '', 'e.ffp')).toBe(
      "e.ffp:1:1: error[missing-title]: the pattern has no title\nhint: add a line like 'title: Kestrel Fan' at the top\n",
    );
  });
});
