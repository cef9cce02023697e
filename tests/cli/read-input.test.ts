import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readInput, readPattern } from '../../bin/read-input.js';
import { fakeIO } from './fake-io.js';

const dir = mkdtempSync(join(tmpdir(), 'fourfold-read-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const io = (stdin?: string | Uint8Array) => fakeIO({ cwd: dir, stdin });

describe('readInput', () => {
  it('reads a file relative to the working folder, and - from standard input', async () => {
    writeFileSync(join(dir, 'a.ffp'), 'title: A\n');
    expect(await readInput('a.ffp', io())).toEqual({ file: 'a.ffp', bytes: Buffer.from('title: A\n') });
    expect(await readInput('-', io('title: B\n'))).toEqual({ file: '<stdin>', bytes: Buffer.from('title: B\n') });
  });

  it('says why a file cannot be read, in one line', async () => {
    expect(await readInput('none.ffp', io())).toEqual({
      error: "fourfold: cannot read 'none.ffp': no such file or folder",
    });
    expect(await readInput('.', io())).toEqual({ error: "fourfold: cannot read '.': it is a folder, not a file" });
    writeFileSync(join(dir, 'plain'), 'x');
    expect(await readInput('plain/inside.ffp', io())).toEqual({
      error: "fourfold: cannot read 'plain/inside.ffp': a part of the path is not a folder",
    });
  });

  it('reads no more than one byte past the 1 MiB limit, so the parser can refuse a huge file cheaply', async () => {
    writeFileSync(join(dir, 'big.ffp'), Buffer.alloc(3 * 1024 * 1024, 0x41));
    const r = await readInput('big.ffp', io());
    expect('bytes' in r && r.bytes.length).toBe(1024 * 1024 + 1);
  });
});

describe('readPattern', () => {
  it('decodes UTF-8 and drops a byte-order mark', async () => {
    const r = await readPattern('-', io(Uint8Array.from([0xef, 0xbb, 0xbf, ...Buffer.from('title: Née\n')])));
    expect(r).toEqual({ file: '<stdin>', text: 'title: Née\n', diagnostics: [] });
  });

  it('bytes that are not UTF-8 give one error diagnostic at the start of the file', async () => {
    const r = await readPattern('-', io(Uint8Array.from([0x74, 0xff, 0xfe, 0x00])));
    expect('diagnostics' in r && r.diagnostics.map((d) => [d.severity, d.range.line, d.range.column])).toEqual([
      ['error', 1, 1],
    ]);
  });
});
