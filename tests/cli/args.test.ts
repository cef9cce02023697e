import { describe, expect, it } from 'vitest';
import { hasAnsi } from './fake-io.js';
import { parseArgs, parseFormatList, parseGrams, parseLength, parsePercent, parseUrl } from '../../bin/args.js';

// The command table of PRODUCT.md.
const COMMANDS = 'check chart steps tally kit model fmt convert preview serve login push pull'.split(' ');

const ok = (...argv: string[]) => {
  const r = parseArgs(argv);
  expect(r.error).toBeUndefined();
  expect(r.value).not.toBeNull();
  return r.value!;
};
const usageError = (...argv: string[]) => {
  const r = parseArgs(argv);
  expect(r.value).toBeNull();
  expect(r.error).toBeTypeOf('string');
  return r.error!;
};

describe('parseArgs: top level', () => {
  it('asks for the version with --version or -V', () => {
    expect(parseArgs(['--version'])).toEqual({ value: null, version: true });
    expect(parseArgs(['-V'])).toEqual({ value: null, version: true });
  });

  it('returns help text for --help and for help COMMAND, naming every command', () => {
    const help = parseArgs(['--help']).help!;
    for (const name of COMMANDS) expect(help).toContain(`  ${name} `);
    expect(help).toContain('Exit codes: 0');
    expect(parseArgs(['help', 'tally']).help).toContain('--working-length <length>');
    expect(parseArgs(['kit', '--help']).help).toContain('--pack <grams>');
  });

  it('with no command prints the overview as a usage error', () => {
    expect(usageError()).toContain('Usage: fourfold');
  });

  it('help for a command that does not exist is a usage error naming it', () => {
    expect(usageError('help', 'nosuch')).toBe("error: unknown command 'nosuch'\n(run 'fourfold help' for usage)\n");
  });

  it('suggests the nearest command for a typo', () => {
    const error = usageError('chekc', 'a.ffp');
    expect(error).toContain("unknown command 'chekc'");
    expect(error).toContain('Did you mean check?');
  });

  it('never writes ANSI escapes into help or errors', () => {
    expect(hasAnsi(parseArgs(['--help']).help!)).toBe(false);
    expect(hasAnsi(usageError('chart', 'x', '--theme', 'neon'))).toBe(false);
  });
});

