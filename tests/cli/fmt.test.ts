import { chmodSync, cpSync, statSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { main } from '../../bin/dispatch.js';
import { fakeIO } from './fake-io.js';

const fixtures = fileURLToPath(new URL('./fixtures/', import.meta.url));
let dir = '';

beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'fourfold-fmt-'));
  cpSync(fixtures, dir, { recursive: true });
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const read = (name: string) => readFileSync(join(dir, name), 'utf8');

async function fmt(args: string[], stdin?: string) {
  const io = fakeIO({ cwd: dir, stdin });
  const code = await main(['fmt', ...args], io);
  return { code, out: io.out(), err: io.err() };
}

describe('fourfold fmt', () => {
  it('prints the canonical form, keeping comments, and formatting it again changes nothing', async () => {
    const first = await fmt(['messy.ffp']);
    expect(first.code).toBe(0);
    expect(first.out).toContain('# a comment that must stay');
    expect(first.out).toMatch(/^title: +Messy Panel$/m);
    // The header comes out in the documented order: title before layout.
    expect(first.out.indexOf('title:')).toBeLessThan(first.out.indexOf('layout:'));
    // The continuation line is joined: one row a line.
    expect(first.out).toMatch(/^row 2: BAB AB AB$/m);
    const second = await fmt(['-'], first.out);
    expect(second.out).toBe(first.out);
    expect(read('messy.ffp')).toBe(readFileSync(join(fixtures, 'messy.ffp'), 'utf8'));
  });

  it('--check lists the files that would change and exits 1; 0 when all are formatted', async () => {
    const messy = await fmt(['--check', 'messy.ffp', 'strip.ffp']);
    expect(messy.code).toBe(1);
    expect(messy.out).toBe('messy.ffp\n');
    writeFileSync(join(dir, 'tidy.ffp'), (await fmt(['messy.ffp'])).out);
    const tidy = await fmt(['--check', 'tidy.ffp']);
    expect(tidy).toEqual({ code: 0, out: '', err: '' });
  });

  it('--write rewrites in place, leaving no temporary file behind', async () => {
    const expected = (await fmt(['messy.ffp'])).out;
    const r = await fmt(['--write', 'messy.ffp']);
    expect(r.code).toBe(0);
    expect(read('messy.ffp')).toBe(expected);
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]);
    expect((await fmt(['--check', 'messy.ffp'])).code).toBe(0);
  });

  it('--write keeps the file mode, and with - prints to standard output', async () => {
    chmodSync(join(dir, 'messy.ffp'), 0o600);
    await fmt(['--write', 'messy.ffp']);
    expect(statSync(join(dir, 'messy.ffp')).mode & 0o777).toBe(0o600);
    const r = await fmt(['--write', '-'], read('messy.ffp'));
    expect(r).toEqual({ code: 0, out: read('messy.ffp'), err: '' });
  });

  it('--write never touches a file with syntax errors: it reports them and exits 1', async () => {
    const before = read('syntax.ffp');
    const r = await fmt(['--write', 'syntax.ffp']);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/^syntax\.ffp:5:\d+: error\[/m);
    expect(r.err).toMatch(/^fourfold: 'syntax\.ffp' is not formatted: fix the errors above first$/m);
    expect(read('syntax.ffp')).toBe(before);
  });

  it('--order on a pattern the engine cannot build reports its errors and says it is not converted', async () => {
    const wrong = 'title: Wrong\ncolors:\n  A red\nrow 1: AAAA AAA\nrow 2: AAA AAA\n';
    const r = await fmt(['--order', 'placed', '-'], wrong);
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/^<stdin>:5:12: error\[bead-count\]/m);
    expect(r.err).toMatch(/^fourfold: '<stdin>' is not converted to placed order: fix the errors above first$/m);
  });

  it('a missing file is exit 2, and 2 wins over a file that is not formatted', async () => {
    const r = await fmt(['--check', 'messy.ffp', 'gone.ffp']);
    expect(r.code).toBe(2);
    expect(r.err).toContain("fourfold: cannot read 'gone.ffp': no such file or folder");
  });

  it('--order placed converts the worked check of NOTATION.md section 4, and back', async () => {
    // Source: NOTATION.md section 4, worked check: pick-up `ABCD BCA CAB` is placed `DABC ACB CAB`.
    const pickup = 'title: Worked Check\ncolors:\n  A red\n  B green\n  C blue\n  D black\nrow 1: ABCD BCA CAB\n';
    const placed = await fmt(['--order', 'placed', '-'], pickup);
    expect(placed.code).toBe(0);
    expect(placed.out).toMatch(/^order: +placed$/m);
    expect(placed.out).toMatch(/^row 1: DABC ACB CAB$/m);
    const back = await fmt(['--order', 'pickup', '-'], placed.out);
    expect(back.out).toMatch(/^row 1: ABCD BCA CAB$/m);
  });

  it('--format json reports what changed', async () => {
    const r = await fmt(['--check', '--format', 'json', 'messy.ffp', 'syntax.ffp']);
    expect(JSON.parse(r.out)).toEqual({
      schema: 'fourfold.fmt/1',
      files: [
        { file: 'messy.ffp', ok: true, changed: true, written: false },
        { file: 'syntax.ffp', ok: false, changed: false, written: false },
      ],
    });
  });
});
