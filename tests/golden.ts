/**
 * Golden files: compare output with the file committed beside the test.
 * `UPDATE_GOLDEN=1` rewrites them; a missing golden is written on a
 * developer's machine (so a new fixture needs no second step) but fails in CI,
 * where it would otherwise pass against itself.
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { expect } from 'vitest';

export function expectGolden(path: string, actual: string): void {
  const missing = !existsSync(path);
  if (missing && process.env.CI) {
    throw new Error(`golden file ${path} is missing: run the tests once locally and commit it`);
  }
  if (missing || process.env.UPDATE_GOLDEN === '1') {
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(path, actual);
  }
  expect(actual).toBe(readFileSync(path, 'utf8'));
}
