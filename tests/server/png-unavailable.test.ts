/**
 * A server whose font cache folder cannot be written still serves SVG charts,
 * answers PNG requests with 503 and a message that keeps the server's paths
 * to itself, and logs the reason for its operator.
 */
import { afterAll, beforeAll, expect, it, vi } from 'vitest';
import request from 'supertest';
import { login, SAMPLE, startHarness, type Harness } from './harness.js';

// Set before the font module loads, which reads the folder once: a path under this very file, which is no folder.
const cacheDir = vi.hoisted(() => {
  const dir = `${new URL(import.meta.url).pathname}/cache`;
  process.env.FOURFOLD_CACHE_DIR = dir;
  return dir;
});

const logged: unknown[] = [];
let h: Harness;
let token = '';
let id = 0;

beforeAll(async () => {
  h = await startHarness({ log: (error) => logged.push(error) });
  token = await login(h, 'designer@example.com');
  const created = await request(h.app)
    .post('/api/patterns')
    .set('Authorization', `Bearer ${token}`)
    .send({ source: SAMPLE })
    .expect(201);
  id = created.body.items[0].id;
});
afterAll(() => h?.close());

it('PNG is 503 png-unavailable, SVG still 200, and the log says which folder and why', async () => {
  const svg = await request(h.app).get(`/api/patterns/${id}/chart.svg`).set('Authorization', `Bearer ${token}`);
  expect(svg.status).toBe(200);

  const png = await request(h.app).get(`/api/patterns/${id}/chart.png`).set('Authorization', `Bearer ${token}`);
  expect(png.status).toBe(503);
  expect(png.body.error.code).toBe('png-unavailable');
  expect(png.body.error.message).toMatch(/SVG chart .* still work/);
  expect(JSON.stringify(png.body)).not.toContain(cacheDir);

  expect(logged).toHaveLength(1);
  expect((logged[0] as Error).message).toBe(
    `cannot write the bundled font for PNG output into '${cacheDir}/fonts': a part of the path is not a folder`,
  );
});
