import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { login, SAMPLE, startHarness, type Harness } from './harness.js';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => h?.close());

describe('smoke', () => {
  it('answers health and signs in', async () => {
    expect((await request(h.app).get('/api/health')).body).toEqual({ ok: true });
    const token = await login(h, 'designer@example.com');
    const created = await request(h.app).post('/api/patterns').set('Authorization', `Bearer ${token}`).send({ source: SAMPLE });
    expect(created.status).toBe(201);
    const list = await request(h.app).get('/api/patterns').set('Authorization', `Bearer ${token}`);
    expect(list.body.total).toBe(1);
  });
});
