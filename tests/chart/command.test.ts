import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { run as chart } from '../../bin/commands/chart.js';
import { run as convert } from '../../bin/commands/convert.js';
import { compile } from '../../shared/compile.js';
import { fakeIO } from '../cli/fake-io.js';
import { BROKEN, FAN, TUBE } from '../convert/patterns.js';
import { flatten, isWellFormed } from './svg-tree.js';

const cmd = (name: string, operands: string[], options: Record<string, unknown> = {}) => ({
  name,
  operands,
  options: { theme: 'light', scale: 'screen', dpi: 96, format: 'svg', ...options },
});

let dir: string;
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'fourfold-chart-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('fourfold chart', () => {
  test('an SVG on standard output with one data-bead element per bead of the model', async () => {
    const io = fakeIO({ stdin: TUBE });
    expect(await chart(cmd('chart', ['-']), io)).toBe(0);
    expect(isWellFormed(io.out())).toBe(true);
    // Closed form (NOTATION.md section 8): a tube c units round, r rows has c(2r + 1) beads; here c = 4, r = 3.
    expect(flatten(io.out()).filter((e) => 'data-bead' in e.attrs)).toHaveLength(28);
    expect(compile(TUBE).value.model.beads).toHaveLength(28);
  });

  test('a pattern with errors still draws what was built, marks the failure, exits 1', async () => {
    const io = fakeIO({ stdin: BROKEN });
    expect(await chart(cmd('chart', ['-']), io)).toBe(1);
    expect(io.err()).toContain('bead-count');
    const elements = flatten(io.out());
    expect(elements.filter((e) => 'data-bead' in e.attrs).length).toBe(compile(BROKEN).value.model.beads.length);
    expect(elements.filter((e) => e.attrs.class === 'ff-failed').length).toBeGreaterThan(0);
  });

  test('--strict draws nothing when the pattern has errors', async () => {
    const io = fakeIO({ stdin: BROKEN });
    expect(await chart(cmd('chart', ['-'], { strict: true }), io)).toBe(1);
    expect(io.out()).toBe('');
  });

  test('--thread of a row that is not there is a usage error', async () => {
    const io = fakeIO({ stdin: FAN });
    expect(await chart(cmd('chart', ['-'], { thread: 9 }), io)).toBe(2);
    expect(io.err()).toContain('no row 9');
    expect(io.out()).toBe('');
  });

  test('-o with --png writes a PNG file; --format json prints the scene', async () => {
    const out = join(dir, 'fan.png');
    const io = fakeIO({ stdin: FAN, cwd: dir });
    expect(await chart(cmd('chart', ['-'], { png: true, output: 'fan.png' }), io)).toBe(0);
    expect((await readFile(out)).subarray(1, 4).toString('latin1')).toBe('PNG');
    const json = fakeIO({ stdin: FAN });
    expect(await chart(cmd('chart', ['-'], { format: 'json', numbers: true }), json)).toBe(0);
    const scene = JSON.parse(json.out());
    expect(scene.schema).toBe('fourfold.scene/1');
    expect(scene.items.filter((p: { kind: string }) => p.kind === 'bead')).toHaveLength(
      compile(FAN).value.model.beads.length,
    );
  });

  test('a PNG is not written to a terminal', async () => {
    const io = fakeIO({ stdin: FAN, tty: true });
    expect(await chart(cmd('chart', ['-'], { png: true }), io)).toBe(2);
    expect(io.out()).toBe('');
  });
});

describe('fourfold convert', () => {
  test('summary table on standard output; --format json gives the same counts', async () => {
    const { writeFile, mkdir } = await import('node:fs/promises');
    await mkdir(join(dir, 'in'), { recursive: true });
    await writeFile(join(dir, 'in', 'fan.ffp'), FAN);
    await writeFile(join(dir, 'in', 'wren.ffp'), BROKEN);
    const io = fakeIO({ cwd: dir });
    expect(await convert(cmd('convert', ['in'], { out: 'out', formats: ['svg'], format: 'text', jobs: 1 }), io)).toBe(
      1,
    );
    expect(io.out()).toMatch(/converted\s+1/);
    expect(io.out()).toMatch(/wren\.ffp:\d+:\d+: error\[bead-count\]/);
    const json = fakeIO({ cwd: dir });
    expect(await convert(cmd('convert', ['in'], { out: 'out', formats: ['svg'], format: 'json', jobs: 1 }), json)).toBe(
      1,
    );
    const summary = JSON.parse(json.out());
    expect([summary.schema, summary.converted, summary.skipped, summary.failed]).toEqual([
      'fourfold.convert/1',
      0,
      1,
      1,
    ]);
  });
});
