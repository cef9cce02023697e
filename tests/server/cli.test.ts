/** `fourfold login`, `push` and `pull` through the CLI's own dispatcher, against a server listening on a free port. */
import { mkdtemp, readFile, rm, stat, writeFile } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { main } from '../../bin/dispatch.js';
import type { CliIO } from '../../bin/command.js';
import { PASSWORD, SAMPLE, startHarness, type Harness } from './harness.js';

let h: Harness;
let server: Server;
let url = '';
let dir = '';

beforeAll(async () => {
  h = await startHarness();
  server = h.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  dir = await mkdtemp(join(tmpdir(), 'fourfold-cli-'));
});
afterAll(async () => {
  await new Promise((r) => server?.close(r));
  await h?.close();
  await rm(dir, { recursive: true, force: true });
});

async function cli(argv: string[], stdin = ''): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const io: CliIO = {
    stdout: { write: (t: string | Uint8Array) => (out += typeof t === 'string' ? t : Buffer.from(t).toString()) },
    stderr: { write: (t: string) => (err += t) },
    readStdin: async () => Buffer.from(stdin),
    env: { FOURFOLD_CONFIG_DIR: join(dir, 'config'), NO_COLOR: '1' },
    cwd: dir,
  };
  const code = await main(argv, io);
  return { code, out, err };
}

describe('CLI against a running viewer', () => {
  it('logs in with e-mail and password and keeps a machine-named token, mode 600', async () => {
    const res = await cli(['login', '--server', url], `designer@example.com\n${PASSWORD}\n`);
    expect(res.err).toBe('');
    expect(res.code).toBe(0);
    expect(res.out).toContain('as Ines Marlow <designer@example.com>');
    const file = join(dir, 'config', 'viewer.json');
    expect((await stat(file)).mode & 0o777).toBe(0o600);
    const saved = JSON.parse(await readFile(file, 'utf8'));
    expect(saved.server).toBe(url);
    const tokens = await request(h.app).get('/api/tokens').set('Authorization', `Bearer ${saved.token}`).expect(200);
    expect(tokens.body.items.map((t: { name: string }) => t.name)).toContain(hostname());
  });

  it('refuses a wrong password without saving anything new', async () => {
    const res = await cli(['login', '--server', url], 'designer@example.com\nwrong-password\n');
    expect(res.code).toBe(2);
    expect(res.err).toContain('login failed: The e-mail address or the password is wrong.');
  });

  it('pushes files, printing URLs and diagnostics, then makes versions only for changes', async () => {
    await writeFile(join(dir, 'band.ffp'), SAMPLE);
    await writeFile(
      join(dir, 'broken.ffp'),
      SAMPLE.replace('Harbour Band', 'Broken Band').replace('row 2: BAB AB AB', 'row 2: BAB ABB AB'),
    );
    const first = await cli(['push', 'band.ffp', 'broken.ffp']);
    expect(first.code).toBe(1);
    expect(first.out).toMatch(new RegExp(`^band\\.ffp: ${url}/patterns/\\d+ \\(new, version 1\\)$`, 'm'));
    expect(first.out).toMatch(/^broken\.ffp: .* \(new, version 1\)$/m);
    expect(first.err).toContain('broken.ffp:11:12: error[bead-count]');
    const again = await cli(['push', 'band.ffp']);
    expect(again.out).toMatch(/\(unchanged, version 1\)/);
    await writeFile(join(dir, 'band.ffp'), `${SAMPLE}row 3: BAB AB AB\n`);
    const changed = await cli(['push', 'band.ffp']);
    expect(changed.code).toBe(0);
    expect(changed.out).toMatch(/\(version 2\)/);
  });

  it('pulls a pattern to a file and to standard output', async () => {
    const pushed = await cli(['push', 'band.ffp', '--format', 'json']);
    const id = JSON.parse(pushed.out).files[0].id as number;
    const toFile = await cli(['pull', String(id), '-o', 'copy.ffp']);
    expect(toFile.code).toBe(0);
    expect(await readFile(join(dir, 'copy.ffp'), 'utf8')).toBe(await readFile(join(dir, 'band.ffp'), 'utf8'));
    const toStdout = await cli(['pull', String(id)]);
    expect(toStdout.out).toBe(await readFile(join(dir, 'band.ffp'), 'utf8'));
    const missing = await cli(['pull', '999999']);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('No such pattern.');
  });

  it('accepts a token given with --token and rejects a bad one', async () => {
    const made = await request(h.app)
      .post('/api/auth/login')
      .send({ email: 'tester@example.com', password: PASSWORD })
      .expect(200);
    const ok = await cli(['login', '--server', url, '--token', made.body.token]);
    expect(ok.code).toBe(0);
    expect(ok.out).toContain('Tobiah Renwick');
    const bad = await cli(['login', '--server', url, '--token', 'not-a-token']);
    expect(bad.code).toBe(2);
  });
});
