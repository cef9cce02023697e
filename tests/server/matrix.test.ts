/**
 * Every route, called by each kind of caller: anonymous, an invited tester,
 * another designer, the owner and an admin. Each call gets a fresh pattern
 * (with a tester invited, a share link and a note) so no call depends on
 * another. Expected: 401 without a token, 403 for a role that may never do
 * it, 404 for a pattern the caller cannot see, 2xx otherwise.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { login, makeUser, SAMPLE, startHarness, type Harness } from './harness.js';

type Caller = 'anonymous' | 'tester' | 'other' | 'owner' | 'admin';
const CALLERS: Caller[] = ['anonymous', 'tester', 'other', 'owner', 'admin'];

interface Fixture {
  pattern: number;
  share: number;
  shareToken: string;
  feedback: number;
  testerId: number;
  scratchUser: number;
  ownToken: number;
}

interface Row {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: (f: Fixture) => string;
  body?: (f: Fixture) => object;
  expect: Record<Caller, number>;
  /** The call works on a throw-away account (made only for these rows: hashing passwords is slow). */
  scratch?: true;
}

const viewer = { anonymous: 401, tester: 200, other: 404, owner: 200, admin: 200 };
const ownerOnly = (ok: number) => ({ anonymous: 401, tester: 403, other: 404, owner: ok, admin: 403 });
const adminOnly = (ok: number) => ({ anonymous: 401, tester: 403, other: 403, owner: 403, admin: ok });
const anyone = (ok: number) => ({ anonymous: 401, tester: ok, other: ok, owner: ok, admin: ok });
const everyone = (ok: number) => ({ anonymous: ok, tester: ok, other: ok, owner: ok, admin: ok });
let unique = 0;

const ROWS: Row[] = [
  { method: 'get', path: () => '/api/health', expect: everyone(200) },
  { method: 'get', path: () => '/api/auth/me', expect: anyone(200) },
  { method: 'post', path: () => '/api/check', body: () => ({ source: SAMPLE }), expect: anyone(200) },
  { method: 'get', path: () => '/api/patterns', expect: anyone(200) },
  {
    method: 'post',
    path: () => '/api/patterns',
    body: () => ({ source: SAMPLE }),
    expect: { anonymous: 401, tester: 403, other: 201, owner: 201, admin: 403 },
  },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}?version=1`, expect: viewer },
  {
    method: 'put',
    path: (f) => `/api/patterns/${f.pattern}`,
    body: () => ({ source: SAMPLE + '# changed\n' }),
    expect: ownerOnly(200),
  },
  { method: 'delete', path: (f) => `/api/patterns/${f.pattern}`, expect: ownerOnly(204) },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/versions`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/chart.svg`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/chart.png`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/tally`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/steps`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/kit`, expect: viewer },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/model`, expect: viewer },
  {
    method: 'post',
    path: (f) => `/api/patterns/${f.pattern}/shares`,
    body: () => ({ expiresInDays: 7 }),
    expect: ownerOnly(201),
  },
  { method: 'delete', path: (f) => `/api/patterns/${f.pattern}/shares/${f.share}`, expect: ownerOnly(204) },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/access`, expect: ownerOnly(200) },
  {
    method: 'post',
    path: (f) => `/api/patterns/${f.pattern}/invites`,
    body: () => ({ email: `new-tester-${++unique}@example.com` }),
    expect: ownerOnly(201),
  },
  { method: 'delete', path: (f) => `/api/patterns/${f.pattern}/invites/${f.testerId}`, expect: ownerOnly(204) },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/feedback`, expect: viewer },
  {
    method: 'post',
    path: (f) => `/api/patterns/${f.pattern}/feedback`,
    body: () => ({ row: 1, text: 'Row 1 is fine.' }),
    expect: { anonymous: 401, tester: 201, other: 404, owner: 201, admin: 403 },
  },
  {
    method: 'patch',
    path: (f) => `/api/patterns/${f.pattern}/feedback/${f.feedback}`,
    body: () => ({ status: 'resolved' }),
    expect: ownerOnly(200),
  },
  { method: 'get', path: (f) => `/api/patterns/${f.pattern}/place`, expect: viewer },
  {
    method: 'put',
    path: (f) => `/api/patterns/${f.pattern}/place`,
    body: () => ({ row: 2, unit: 1 }),
    expect: { anonymous: 401, tester: 200, other: 404, owner: 200, admin: 403 },
  },
  { method: 'get', path: () => '/api/tokens', expect: anyone(200) },
  { method: 'post', path: () => '/api/tokens', body: () => ({ name: 'laptop' }), expect: anyone(201) },
  { method: 'delete', path: (f) => `/api/tokens/${f.ownToken}`, expect: anyone(204) },
  { method: 'get', path: () => '/api/users', expect: adminOnly(200) },
  {
    method: 'post',
    path: () => '/api/users',
    body: () => ({
      name: 'Pell Armitage',
      email: `made-${++unique}@example.com`,
      role: 'designer',
      password: 'long-enough-1',
    }),
    expect: adminOnly(201),
  },
  { method: 'get', path: (f) => `/api/users/${f.testerId}`, expect: adminOnly(200) },
  {
    method: 'patch',
    path: (f) => `/api/users/${f.scratchUser}`,
    body: () => ({ role: 'designer' }),
    expect: adminOnly(200),
    scratch: true,
  },
  { method: 'delete', path: (f) => `/api/users/${f.scratchUser}`, expect: adminOnly(204), scratch: true },
  { method: 'get', path: () => '/api/dev/outbox', expect: adminOnly(200) },
  { method: 'get', path: (f) => `/api/shared/${f.shareToken}`, expect: everyone(200) },
  { method: 'get', path: (f) => `/api/shared/${f.shareToken}/chart.svg`, expect: everyone(200) },
  { method: 'get', path: (f) => `/api/shared/${f.shareToken}/chart.png`, expect: everyone(200) },
  { method: 'get', path: (f) => `/api/shared/${f.shareToken}/tally`, expect: everyone(200) },
  { method: 'get', path: (f) => `/api/shared/${f.shareToken}/steps`, expect: everyone(200) },
];

