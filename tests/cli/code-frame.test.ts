import { describe, expect, it } from 'vitest';
import { formatDiagnostic } from '../../shared/format-diagnostics.js';
import type { Diagnostic } from '../../shared/diagnostic.js';

const at = (column: number): Diagnostic => ({
  severity: 'error',
  id: 'syntax',
  message: 'something is wrong here',
  range: { line: 1, column, endLine: 1, endColumn: column + 1, offset: column - 1, endOffset: column },
});

describe('code frame of a line holding control characters', () => {
  it('never sends a terminal control or a reordering character through', () => {
    // Source: ECMA-48 (C1 control U+009B is CSI); Unicode UAX #9 (U+202A-U+202E embeddings/overrides, U+2066-U+2069 isolates).
    const line = `row 1: A\u009b31mB\u202eCD\u2067E\u001b[2J`;
    const out = formatDiagnostic(at(8), line, 'p.ffp');
    for (const ch of ['\u009b', '\u202e', '\u2067', '\u001b']) expect(out).not.toContain(ch);
    expect(out).toContain('A\ufffd31mB\ufffdCD\ufffdE\ufffd[2J');
  });
});
