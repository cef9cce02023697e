/** The built web app beside the API: static files, the SPA fallback, and API 404s that stay JSON. */
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app.js';
import { login, makeUser, PUBLIC_URL, startHarness, type Harness } from './harness.js';

let h: Harness;
let webDir = '';
let app: ReturnType<typeof createApp>;
beforeAll(async () => {
  h = await startHarness();
  webDir = await mkdtemp(join(tmpdir(), 'fourfold-web-'));
  await mkdir(join(webDir, 'assets'));
  await writeFile(join(webDir, 'index.html'), '<!doctype html><title>Fourfold</title><div id="root"></div>');
  await writeFile(join(webDir, 'assets', 'app.js'), 'console.log("app")');
  app = createApp({ db: h.db, mailer: h.mailer, publicUrl: PUBLIC_URL, webDir, log: () => {} });
});
afterAll(async () => {
  await h?.close();
  await rm(webDir, { recursive: true, force: true });
});

describe('web app and API together', () => {
  it('serves files, falls back to index.html for app routes, keeps API errors JSON', async () => {
    const asset = await request(app).get('/assets/app.js').expect(200);
    expect(asset.headers['content-type']).toMatch(/javascript/);
    const page = await request(app).get('/patterns/12').set('Accept', 'text/html').expect(200);
    expect(page.text).toContain('<div id="root">');
    expect(page.headers['content-security-policy']).toContain("script-src 'self'");
    const api = await request(app).get('/api/no-such-route').set('Accept', 'text/html');
    expect(api.status).toBe(401);
    expect(api.body.error.code).toBe('unauthenticated');
    const token = await login(h, 'designer@example.com');
    const missing = await request(app).get('/api/no-such-route').set('Authorization', `Bearer ${token}`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('not-found');
  });

  it('keeps hashed assets for good but has index.html asked for again, so a new deploy is seen at once', async () => {
    const asset = await request(app).get('/assets/app.js').expect(200);
    expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    for (const path of ['/', '/index.html']) {
      const page = await request(app).get(path).expect(200);
      expect(page.text).toContain('<div id="root">');
      expect(page.headers['cache-control']).toBe('no-cache');
      // no-cache means "revalidate", which only pays off with a validator to revalidate against.
      const again = await request(app).get(path).set('If-None-Match', page.headers.etag!);
      expect(again.status).toBe(304);
    }
    const fallback = await request(app).get('/patterns/12').set('Accept', 'text/html').expect(200);
    expect(fallback.headers['cache-control']).toBe('no-cache');
    // An asset a stale page still names is gone: a 404, not the app's HTML in its place.
    const gone = await request(app).get('/assets/app-old.js').set('Accept', '*/*');
    expect(gone.status).toBe(404);
    expect(gone.text).not.toContain('<div id="root">');
  });

  it('applies a role change to the very next request', async () => {
    const admin = await login(h, 'admin@example.com');
    const token = await makeUser(h, admin, 'designer', 'promoted@example.com');
    await request(app).get('/api/users').set('Authorization', `Bearer ${token}`).expect(403);
    const id = (await h.db.models.User.findOne({ where: { email: 'promoted@example.com' } }))!.id;
    await request(app)
      .patch(`/api/users/${id}`)
      .set('Authorization', `Bearer ${admin}`)
      .send({ role: 'admin' })
      .expect(200);
    await request(app).get('/api/users').set('Authorization', `Bearer ${token}`).expect(200);
    await request(app).delete(`/api/users/${id}`).set('Authorization', `Bearer ${admin}`).expect(204);
    await request(app).get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
  });
});
