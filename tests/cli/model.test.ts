import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { main } from '../../bin/dispatch.js';
import type { Model } from '../../shared/model.js';
import { fakeIO } from './fake-io.js';

const fixtures = fileURLToPath(new URL('./fixtures/', import.meta.url));

async function model(file: string, stdin?: string) {
  const io = fakeIO({ cwd: fixtures, stdin });
  const code = await main(['model', file], io);
  return { code, out: io.out(), err: io.err() };
}

describe('fourfold model', () => {
  it('prints fourfold.model/1 JSON whose counts meet the closed forms', async () => {
    const strip = await model('strip.ffp');
    expect(strip.code).toBe(0);
    expect(strip.err).toBe('');
    const m = JSON.parse(strip.out) as Model;
    expect(m.schema).toBe('fourfold.model/1');
    expect(m.header.title).toBe('Test Strip');
    // Source: NOTATION.md section 8: a flat strip of n units has 3n + 1 beads.
    expect(m.units).toHaveLength(3);
    expect(m.beads).toHaveLength(3 * 3 + 1);
    // Source: NOTATION.md section 8 (edges of a grid graph): n units x r rows is n(r+1) + r(n+1) beads.
    const panel = JSON.parse((await model('panel.ffp')).out) as Model;
    expect(panel.beads).toHaveLength(3 * (2 + 1) + 2 * (3 + 1));
    // Source: Euler's formula for a disc: junctions - beads + units = 1.
    expect(panel.junctions.length - panel.beads.length + panel.units.length).toBe(1);
  });

  it('reads standard input', async () => {
    const r = await model('-', readFileSync(`${fixtures}strip.ffp`, 'utf8'));
    expect(r.code).toBe(0);
    expect((JSON.parse(r.out) as Model).beads).toHaveLength(10);
  });

  it('a pattern with errors still prints what could be built, with exit 1 and diagnostics on stderr', async () => {
    const r = await model('broken.ffp');
    expect(r.code).toBe(1);
    expect(r.err).toContain('broken.ffp:10:12: error[bead-count]');
    const m = JSON.parse(r.out) as Model;
    expect(m.units.length).toBeGreaterThan(0);
    expect(m.diagnostics.some((d) => d.id === 'bead-count')).toBe(true);
  });

  it('a missing file is exit 2 and prints no JSON', async () => {
    const r = await model('nope.ffp');
    expect(r).toEqual({ code: 2, out: '', err: "fourfold: cannot read 'nope.ffp': no such file or folder\n" });
  });
});
