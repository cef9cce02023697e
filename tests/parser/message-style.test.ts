/**
 * One style for every parser message, checked over all error fixtures: a
 * message is one clause that stands on its own, with no closing full stop
 * (a did-you-mean is a question after a ';'), and so is a hint.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { parseBytes } from '../../parser/index.js';

const dir = join(import.meta.dirname, 'fixtures', 'errors');
const all = readdirSync(dir)
  .filter((f) => f.endsWith('.ffp'))
  .flatMap((f) => parseBytes(readFileSync(join(dir, f))).diagnostics);

test('the fixtures give many messages to check', () => {
  expect(all.length).toBeGreaterThan(50);
});

test.each(all.map((d) => [d.id, d.message, d.hint ?? ''] as const))('%s: %s', (_, message, hint) => {
  expect(message).not.toMatch(/\.$/);
  // A second sentence (". Did you mean", ". Write") is a sign of two messages in one.
  expect(message).not.toMatch(/[a-z)'"]\. [A-Za-z]/);
  expect(message).not.toMatch(/^[A-Z][a-z]/);
  expect(hint).not.toMatch(/\.$/);
});
