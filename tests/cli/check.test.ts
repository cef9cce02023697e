import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Ajv } from 'ajv';
import { describe, expect, it } from 'vitest';
import { main } from '../../bin/dispatch.js';
import { fakeIO, hasAnsi, stripAnsi } from './fake-io.js';

const fixtures = fileURLToPath(new URL('./fixtures/', import.meta.url));
const fixture = (name: string) => readFileSync(`${fixtures}${name}`, 'utf8');

// The fourfold.check/1 shape of PRODUCT.md, with nothing extra allowed anywhere.
const checkSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['schema', 'files'],
  properties: {
    schema: { const: 'fourfold.check/1' },
    files: {
      type: 'array',
      items: {
        type: 'object',
        additionalProperties: false,
        required: ['file', 'ok', 'diagnostics'],
        properties: {
          file: { type: 'string' },
          ok: { type: 'boolean' },
          diagnostics: {
            type: 'array',
            items: {
              type: 'object',
              additionalProperties: false,
              required: ['severity', 'id', 'message', 'line', 'column', 'endLine', 'endColumn'],
              properties: {
                severity: { enum: ['error', 'warning', 'info'] },
                id: { type: 'string', pattern: '^[a-z]+(-[a-z]+)*$' },
                message: { type: 'string', minLength: 1 },
                line: { type: 'integer', minimum: 1 },
                column: { type: 'integer', minimum: 1 },
                endLine: { type: 'integer', minimum: 1 },
                endColumn: { type: 'integer', minimum: 1 },
              },
            },
          },
        },
      },
    },
  },
};
const validCheckJson = new Ajv({ allErrors: true }).compile(checkSchema);

interface CheckJson {
  schema: string;
  files: {
    file: string;
    ok: boolean;
    diagnostics: { severity: string; id: string; message: string; line: number; column: number }[];
  }[];
}

async function check(args: string[], io = fakeIO({ cwd: fixtures })) {
  const code = await main(['check', ...args], io);
  return { code, out: io.out(), err: io.err() };
}

async function checkJson(args: string[], io = fakeIO({ cwd: fixtures })) {
  const r = await check([...args, '--format', 'json'], io);
  const json = JSON.parse(r.out) as CheckJson;
  expect(validCheckJson(json), JSON.stringify(validCheckJson.errors)).toBe(true);
  return { ...r, json };
}

