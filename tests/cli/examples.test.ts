/**
 * The shipped examples through the command line, as a new user meets them:
 * every one passes `check`, and `fmt` is stable on each (formatting twice
 * gives what formatting once gave).
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../../bin/dispatch.js';
import type { Model } from '../../shared/model.js';
import { fakeIO } from './fake-io.js';

const examples = fileURLToPath(new URL('../../examples/', import.meta.url));
const files = readdirSync(examples).filter((f) => f.endsWith('.ffp'));

describe('the examples', () => {
  it('there are at least the six of the pattern set', () => {
    expect(files.length).toBeGreaterThanOrEqual(6);
  });

  it('all pass check with exit 0', async () => {
    const io = fakeIO({ cwd: examples });
    const code = await main(['check', ...files, '--format', 'json'], io);
    const report = JSON.parse(io.out()) as { files: { file: string; ok: boolean; diagnostics: { id: string }[] }[] };
    expect(report.files.filter((f) => !f.ok)).toEqual([]);
    expect(code).toBe(0);
  });

  it.each(files)('fmt is stable on %s', async (file) => {
    const once = fakeIO({ cwd: examples });
    expect(await main(['fmt', file], once)).toBe(0);
    const twice = fakeIO({ cwd: examples, stdin: once.out() });
    expect(await main(['fmt', '-'], twice)).toBe(0);
    expect(twice.out()).toBe(once.out());
  });

  it.each(files)('fmt --order placed describes the identical piece for %s', async (file) => {
    const run = async (argv: string[], stdin?: string) => {
      const io = fakeIO({ cwd: examples, stdin });
      const code = await main(argv, io);
      return { code, out: io.out() };
    };
    const piece = (json: string) =>
      (JSON.parse(json) as Model).beads.map((b) => `${b.color}@${b.x.toFixed(3)},${b.y.toFixed(3)}`).sort();
    const placed = await run(['fmt', '--order', 'placed', file]);
    expect(placed.code).toBe(0);
    const original = await run(['model', file]);
    const converted = await run(['model', '-'], placed.out);
    expect(converted.code).toBe(0);
    expect(piece(converted.out)).toEqual(piece(original.out));
  });
});
