/**
 * The built CLI as a user runs it: `node bin/fourfold.js ...` in a child
 * process, so the launcher, the exit code and the streams are the real ones.
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { execa } from 'execa';
import { beforeAll, describe, expect, it } from 'vitest';
import { hasAnsi } from './fake-io.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const fixtures = fileURLToPath(new URL('./fixtures/', import.meta.url));
const launcher = `${root}bin/fourfold.js`;
const pkg = JSON.parse(readFileSync(`${root}package.json`, 'utf8')) as { version: string };

const fourfold = (args: string[], input?: string) =>
  execa('node', [launcher, ...args], { cwd: fixtures, input, reject: false });

beforeAll(async () => {
  // `npm test` has just built everything (pretest); a direct vitest run builds here.
  // tsc emits even when a file elsewhere has type errors; what matters is that the CLI is there.
  if (process.env.npm_lifecycle_event !== 'test')
    await execa('npm', ['run', 'build:cli'], { cwd: root, reject: false });
  expect(existsSync(`${root}dist/bin/main.js`)).toBe(true);
}, 180_000);

describe('the built fourfold command', () => {
  it('--version prints the package version', async () => {
    const r = await fourfold(['--version']);
    expect(r.exitCode).toBe(0);
    expect(r.stdout).toBe(pkg.version);
  });

  it('check on a broken pattern: exit 1, every mistake on stderr, no colour through a pipe', async () => {
    const r = await fourfold(['check', 'broken.ffp', 'strip.ffp']);
    expect(r.exitCode).toBe(1);
    expect(r.stderr).toContain('broken.ffp:10:12: error[bead-count]');
    expect(r.stderr).toContain('broken.ffp:11:5: error[row-number]');
    expect(hasAnsi(r.stderr)).toBe(false);
  });

  it('check - reads standard input; --format json goes to stdout', async () => {
    const r = await fourfold(['check', '-', '--format', 'json'], readFileSync(`${fixtures}strip.ffp`, 'utf8'));
    expect(r.exitCode).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual({
      schema: 'fourfold.check/1',
      files: [{ file: '<stdin>', ok: true, diagnostics: [] }],
    });
  });

  it('a missing file: exit 2, one line, no stack trace', async () => {
    const r = await fourfold(['check', 'missing.ffp']);
    expect(r.exitCode).toBe(2);
    expect(r.stderr).toContain("fourfold: cannot read 'missing.ffp': no such file or folder");
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it('a bad option value: exit 2 with the allowed values', async () => {
    const r = await fourfold(['chart', 'strip.ffp', '--theme', 'neon']);
    expect(r.exitCode).toBe(2);
    expect(r.stderr).toContain('Allowed choices are light, dark, print');
  });

  it('model prints JSON that parses', async () => {
    const r = await fourfold(['model', 'strip.ffp']);
    expect(r.exitCode).toBe(0);
    expect((JSON.parse(r.stdout) as { schema: string }).schema).toBe('fourfold.model/1');
  });

  it('a reader that stops early (like head) is not an error: exit 0, nothing on stderr', async () => {
    // About 2 MB of model JSON, far more than a pipe holds, so the writer meets the closed pipe.
    const big = 'title: Big\ncolors:\n  A  #F4F1EA  chalk\n\nrow 1: AAAA (AAA)x19\nrows 2-60: AAA (AA)x19\n';
    const child = execa('node', [launcher, 'model', '-'], {
      cwd: fixtures,
      input: big,
      reject: false,
      buffer: { stdout: false },
    });
    child.stdout.once('data', () => child.stdout.destroy());
    const r = await child;
    expect(r.stderr).toBe('');
    expect(r.exitCode).toBe(0);
  });

  it('a font cache that cannot be written: SVG still works, PNG says why and exits 2, no "bug" line', async () => {
    // A cache folder under a file cannot be made, on every system.
    const env = { FOURFOLD_CACHE_DIR: `${fixtures}strip.ffp/cache` };
    const svg = await execa('node', [launcher, 'chart', 'strip.ffp'], { cwd: fixtures, env, reject: false });
    expect(svg.exitCode).toBe(0);
    expect(svg.stdout).toContain('<svg');
    const png = await execa('node', [launcher, 'chart', 'strip.ffp', '--png'], { cwd: fixtures, env, reject: false });
    expect(png.exitCode).toBe(2);
    expect(png.stderr).toBe(
      `fourfold: cannot write the bundled font for PNG output into '${fixtures}strip.ffp/cache/fonts': a part of the path is not a folder`,
    );
  });
});