describe('fourfold check', () => {
  it('a good pattern: exit 0, nothing but the summary', async () => {
    const r = await check(['strip.ffp']);
    expect(r.code).toBe(0);
    expect(r.err).toBe('checked 1 file: no problems\n');
    expect(r.out).toBe('');
  });

  it('warnings alone exit 0 and keep ok true; the material checks are included', async () => {
    const text = 'title: Two Chalks\ncolors:\n  A  #F4F1EA  chalk\n  B  #F4F1EB  chalk two\n\nrow 1: AAAA BAB ABA\n';
    const { code, json } = await checkJson(['-'], fakeIO({ cwd: fixtures, stdin: text }));
    expect(code).toBe(0);
    expect(json.files[0]).toMatchObject({
      ok: true,
      diagnostics: [{ severity: 'warning', id: 'similar-colors', line: 4 }],
    });
  });

  it('reports every mistake of a file in one run, each with line, column and a hint', async () => {
    const r = await check(['broken.ffp']);
    expect(r.code).toBe(1);
    // broken.ffp, counted by hand: a misspelt header key (line 2, column 1), a unit with
    // one bead too many (line 10, unit 2 at column 12), a row number that skips 3 (line 11,
    // the '4' at column 5) and a key with no colour (line 11, the 'C' at column 16).
    const expected = [
      ['broken.ffp:2:1: warning[unknown-key]', "did you mean 'designer'?"],
      ['broken.ffp:10:12: error[bead-count]', 'Write 2 keys'],
      ['broken.ffp:11:5: error[row-number]', 'expected row 3'],
      ['broken.ffp:11:16: error[unknown-color]', "add a line like '  C"],
    ] as const;
    expect(r.err.match(/^broken\.ffp:\d+:\d+: /gm)).toHaveLength(expected.length);
    for (const [head, fix] of expected) {
      const at = r.err.indexOf(head);
      expect(at, `${head} in\n${r.err}`).toBeGreaterThanOrEqual(0);
      // The hint (or the message itself) says how to fix it.
      const block = r.err.slice(at, r.err.indexOf('\nbroken.ffp:', at + 1) >>> 0);
      expect(block).toContain(fix);
      expect(block).toMatch(/\^/);
    }
  });

  it('--format json prints exactly the fourfold.check/1 shape', async () => {
    const { code, json, err } = await checkJson(['broken.ffp', 'strip.ffp']);
    expect(code).toBe(1);
    expect(err).toBe('');
    expect(json.files.map((f) => [f.file, f.ok])).toEqual([
      ['broken.ffp', false],
      ['strip.ffp', true],
    ]);
    const ids = json.files[0]!.diagnostics.map((d) => `${d.line}:${d.column}:${d.id}`);
    expect(ids).toEqual(['2:1:unknown-key', '10:12:bead-count', '11:5:row-number', '11:16:unknown-color']);
  });

  it('--similar-colors moves the threshold of the similar-colors warning', async () => {
    // Two blues 2.07 apart in CIEDE2000 (culori's differenceCiede2000, the library the engine uses).
    const pattern = 'title: Blues\ncolors:\n  A #2e6f8e\n  B #2a6b8e\nrow 1: AAAA BBB\n';
    const ids = async (args: string[]) => {
      const io = fakeIO({ cwd: fixtures, stdin: pattern });
      const code = await main(['check', '-', '--format', 'json', ...args], io);
      const json = JSON.parse(io.out()) as CheckJson;
      return { code, ids: json.files[0]!.diagnostics.map((d) => d.id) };
    };
    expect(await ids([])).toEqual({ code: 0, ids: ['similar-colors'] });
    expect(await ids(['--similar-colors', '1'])).toEqual({ code: 0, ids: [] });
    expect(await ids(['--similar-colors', '0'])).toEqual({ code: 0, ids: [] });
  });

  it('in a batch, an unreadable file (2) wins over a pattern error (1)', async () => {
    const { code, json, err } = await checkJson(['broken.ffp', 'no-such.ffp', 'strip.ffp']);
    expect(code).toBe(2);
    expect(err).toBe("fourfold: cannot read 'no-such.ffp': no such file or folder\n");
    expect(json.files.map((f) => f.file)).toEqual(['broken.ffp', 'no-such.ffp', 'strip.ffp']);
    expect(json.files[1]).toMatchObject({ ok: false, diagnostics: [{ id: 'read-error', line: 1, column: 1 }] });
    expect(json.files[1]!.diagnostics[0]!.message).toBe("cannot read 'no-such.ffp': no such file or folder");
  });

  it('a missing file or a folder is exit 2 with one clear line', async () => {
    const missing = await check(['nope.ffp']);
    expect(missing.code).toBe(2);
    expect(missing.err).toBe(
      "fourfold: cannot read 'nope.ffp': no such file or folder\nchecked 0 files: no problems; 1 could not be read\n",
    );
    const folder = await check(['.']);
    expect(folder.code).toBe(2);
    expect(folder.err).toContain("fourfold: cannot read '.': it is a folder, not a file\n");
  });

  it("reads standard input for '-' and calls it <stdin>", async () => {
    const io = fakeIO({ cwd: fixtures, stdin: fixture('broken.ffp') });
    const { code, json } = await checkJson(['-'], io);
    expect(code).toBe(1);
    expect(json.files[0]!.file).toBe('<stdin>');
    const text = await check(['-'], fakeIO({ cwd: fixtures, stdin: fixture('broken.ffp') }));
    expect(text.err).toContain('<stdin>:10:12: error[bead-count]');
  });

  it('bytes that are not UTF-8 text are one clear error, not a crash', async () => {
    const io = fakeIO({ cwd: fixtures, stdin: Uint8Array.from([0x74, 0x69, 0xff, 0xfe, 0x00, 0x01]) });
    const { code, json } = await checkJson(['-'], io);
    expect(code).toBe(1);
    expect(json.files[0]!.diagnostics).toHaveLength(1);
    expect(json.files[0]!.diagnostics[0]!.severity).toBe('error');
  });

  it('a file over the 1 MiB limit of NOTATION.md section 7 is refused with too-large', async () => {
    const big = `title: Huge\n# ${'x'.repeat(2 * 1024 * 1024)}\n`;
    const { code, json } = await checkJson(['-'], fakeIO({ cwd: fixtures, stdin: big }));
    expect(code).toBe(1);
    expect(json.files[0]!.diagnostics.map((d) => d.id)).toEqual(['too-large']);
  });

  it('colour only on a terminal, and never with NO_COLOR', async () => {
    const tty = await check(['broken.ffp'], fakeIO({ cwd: fixtures, tty: true }));
    expect(hasAnsi(tty.err)).toBe(true);
    const noColor = await check(['broken.ffp'], fakeIO({ cwd: fixtures, tty: true, env: { NO_COLOR: '1' } }));
    expect(hasAnsi(noColor.err)).toBe(false);
    const pipe = await check(['broken.ffp'], fakeIO({ cwd: fixtures, tty: false }));
    expect(hasAnsi(pipe.err)).toBe(false);
    // Colour changes nothing but the escapes.
    expect(stripAnsi(tty.err)).toBe(pipe.err);
  });
});
