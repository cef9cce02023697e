/** Versions: numbering, dedupe by content hash, older versions by ?version=N, feedback across versions. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createHash } from 'node:crypto';
import { login, SAMPLE, startHarness, type Harness } from './harness.js';

let h: Harness;
let owner = '';
let tester = '';
beforeAll(async () => {
  h = await startHarness();
  owner = await login(h, 'designer@example.com');
  tester = await login(h, 'tester@example.com');
});
afterAll(async () => h?.close());

const as = (token: string, req: request.Test) => req.set('Authorization', `Bearer ${token}`);
// One more row of three units: 3 + 2 + 2 = 7 new beads (NOTATION.md section 3).
const LONGER = `${SAMPLE}row 3: BAB AB AB\n`;

async function newPattern(): Promise<number> {
  const res = await as(owner, request(h.app).post('/api/patterns')).send({ source: SAMPLE }).expect(201);
  return res.body.items[0].id;
}

describe('versions', () => {
  it('makes a new version only when the text changes', async () => {
    const id = await newPattern();
    const same = await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: SAMPLE })
      .expect(200);
    expect(same.body).toMatchObject({ created: false, pattern: { version: 1 } });
    const changed = await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: LONGER })
      .expect(200);
    // Flat panel 3 x 3: n(r+1) + r(n+1) = 3*4 + 3*4 = 24 (NOTATION.md section 8).
    expect(changed.body).toMatchObject({ created: true, pattern: { version: 2, rows: 3, beads: 24, source: LONGER } });
    await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: LONGER })
      .expect(200);
    const versions = await as(owner, request(h.app).get(`/api/patterns/${id}/versions`)).expect(200);
    expect(versions.body.items.map((v: { number: number }) => v.number)).toEqual([2, 1]);
    // The content hash is the SHA-256 of the UTF-8 text, checked against node:crypto as a reference.
    expect(versions.body.items[1].contentHash).toBe(createHash('sha256').update(SAMPLE).digest('hex'));
    expect(versions.body.items[0].author).toMatchObject({ name: 'Ines Marlow' });
  });

  it('serves any version by ?version=N, and 404 for one that does not exist', async () => {
    const id = await newPattern();
    await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: LONGER })
      .expect(200);
    const v1 = await as(owner, request(h.app).get(`/api/patterns/${id}?version=1`)).expect(200);
    expect(v1.body).toMatchObject({ source: SAMPLE, viewing: { version: 1 }, version: 2 });
    const t1 = await as(owner, request(h.app).get(`/api/patterns/${id}/tally?version=1`)).expect(200);
    const t2 = await as(owner, request(h.app).get(`/api/patterns/${id}/tally`)).expect(200);
    expect([t1.body.beads, t2.body.beads]).toEqual([17, 24]);
    const model = await as(owner, request(h.app).get(`/api/patterns/${id}/model?version=2`)).expect(200);
    expect(model.body.schema).toBe('fourfold.model/1');
    expect(model.body.rows).toHaveLength(3);
    await as(owner, request(h.app).get(`/api/patterns/${id}?version=3`)).expect(404);
    await as(owner, request(h.app).get(`/api/patterns/${id}?version=abc`)).expect(400);
  });

  it('keeps a note on later versions while its row exists, marked with its version', async () => {
    const id = await newPattern();
    await as(owner, request(h.app).post(`/api/patterns/${id}/invites`))
      .send({ email: 'tester@example.com' })
      .expect(201);
    await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: LONGER })
      .expect(200);
    const onRow3 = await as(tester, request(h.app).post(`/api/patterns/${id}/feedback`))
      .send({ row: 3, unit: 2, text: 'Lost count here.' })
      .expect(201);
    expect(onRow3.body).toMatchObject({ version: 2, row: 3, unit: 2, status: 'open' });
    await as(tester, request(h.app).post(`/api/patterns/${id}/feedback`))
      .send({ row: 1, text: 'Fine.', version: 1 })
      .expect(201);
    await as(tester, request(h.app).post(`/api/patterns/${id}/feedback`))
      .send({ row: 9, text: 'No such row.' })
      .expect(400);
    // Version 3 drops row 3 again: the row-3 note no longer shows, the row-1 note (written on v1) still does.
    await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: `${SAMPLE}# shorter again\n` })
      .expect(200);
    const now = await as(owner, request(h.app).get(`/api/patterns/${id}/feedback`)).expect(200);
    expect(now.body.items.map((f: { row: number; version: number }) => [f.row, f.version])).toEqual([[1, 1]]);
    const onV2 = await as(owner, request(h.app).get(`/api/patterns/${id}/feedback?version=2`)).expect(200);
    expect(onV2.body.items).toHaveLength(2);
    const resolved = await as(owner, request(h.app).patch(`/api/patterns/${id}/feedback/${onRow3.body.id}`))
      .send({ status: 'resolved' })
      .expect(200);
    expect(resolved.body.status).toBe('resolved');
    expect(resolved.body.resolvedAt).toBeTypeOf('string');
  });

  it('keeps a place per user', async () => {
    const id = await newPattern();
    await as(owner, request(h.app).post(`/api/patterns/${id}/invites`))
      .send({ email: 'tester@example.com' })
      .expect(201);
    expect((await as(tester, request(h.app).get(`/api/patterns/${id}/place`))).body).toEqual({ row: null, unit: null });
    await as(tester, request(h.app).put(`/api/patterns/${id}/place`))
      .send({ row: 2, unit: 3 })
      .expect(200);
    expect((await as(tester, request(h.app).get(`/api/patterns/${id}/place`))).body).toEqual({ row: 2, unit: 3 });
    expect((await as(owner, request(h.app).get(`/api/patterns/${id}/place`))).body).toEqual({ row: null, unit: null });
  });

  it('deletes a pattern with everything hanging off it', async () => {
    const id = await newPattern();
    await as(owner, request(h.app).put(`/api/patterns/${id}`))
      .send({ source: LONGER })
      .expect(200);
    await as(owner, request(h.app).delete(`/api/patterns/${id}`)).expect(204);
    expect(await h.db.models.Version.count({ where: { patternId: id } })).toBe(0);
    await as(owner, request(h.app).get(`/api/patterns/${id}`)).expect(404);
  });

  it('lists with search, sort and pages', async () => {
    const token = await login(h, 'admin@example.com');
    const made = await request(h.app)
      .post('/api/users')
      .set('Authorization', `Bearer ${token}`)
      .send({ name: 'Lio Brannagh', email: 'lister@example.com', role: 'designer', password: 'long-enough-1' })
      .expect(201);
    expect(made.body.role).toBe('designer');
    const lister = await login(h, 'lister@example.com', 'long-enough-1');
    for (const [title, rows] of [
      ['Cobalt Cuff', 1],
      ['amber 100% Band', 2],
      ['Birch Strip', 3],
    ] as const) {
      const source =
        SAMPLE.replace('Harbour Band', title).replace(/row 2:.*\n/, rows >= 2 ? 'row 2: BAB AB AB\n' : '') +
        (rows === 3 ? 'row 3: BAB AB AB\n' : '');
      await as(lister, request(h.app).post('/api/patterns')).send({ source }).expect(201);
    }
    const byTitle = await as(lister, request(h.app).get('/api/patterns?sort=title')).expect(200);
    expect(byTitle.body.items.map((p: { title: string }) => p.title)).toEqual([
      'amber 100% Band',
      'Birch Strip',
      'Cobalt Cuff',
    ]);
    const byBeads = await as(lister, request(h.app).get('/api/patterns?sort=beads&dir=asc')).expect(200);
    // Strip of 3 units: 3n + 1 = 10; then 17 and 24 (NOTATION.md section 8).
    expect(byBeads.body.items.map((p: { beads: number }) => p.beads)).toEqual([10, 17, 24]);
    const paged = await as(lister, request(h.app).get('/api/patterns?sort=title&page=2&pageSize=2')).expect(200);
    expect(paged.body).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(paged.body.items.map((p: { title: string }) => p.title)).toEqual(['Cobalt Cuff']);
    const searched = await as(lister, request(h.app).get(`/api/patterns?q=${encodeURIComponent('100%')}`)).expect(200);
    expect(searched.body.items.map((p: { title: string }) => p.title)).toEqual(['amber 100% Band']);
    // The total counts what the search matches, not every pattern of the owner, on a full page and past the end.
    const band = await as(lister, request(h.app).get('/api/patterns?q=b&sort=title&pageSize=1')).expect(200);
    expect(band.body).toMatchObject({ total: 3, page: 1, pageSize: 1 });
    const strips = await as(lister, request(h.app).get('/api/patterns?q=strip')).expect(200);
    expect(strips.body).toMatchObject({ total: 1, items: [{ title: 'Birch Strip' }] });
    // The library formats its dates in SQL, the detail through Date: both must give the same ISO 8601 text.
    const detail = await as(lister, request(h.app).get(`/api/patterns/${strips.body.items[0].id}`)).expect(200);
    expect(strips.body.items[0].createdAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.000Z$/);
    expect(strips.body.items[0]).toMatchObject({ createdAt: detail.body.createdAt, updatedAt: detail.body.updatedAt });
    expect(Math.abs(Date.parse(detail.body.createdAt) - Date.now())).toBeLessThan(10 * 60_000);
    const past = await as(lister, request(h.app).get('/api/patterns?q=strip&page=3')).expect(200);
    expect(past.body).toMatchObject({ total: 1, page: 3, items: [] });
    await as(lister, request(h.app).get('/api/patterns?pageSize=1000')).expect(400);
  });
});

describe('versions under concurrent saves', () => {
  it('gives two different saves consecutive numbers and two identical saves one version', async () => {
    const id = await newPattern();
    const put = (source: string) => as(owner, request(h.app).put(`/api/patterns/${id}`)).send({ source });
    const [a, b] = await Promise.all([put(LONGER), put(`${SAMPLE}# note\n`)]);
    expect([a.body.created, b.body.created]).toEqual([true, true]);
    const numbers = (await as(owner, request(h.app).get(`/api/patterns/${id}/versions`))).body.items.map(
      (v: { number: number }) => v.number,
    );
    expect(numbers).toEqual([3, 2, 1]);
    const same = `${SAMPLE}# same twice\n`;
    const twice = await Promise.all([put(same), put(same)]);
    expect(twice.map((r) => r.body.created).sort()).toEqual([false, true]);
    expect(await h.db.models.Version.count({ where: { patternId: id } })).toBe(4);
  });
});
