/** Share links (valid, revoked, expired, tampered), invitation mail with a working link, password reset. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { login, PUBLIC_URL, SAMPLE, startHarness, type Harness } from './harness.js';

let h: Harness;
let owner = '';
let admin = '';
beforeAll(async () => {
  h = await startHarness();
  owner = await login(h, 'designer@example.com');
  admin = await login(h, 'admin@example.com');
});
afterAll(async () => h?.close());

const as = (token: string, req: request.Test) => req.set('Authorization', `Bearer ${token}`);

async function newPattern(): Promise<number> {
  const res = await as(owner, request(h.app).post('/api/patterns')).send({ source: SAMPLE }).expect(201);
  return res.body.items[0].id;
}

async function outbox(): Promise<{ to: string[]; subject: string; text: string }[]> {
  return (await as(admin, request(h.app).get('/api/dev/outbox')).expect(200)).body.items;
}

const linkIn = (text: string): URL => new URL(/https?:\/\/\S+\/reset\?\S+/.exec(text)![0]);

describe('share links', () => {
  it('work without sign-in while valid, and stop when revoked', async () => {
    const id = await newPattern();
    const made = await as(owner, request(h.app).post(`/api/patterns/${id}/shares`))
      .send({})
      .expect(201);
    expect(made.body.url).toBe(`${PUBLIC_URL}/s/${made.body.token}`);
    // 32 random bytes in base64url, without padding.
    expect(Buffer.from(made.body.token, 'base64url')).toHaveLength(32);
    const view = await request(h.app).get(`/api/shared/${made.body.token}`).expect(200);
    expect(view.body).toMatchObject({
      id,
      title: 'Harbour Band',
      source: SAMPLE,
      can: { edit: false, feedback: false },
    });
    const svg = await request(h.app).get(`/api/shared/${made.body.token}/chart.svg`).expect(200);
    expect(svg.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(svg.headers['content-security-policy']).toBe('sandbox');
    expect(svg.headers['x-content-type-options']).toBe('nosniff');
    const access = await as(owner, request(h.app).get(`/api/patterns/${id}/access`)).expect(200);
    expect(access.body.shares).toEqual([expect.objectContaining({ id: made.body.id, active: true, revoked: false })]);
    expect(JSON.stringify(access.body)).not.toContain(made.body.token);
    await as(owner, request(h.app).delete(`/api/patterns/${id}/shares/${made.body.id}`)).expect(204);
    await request(h.app).get(`/api/shared/${made.body.token}`).expect(404);
    await request(h.app).get(`/api/shared/${made.body.token}/tally`).expect(404);
  });

  it('stop at their expiry', async () => {
    const id = await newPattern();
    const made = await as(owner, request(h.app).post(`/api/patterns/${id}/shares`))
      .send({ expiresInDays: 1 })
      .expect(201);
    await request(h.app).get(`/api/shared/${made.body.token}`).expect(200);
    await h.db.models.ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: made.body.id } });
    await request(h.app).get(`/api/shared/${made.body.token}`).expect(404);
  });

  it('refuse a tampered token', async () => {
    const id = await newPattern();
    const { token } = (
      await as(owner, request(h.app).post(`/api/patterns/${id}/shares`))
        .send({})
        .expect(201)
    ).body;
    const flipped = (token[0] === 'A' ? 'B' : 'A') + token.slice(1);
    await request(h.app).get(`/api/shared/${flipped}`).expect(404);
    await request(h.app)
      .get(`/api/shared/${token.slice(0, -1)}`)
      .expect(404);
    await request(h.app).get(`/api/shared/${token}x`).expect(404);
    await request(h.app).get(`/api/shared/${token}`).expect(200);
  });

  it('are stored as hashes only', async () => {
    const id = await newPattern();
    const { token } = (
      await as(owner, request(h.app).post(`/api/patterns/${id}/shares`))
        .send({})
        .expect(201)
    ).body;
    const rows = await h.db.models.ShareLink.findAll({ where: { patternId: id }, raw: true });
    expect(JSON.stringify(rows)).not.toContain(token);
  });
});

describe('invitations', () => {
  it('mail a new tester a single-use link that sets a password and opens the pattern', async () => {
    const id = await newPattern();
    const res = await as(owner, request(h.app).post(`/api/patterns/${id}/invites`))
      .send({ email: 'Wren.Hollis@Example.com', name: 'Wren Hollis' })
      .expect(201);
    expect(res.body).toMatchObject({
      created: true,
      tester: { email: 'wren.hollis@example.com', name: 'Wren Hollis' },
    });
    const [mail] = await outbox();
    expect(mail!.to).toEqual(['wren.hollis@example.com']);
    expect(mail!.subject).toBe('Ines Marlow invited you to test "Harbour Band"');
    expect(mail!.text).toContain(`${PUBLIC_URL}/patterns/${id}`);
    const link = linkIn(mail!.text);
    expect(link.searchParams.get('invite')).toBe('1');
    const token = link.searchParams.get('token')!;
    const set = await request(h.app).post('/api/auth/reset').send({ token, password: 'wren-password-1' }).expect(200);
    expect(set.body.user).toMatchObject({ role: 'tester', email: 'wren.hollis@example.com' });
    await request(h.app).post('/api/auth/reset').send({ token, password: 'another-password' }).expect(400);
    const wren = await login(h, 'wren.hollis@example.com', 'wren-password-1');
    const list = await as(wren, request(h.app).get('/api/patterns')).expect(200);
    expect(list.body.items.map((p: { id: number }) => p.id)).toEqual([id]);
    const access = await as(owner, request(h.app).get(`/api/patterns/${id}/access`)).expect(200);
    expect(access.body.testers).toEqual([expect.objectContaining({ email: 'wren.hollis@example.com' })]);
    await as(owner, request(h.app).delete(`/api/patterns/${id}/invites/${set.body.user.id}`)).expect(204);
    await as(wren, request(h.app).get(`/api/patterns/${id}`)).expect(404);
  });

  it('will not turn a designer into a tester', async () => {
    const id = await newPattern();
    const res = await as(owner, request(h.app).post(`/api/patterns/${id}/invites`)).send({
      email: 'admin@example.com',
    });
    expect(res.status).toBe(409);
  });
});

describe('sign-in and passwords', () => {
  it('answers a wrong password and an unknown address alike', async () => {
    const wrong = await request(h.app)
      .post('/api/auth/login')
      .send({ email: 'designer@example.com', password: 'nope-nope' });
    const unknown = await request(h.app)
      .post('/api/auth/login')
      .send({ email: 'nobody@example.com', password: 'nope-nope' });
    expect([wrong.status, unknown.status]).toEqual([401, 401]);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('sends a reset mail only to a real account, with the same answer either way', async () => {
    const before = (await outbox()).length;
    const ghost = await request(h.app).post('/api/auth/reset-request').send({ email: 'ghost@example.com' });
    const real = await request(h.app).post('/api/auth/reset-request').send({ email: 'tester@example.com' });
    expect([ghost.status, real.status]).toEqual([202, 202]);
    expect(ghost.body).toEqual(real.body);
    const mails = await outbox();
    expect(mails.length).toBe(before + 1);
    const token = linkIn(mails[0]!.text).searchParams.get('token')!;
    const link = (await h.db.models.PasswordToken.findOne({ order: [['id', 'DESC']] }))!;
    const lifetime = link.expiresAt.getTime() - link.createdAt.getTime();
    expect(lifetime).toBeGreaterThan(0);
    expect(lifetime).toBeLessThan(60 * 60 * 1000);
    await request(h.app).post('/api/auth/reset').send({ token, password: 'tester-new-pass' }).expect(200);
    await login(h, 'tester@example.com', 'tester-new-pass');
  });

  it('refuses an expired reset link', async () => {
    await request(h.app).post('/api/auth/reset-request').send({ email: 'designer@example.com' }).expect(202);
    const token = linkIn((await outbox())[0]!.text).searchParams.get('token')!;
    await h.db.models.PasswordToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { usedAt: null } });
    const res = await request(h.app).post('/api/auth/reset').send({ token, password: 'whatever-123' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-token');
  });

  it('signs out by revoking the session token, and changes a password', async () => {
    const token = await login(h, 'admin@example.com');
    await as(token, request(h.app).post('/api/auth/password'))
      .send({ current: 'wrong-one', password: 'admin-new-pass' })
      .expect(400);
    await as(token, request(h.app).post('/api/auth/password'))
      .send({ current: 'test-password-1', password: 'admin-new-pass' })
      .expect(204);
    await login(h, 'admin@example.com', 'admin-new-pass');
    await as(token, request(h.app).post('/api/auth/logout')).expect(204);
    await as(token, request(h.app).get('/api/auth/me')).expect(401);
  });

  it('limits sign-in attempts per address', async () => {
    const strict = await startHarness({ loginLimit: 3 });
    try {
      const attempt = () =>
        request(strict.app).post('/api/auth/login').send({ email: 'designer@example.com', password: 'guess-guess' });
      for (let i = 0; i < 3; i++) expect((await attempt()).status).toBe(401);
      const limited = await attempt();
      expect(limited.status).toBe(429);
      expect(limited.body.error.code).toBe('too-many-requests');
      // Other addresses are still let through, until the client's own limit (10 times the per-address one) is reached.
      const spray = (i: number) =>
        request(strict.app)
          .post('/api/auth/login')
          .send({ email: `spray-${i}@example.com`, password: 'guess-guess' });
      const statuses: number[] = [];
      for (let i = 0; i < 30; i++) statuses.push((await spray(i)).status);
      expect(statuses[0]).toBe(401);
      expect(statuses.at(-1)).toBe(429);
      // The client may make 10 x 3 = 30 tries a minute: 3 went to the designer (the 4th was stopped per address), 27 here.
      expect(statuses.filter((s) => s === 401)).toHaveLength(27);
    } finally {
      await strict.close();
    }
  });

  it('sends a strict Content-Security-Policy on API answers', async () => {
    const res = await request(h.app).get('/api/health').expect(200);
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
  });

  it('answers health without a token, and checks a token when one is sent', async () => {
    expect((await request(h.app).get('/api/health').expect(200)).body).toEqual({ ok: true });
    expect((await as(owner, request(h.app).get('/api/health')).expect(200)).body).toEqual({ ok: true });
    const stale = await as('x'.repeat(43), request(h.app).get('/api/health')).expect(401);
    expect(stale.body.error.code).toBe('unauthenticated');
  });
});
