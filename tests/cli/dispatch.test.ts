import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCommand, main } from '../../bin/dispatch.js';
import { fakeIO } from './fake-io.js';

const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string };

describe('main: the top level', () => {
  it('prints the version from package.json', async () => {
    for (const flag of ['--version', '-V']) {
      const io = fakeIO();
      expect(await main([flag], io)).toBe(0);
      expect(io.out()).toBe(`${pkg.version}\n`);
    }
  });

  it('prints help on stdout with exit 0', async () => {
    const io = fakeIO();
    expect(await main(['--help'], io)).toBe(0);
    expect(io.out()).toContain('Usage: fourfold');
    expect(io.err()).toBe('');
  });

  it('a usage error goes to stderr with exit 2', async () => {
    const io = fakeIO();
    expect(await main(['chart', 'a.ffp', '--theme', 'neon'], io)).toBe(2);
    expect(io.err()).toContain('Allowed choices are light, dark, print');
    expect(io.out()).toBe('');
  });

  it('no arguments: the overview on stderr, exit 2', async () => {
    const io = fakeIO();
    expect(await main([], io)).toBe(2);
    expect(io.err()).toContain('Commands:');
  });

  it('a command whose module is not there is "not available", not a crash', async () => {
    expect(await loadCommand('no-such-command')).toBeNull();
  });
});
