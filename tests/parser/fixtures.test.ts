/**
 * Fixture folders: every `good/*.ffp` parses without errors to the AST in its
 * golden `.ast.json`; every `errors/*.ffp` gives the human diagnostics in its
 * golden `.txt` (see tests/golden.ts for how goldens are written).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { parseBytes } from '../../parser/index.js';
import { formatDiagnostics } from '../../shared/format-diagnostics.js';
import { expectGolden as golden } from '../golden.js';

const dir = join(import.meta.dirname, 'fixtures');
const ffp = (sub: string): string[] =>
  readdirSync(join(dir, sub))
    .filter((f) => f.endsWith('.ffp'))
    .sort();

describe('good fixtures', () => {
  test.each(ffp('good'))('%s', (name) => {
    const r = parseBytes(readFileSync(join(dir, 'good', name)));
    expect(r.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    golden(join(dir, 'good', name.replace(/\.ffp$/, '.ast.json')), JSON.stringify(r.value, null, 2) + '\n');
  });
});

const errorIds = new Set<string>();

describe('error fixtures', () => {
  test.each(ffp('errors'))('%s', (name) => {
    const bytes = readFileSync(join(dir, 'errors', name));
    const r = parseBytes(bytes);
    expect(r.diagnostics.some((d) => d.severity === 'error')).toBe(true);
    for (const d of r.diagnostics) errorIds.add(d.id);
    golden(
      join(dir, 'errors', name.replace(/\.ffp$/, '.txt')),
      formatDiagnostics(r.diagnostics, bytes.toString('utf8'), name),
    );
  });

  test('every diagnostic id the parser emits is covered by a fixture', () => {
    // `internal` is the safety net for a fault of the parser itself and cannot be provoked by input;
    // `too-many-problems` needs over a thousand problems, too long for a golden file (api.test.ts covers it).
    const ids = [
      'syntax',
      'bead-count',
      'bad-color',
      'bad-header-value',
      'missing-title',
      'duplicate-key',
      'unknown-color',
      'unused-color',
      'duplicate-color',
      'row-number',
      'unknown-key',
      'misplaced-mark',
      'no-rows',
      'too-large',
      'not-text',
    ];
    expect([...errorIds].sort()).toEqual(ids.sort());
  });
});
