import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../bin/dispatch.js';
import { ioReason } from '../../bin/read-input.js';
import { fakeIO } from './fake-io.js';

const fixtures = fileURLToPath(new URL('./fixtures/', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'fourfold-write-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('an output that cannot be written', () => {
  it('chart -o under a file (not a folder) is exit 2 with the reason in words, not an errno', async () => {
    const blocker = join(dir, 'plain-file');
    writeFileSync(blocker, 'x');
    const io = fakeIO({ cwd: fixtures });
    const code = await main(['chart', 'strip.ffp', '-o', join(blocker, 'strip.svg')], io);
    expect(code).toBe(2);
    expect(io.err()).toBe(
      `fourfold: cannot write '${join(blocker, 'strip.svg')}': a part of the path is not a folder\n`,
    );
    expect(io.out()).toBe('');
  });

  it('names the usual failures in words and keeps the message of anything else', () => {
    expect(ioReason({ code: 'ENOSPC' })).toBe('the disk is full');
    // mkdir meets a file where a folder should be: EEXIST or ENOTDIR, by platform and path; one wording.
    expect(ioReason({ code: 'EEXIST' })).toBe(ioReason({ code: 'ENOTDIR' }));
    expect(ioReason({ code: 'EROFS' })).toBe('the disk is read-only');
    expect(ioReason(new Error('something odd'))).toBe('something odd');
  });
});