describe('parseArgs: each command', () => {
  it('check takes several files and - for standard input', () => {
    expect(ok('check', 'a.ffp', '-', 'b.ffp', '--format', 'json')).toEqual({
      name: 'check',
      operands: ['a.ffp', '-', 'b.ffp'],
      options: { format: 'json' },
    });
    expect(usageError('check')).toContain("missing required argument 'files'");
    expect(usageError('check', 'a', '--format', 'xml')).toContain('Allowed choices are text, json');
  });

  it('check --similar-colors takes a CIEDE2000 distance from 0 to 100', () => {
    expect(ok('check', 'a.ffp', '--similar-colors', '2.5').options).toEqual({ format: 'text', similarColors: 2.5 });
    expect(ok('check', 'a.ffp', '--similar-colors', '0').options.similarColors).toBe(0);
    expect(usageError('check', 'a.ffp', '--similar-colors', '101')).toContain('Expected a colour distance from 0');
    expect(usageError('check', 'a.ffp', '--similar-colors', 'near')).toContain('Expected a colour distance from 0');
  });

  it('chart: output, png, dpi, scale, numbers, thread, theme, strict', () => {
    expect(ok('chart', 'a.ffp').options).toEqual({ dpi: 192, scale: 'screen', theme: 'light', format: 'svg' });
    const c = ok(
      'chart',
      'a.ffp',
      '-o',
      'a.png',
      '--png',
      '--dpi',
      '600',
      '--scale',
      'mm',
      '--numbers',
      '--thread',
      '3',
      '--theme',
      'print',
      '--strict',
    );
    expect(c.options).toEqual({
      output: 'a.png',
      png: true,
      dpi: 600,
      scale: 'mm',
      numbers: true,
      thread: 3,
      theme: 'print',
      strict: true,
      format: 'svg',
    });
    expect(ok('chart', 'a', '--output', 'b.svg').options.output).toBe('b.svg');
    const theme = usageError('chart', 'a', '--theme', 'neon');
    expect(theme).toContain('Allowed choices are light, dark, print');
    expect(theme).toContain('fourfold help chart');
    expect(usageError('chart', 'a', '--thread', '0')).toContain('whole number from 1');
    expect(usageError('chart', 'a', '--thread', '2.5')).toContain('whole number');
    expect(usageError('chart', 'a', '--dpi', 'lots')).toContain("'lots' is invalid");
    expect(usageError('chart', 'a', '--scale', 'cm')).toContain('Allowed choices are screen, mm');
    expect(usageError('chart', 'a', 'b')).toContain('too many arguments');
  });

  it('steps: text, md, html and json', () => {
    for (const f of ['text', 'md', 'html', 'json']) expect(ok('steps', 'a', '--format', f).options.format).toBe(f);
    expect(ok('steps', '-').options.format).toBe('text');
    expect(usageError('steps', 'a', '--format', 'pdf')).toContain('Allowed choices are text, md, html, json');
  });

  it('tally: units become numbers (spare as a fraction, lengths in mm, pack in grams)', () => {
    expect(ok('tally', 'a').options).toEqual({ format: 'table', spare: 0.1, workingLengthMm: 1500, tailMm: 150 });
    expect(
      ok('tally', 'a', '--format', 'csv', '--spare', '15%', '--pack', '5', '--working-length', '2m', '--tail', '100mm')
        .options,
    ).toEqual({
      format: 'csv',
      spare: 0.15,
      pack: 5,
      workingLengthMm: 2000,
      tailMm: 100,
    });
    expect(usageError('tally', 'a', '--spare', 'lots')).toContain('percentage');
    expect(usageError('tally', 'a', '--spare', '150%')).toContain('0% to 100%');
    expect(usageError('tally', 'a', '--pack', '0')).toContain('above zero');
    expect(usageError('tally', 'a', '--working-length', '3 furlongs')).toContain('150cm');
    expect(usageError('tally', 'a', '--format', 'md')).toContain('table, csv, json');
  });

  it('kit: md, html, json, with the same buying options as tally', () => {
    expect(ok('kit', 'a', '--format', 'html', '--spare', '5', '--pack', '7.5g').options).toEqual({
      format: 'html',
      spare: 0.05,
      pack: 7.5,
      workingLengthMm: 1500,
      tailMm: 150,
    });
    expect(usageError('kit', 'a', '--format', 'csv')).toContain('md, html, json');
  });

  it('model takes exactly one file', () => {
    expect(ok('model', 'a.ffp')).toEqual({ name: 'model', operands: ['a.ffp'], options: { format: 'json' } });
    expect(usageError('model')).toContain("missing required argument 'file'");
    expect(usageError('model', 'a', 'b')).toContain('too many arguments');
  });

  it('fmt: --check, --write (not both) and --order', () => {
    expect(ok('fmt', 'a', 'b', '--check').options).toEqual({ check: true, format: 'text' });
    expect(ok('fmt', 'a', '--write', '--order', 'placed').options).toEqual({
      write: true,
      order: 'placed',
      format: 'text',
    });
    expect(usageError('fmt', 'a', '--check', '--write')).toContain("'--check' cannot be used with option '--write'");
    expect(usageError('fmt', 'a', '--order', 'random')).toContain('Allowed choices are pickup, placed');
    expect(usageError('fmt', 'a', '--colour')).toContain("unknown option '--colour'");
  });

  it('convert: --out is required; --formats is checked; --jobs and --force', () => {
    expect(ok('convert', 'patterns', '*.ffp', '--out', 'site').options).toEqual({
      out: 'site',
      formats: ['svg', 'md', 'json'],
      format: 'text',
    });
    const c = ok('convert', 'a', '--out', 'o', '--formats', 'svg,json,svg', '--jobs', '2', '--force');
    expect(c.options).toEqual({ out: 'o', formats: ['svg', 'json'], jobs: 2, force: true, format: 'text' });
    expect(usageError('convert', 'a')).toContain("required option '--out <dir>' not specified");
    expect(usageError('convert', 'a', '--out', 'o', '--formats', 'svg,gif')).toContain("Unknown format 'gif'");
    expect(usageError('convert', 'a', '--out', 'o', '--jobs', '0')).toContain('whole number from 1');
  });

  it('preview and serve: ports are checked', () => {
    expect(ok('preview', 'a.ffp').options).toEqual({ port: 8081, format: 'text' });
    expect(ok('serve', '--port', '0', '--demo', '--examples', 'examples').options).toEqual({
      port: 0,
      demo: true,
      examples: 'examples',
      format: 'text',
    });
    expect(usageError('serve', '--port', '70000')).toContain('0 to 65535');
    expect(usageError('preview')).toContain("missing required argument 'file'");
  });

  it('login, push, pull: server address, token, output file', () => {
    expect(ok('login', '--server', 'http://localhost:8080/', '--token', 'ffp_abc').options).toEqual({
      server: 'http://localhost:8080',
      token: 'ffp_abc',
      format: 'text',
    });
    expect(usageError('login', '--server', 'localhost')).toContain('http://');
    expect(ok('push', 'a.ffp', 'b.ffp').operands).toEqual(['a.ffp', 'b.ffp']);
    expect(ok('pull', '42', '-o', 'x.ffp')).toEqual({
      name: 'pull',
      operands: ['42'],
      options: { output: 'x.ffp', format: 'text' },
    });
    expect(usageError('pull')).toContain("missing required argument 'id'");
  });

  it('accepts --format json on every command', () => {
    const operands: Record<string, string[]> = { serve: [], login: [], convert: ['a', '--out', 'o'] };
    for (const name of COMMANDS)
      expect(ok(name, ...(operands[name] ?? ['a']), '--format', 'json').options.format).toBe('json');
  });
});

describe('unit parsers', () => {
  it('lengths: centimetres by default, exact conversions otherwise', () => {
    expect(parseLength('150')).toBe(1500);
    expect(parseLength('150cm')).toBe(1500);
    expect(parseLength('1.5m')).toBe(1500);
    expect(parseLength('1500mm')).toBe(1500);
    // Source: the international inch is exactly 25.4 mm (1959 international yard and pound agreement).
    expect(parseLength('10in')).toBe(254);
    expect(() => parseLength('0cm')).toThrow(/above zero/);
    expect(() => parseLength('-5cm')).toThrow();
  });

  it('percentages, grams, format lists, web addresses', () => {
    expect(parsePercent('12.5%')).toBe(0.125);
    expect(parsePercent('0')).toBe(0);
    expect(parseGrams('10g')).toBe(10);
    expect(parseFormatList('PNG, md')).toEqual(['png', 'md']);
    expect(() => parseFormatList('')).toThrow();
    expect(parseUrl('https://beads.example/')).toBe('https://beads.example');
    expect(() => parseUrl('file:///etc/passwd')).toThrow(/http/);
  });
});