let h: Harness;
const tokens = {} as Record<Caller, string | null>;
let testerId = 0;

beforeAll(async () => {
  h = await startHarness();
  tokens.anonymous = null;
  tokens.owner = await login(h, 'designer@example.com');
  tokens.tester = await login(h, 'tester@example.com');
  tokens.admin = await login(h, 'admin@example.com');
  tokens.other = await makeUser(h, tokens.admin, 'designer', 'other-designer@example.com');
  testerId = (await h.db.models.User.findOne({ where: { email: 'tester@example.com' } }))!.id;
});
afterAll(async () => h?.close());

const as = (caller: Caller, req: request.Test) =>
  tokens[caller] ? req.set('Authorization', `Bearer ${tokens[caller]}`) : req;

async function fixture(caller: Caller, scratchUser = false): Promise<Fixture> {
  const owner = (req: request.Test) => as('owner', req);
  const made = await owner(request(h.app).post('/api/patterns')).send({ source: SAMPLE }).expect(201);
  const pattern = made.body.items[0].id as number;
  await owner(request(h.app).post(`/api/patterns/${pattern}/invites`))
    .send({ email: 'tester@example.com' })
    .expect(201);
  const share = await owner(request(h.app).post(`/api/patterns/${pattern}/shares`))
    .send({})
    .expect(201);
  const note = await as('tester', request(h.app).post(`/api/patterns/${pattern}/feedback`))
    .send({ row: 1, text: 'Stuck here.' })
    .expect(201);
  const scratch = scratchUser
    ? await as('admin', request(h.app).post('/api/users'))
        .send({
          name: 'Scratch Person',
          email: `scratch-${++unique}@example.com`,
          role: 'tester',
          password: 'long-enough-1',
        })
        .expect(201)
    : { body: { id: 0 } };
  let ownToken = 0;
  if (tokens[caller]) {
    const t = await as(caller, request(h.app).post('/api/tokens')).send({ name: 'to revoke' }).expect(201);
    ownToken = t.body.item.id as number;
  }
  return {
    pattern,
    share: share.body.id,
    shareToken: share.body.token,
    feedback: note.body.id,
    testerId,
    scratchUser: scratch.body.id,
    ownToken,
  };
}

describe('route-by-role matrix', () => {
  for (const row of ROWS) {
    const label = `${row.method.toUpperCase()} ${row.path({ pattern: 1, share: 1, shareToken: 'TOKEN', feedback: 1, testerId: 1, scratchUser: 1, ownToken: 1 })}`;
    it(label, async () => {
      const seen = {} as Record<Caller, number>;
      for (const caller of CALLERS) {
        const f = await fixture(caller, row.scratch);
        let req = as(caller, request(h.app)[row.method](row.path(f)));
        if (row.body) req = req.send(row.body(f));
        const res = await req;
        seen[caller] = res.status;
        if (res.status >= 400)
          expect(res.body.error?.code, `${caller}: ${JSON.stringify(res.body)}`).toBeTypeOf('string');
      }
      expect(seen).toEqual(row.expect);
    });
  }

  it('an uninvited tester gets 404 for a pattern and sees none in the library', async () => {
    const stranger = await makeUser(h, tokens.admin!, 'tester', 'stranger@example.com');
    const f = await fixture('owner');
    const get = await request(h.app).get(`/api/patterns/${f.pattern}`).set('Authorization', `Bearer ${stranger}`);
    expect(get.status).toBe(404);
    const list = await request(h.app).get('/api/patterns').set('Authorization', `Bearer ${stranger}`);
    expect(list.body.total).toBe(0);
  });

  it('a revoked personal token and a made-up token are both 401', async () => {
    const made = await as('owner', request(h.app).post('/api/tokens')).send({ name: 'cli' }).expect(201);
    const token = made.body.token as string;
    await request(h.app).get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
    await as('owner', request(h.app).delete(`/api/tokens/${made.body.item.id}`)).expect(204);
    await request(h.app).get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    await request(h.app)
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${'x'.repeat(43)}`)
      .expect(401);
  });

  it("someone else's personal token cannot be revoked (404)", async () => {
    const made = await as('owner', request(h.app).post('/api/tokens')).send({ name: 'cli' }).expect(201);
    await as('other', request(h.app).delete(`/api/tokens/${made.body.item.id}`)).expect(404);
  });
});
