/** Downloads from the server are the bytes the CLI writes for the same pattern and options. */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { main } from '../../bin/dispatch.js';
import type { CliIO } from '../../bin/command.js';
import { login, SAMPLE, startHarness, type Harness } from './harness.js';

let h: Harness;
let token = '';
let id = 0;
let dir = '';

beforeAll(async () => {
  h = await startHarness();
  token = await login(h, 'designer@example.com');
  id = (
    await request(h.app)
      .post('/api/patterns')
      .set('Authorization', `Bearer ${token}`)
      .send({ source: SAMPLE })
      .expect(201)
  ).body.items[0].id;
  dir = await mkdtemp(join(tmpdir(), 'fourfold-downloads-'));
  await writeFile(join(dir, 'band.ffp'), SAMPLE);
});
afterAll(async () => {
  await h?.close();
  await rm(dir, { recursive: true, force: true });
});

/** What `fourfold ARGS` prints on standard output. */
async function cli(args: string[]): Promise<Buffer> {
  const chunks: Buffer[] = [];
  const io: CliIO = {
    stdout: { write: (t: string | Uint8Array) => chunks.push(Buffer.from(t)) },
    stderr: { write: () => true },
    readStdin: async () => Buffer.alloc(0),
    env: { NO_COLOR: '1' },
    cwd: dir,
  };
  expect(await main(args, io)).toBe(0);
  return Buffer.concat(chunks);
}

const download = async (path: string): Promise<Buffer> => {
  const res = await request(h.app)
    .get(`/api/patterns/${id}/${path}`)
    .set('Authorization', `Bearer ${token}`)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    })
    .expect(200);
  return res.body as Buffer;
};

describe('downloads match the CLI byte for byte', () => {
  const cases: [string, string[]][] = [
    ['chart.svg', ['chart', 'band.ffp']],
    ['chart.svg?theme=dark&numbers=1&thread=2', ['chart', 'band.ffp', '--theme', 'dark', '--numbers', '--thread', '2']],
    ['chart.svg?scale=mm', ['chart', 'band.ffp', '--scale', 'mm']],
    ['chart.png', ['chart', 'band.ffp', '--png']],
    ['tally', ['tally', 'band.ffp', '--format', 'json']],
    ['steps', ['steps', 'band.ffp', '--format', 'json']],
    ['steps?format=text', ['steps', 'band.ffp']],
    ['steps?format=md', ['steps', 'band.ffp', '--format', 'md']],
    ['kit', ['kit', 'band.ffp']],
    ['kit?format=html', ['kit', 'band.ffp', '--format', 'html']],
    ['model', ['model', 'band.ffp']],
  ];
  for (const [path, args] of cases) {
    it(`${path} = fourfold ${args.join(' ')}`, async () => {
      const [server, local] = await Promise.all([download(path), cli(args)]);
      expect(server.length).toBeGreaterThan(0);
      expect(server.equals(local)).toBe(true);
    });
  }

  it('refuses chart options the CLI would refuse', async () => {
    for (const bad of ['theme=neon', 'thread=99', 'scale=km', 'numbers=maybe', 'dpi=5']) {
      const res = await request(h.app)
        .get(`/api/patterns/${id}/chart.svg?${bad}`)
        .set('Authorization', `Bearer ${token}`);
      expect(res.status, bad).toBe(400);
      expect(res.body.error.code).toBe('invalid-input');
    }
  });
});
