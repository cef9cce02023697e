/** Uploads: good, broken, oversized and binary files, many at once, and all-or-nothing writes. */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { login, SAMPLE, startHarness, type Harness } from './harness.js';

let h: Harness;
let token = '';
beforeAll(async () => {
  h = await startHarness();
  token = await login(h, 'designer@example.com');
});
afterAll(async () => h?.close());

const post = () => request(h.app).post('/api/patterns').set('Authorization', `Bearer ${token}`);
const patternCount = () => h.db.models.Pattern.count();
const BROKEN = SAMPLE.replace('row 2: BAB AB AB', 'row 2: BAB ABB AB');

describe('uploads', () => {
  it('stores a good file with its counts; a 3 x 2 flat panel has n(r+1) + r(n+1) = 17 beads', async () => {
    // Source: NOTATION.md section 8, flat panel n units x r rows.
    const res = await post().attach('file', Buffer.from(SAMPLE), 'harbour.ffp').expect(201);
    const [item] = res.body.items;
    expect(item).toMatchObject({
      title: 'Harbour Band',
      layout: 'flat',
      rows: 2,
      units: 6,
      beads: 17,
      errors: 0,
      version: 1,
    });
    expect(item.colors.map((c: { key: string }) => c.key)).toEqual(['A', 'B']);
  });

  it('stores a broken file with its error and the line and column of the bad unit', async () => {
    const res = await post().attach('file', Buffer.from(BROKEN), 'broken.ffp').expect(201);
    const [item] = res.body.items;
    expect(item.errors).toBeGreaterThan(0);
    const error = item.diagnostics.find((d: { severity: string }) => d.severity === 'error');
    expect(error.id).toBe('bead-count');
    // "row 2: BAB ABB AB": the second unit starts at column 12 of line 11.
    expect(error.range).toMatchObject({ line: 11, column: 12 });
    const detail = await request(h.app)
      .get(`/api/patterns/${item.id}`)
      .set('Authorization', `Bearer ${token}`)
      .expect(200);
    expect(detail.body.source).toBe(BROKEN);
  });

  it('takes many files in one request', async () => {
    const before = await patternCount();
    let req = post();
    for (let i = 0; i < 50; i++)
      req = req.attach('file', Buffer.from(SAMPLE.replace('Harbour Band', `Band ${i}`)), `band-${i}.ffp`);
    const res = await req.expect(201);
    expect(res.body.items).toHaveLength(50);
    expect(await patternCount()).toBe(before + 50);
  });

  it('refuses a 51st file and stores none of them', async () => {
    const before = await patternCount();
    let req = post();
    for (let i = 0; i < 51; i++) req = req.attach('file', Buffer.from(SAMPLE), `band-${i}.ffp`);
    const res = await req;
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too-large');
    expect(await patternCount()).toBe(before);
  });

  it('refuses a file over 1 MiB, even beside good ones, and stores nothing', async () => {
    const before = await patternCount();
    const big = Buffer.alloc(1024 * 1024 + 1, 0x23); // '#' comment characters
    const res = await post().attach('file', Buffer.from(SAMPLE), 'ok.ffp').attach('file', big, 'big.ffp');
    expect(res.status).toBe(413);
    expect(await patternCount()).toBe(before);
  });

  it('refuses binary files (NUL bytes, invalid UTF-8) with 415 and stores nothing', async () => {
    const before = await patternCount();
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
    const res = await post().attach('file', Buffer.from(SAMPLE), 'ok.ffp').attach('file', png, 'picture.ffp');
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({ code: 'not-text', details: { file: 'picture.ffp' } });
    const latin1 = Buffer.from('title: Caf\xe9\n', 'latin1');
    expect((await post().attach('file', latin1, 'latin1.ffp')).status).toBe(415);
    expect(await patternCount()).toBe(before);
  });

  it('rolls back every pattern of a request when a write fails part-way', async () => {
    const before = await patternCount();
    const versions = await h.db.models.Version.count();
    const create = h.db.models.Version.create.bind(h.db.models.Version);
    let calls = 0;
    // The database refuses the third version, as a full disk or a lost connection would.
    const spy = vi.spyOn(h.db.models.Version, 'create').mockImplementation(((...args: Parameters<typeof create>) => {
      if (++calls === 3) return Promise.reject(new Error('simulated write failure'));
      return create(...args);
    }) as typeof create);
    try {
      let req = post();
      for (let i = 0; i < 4; i++) req = req.attach('file', Buffer.from(SAMPLE), `band-${i}.ffp`);
      const res = await req;
      expect(res.status).toBe(500);
      expect(res.body.error).toEqual({
        code: 'internal',
        message: 'Something went wrong on the server.',
        details: null,
      });
    } finally {
      spy.mockRestore();
    }
    expect(await patternCount()).toBe(before);
    expect(await h.db.models.Version.count()).toBe(versions);
  });

  it('takes pasted text as JSON and refuses other bodies', async () => {
    const res = await post().send({ source: SAMPLE }).expect(201);
    expect(res.body.items[0].beads).toBe(17);
    const empty = await post().send({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.code).toBe('invalid-input');
    const text = await post().set('Content-Type', 'text/plain').send(SAMPLE);
    expect(text.status).toBe(415);
  });

  it('checks without saving', async () => {
    const before = await patternCount();
    const res = await request(h.app)
      .post('/api/check')
      .set('Authorization', `Bearer ${token}`)
      .attach('file', Buffer.from(SAMPLE), 'a.ffp')
      .attach('file', Buffer.from(BROKEN), 'b.ffp')
      .expect(200);
    const [good, bad] = res.body.files;
    expect(good).toMatchObject({ name: 'a.ffp', ok: true, title: 'Harbour Band' });
    expect(good.tally).toMatchObject({ schema: 'fourfold.tally/1', beads: 17, units: 6 });
    expect(bad).toMatchObject({ name: 'b.ffp', ok: false, tally: null });
    expect(await patternCount()).toBe(before);
  });
});
