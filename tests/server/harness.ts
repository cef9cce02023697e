/**
 * Each test file gets a fresh database on the shared test server, migrated
 * and seeded with the demo accounts, and an app built with createApp.
 */
import { randomBytes } from 'node:crypto';
import mariadb from 'mariadb';
import { inject } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app.js';
import { connect, migrate, type Db } from '../../server/db/connect.js';
import { createMailer, type Mailer } from '../../server/mail.js';
import { seedDemo } from '../../server/seed.js';

export const PASSWORD = 'test-password-1';
export const PUBLIC_URL = 'http://viewer.test';

export interface Harness {
  db: Db;
  mailer: Mailer;
  app: ReturnType<typeof createApp>;
  url: string;
  close(): Promise<void>;
}

/** A new, empty database for one test file; the app user gets all rights on it. */
export async function freshDatabaseUrl(): Promise<string> {
  const base = new URL(inject('databaseUrl'));
  const name = `fourfold_t${randomBytes(4).toString('hex')}`;
  const root = await mariadb.createConnection({ socketPath: inject('mariadbSocket'), user: 'root' });
  try {
    await root.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    for (const host of ['127.0.0.1', 'localhost']) {
      await root.query(`GRANT ALL PRIVILEGES ON \`${name}\`.* TO ?@?`, [decodeURIComponent(base.username), host]);
    }
  } finally {
    await root.end();
  }
  base.pathname = `/${name}`;
  return base.toString();
}

export async function startHarness(
  options: { examplesDir?: string; loginLimit?: number; log?: (error: unknown) => void } = {},
): Promise<Harness> {
  const url = await freshDatabaseUrl();
  const db = connect(url);
  await migrate(db.sequelize);
  await seedDemo(db, { password: PASSWORD, examplesDir: options.examplesDir });
  const mailer = await createMailer({ from: 'Fourfold <no-reply@fourfold.invalid>' });
  const app = createApp({
    db,
    mailer,
    publicUrl: PUBLIC_URL,
    loginLimit: options.loginLimit ?? 1000,
    log: options.log ?? (() => {}),
  });
  return {
    db,
    mailer,
    app,
    url,
    close: async () => {
      await mailer.close();
      await db.close();
    },
  };
}

export async function login(h: Harness, email: string, password = PASSWORD): Promise<string> {
  const res = await request(h.app).post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`login ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { token: string }).token;
}

/** A second designer, made through the admin API so the test also covers it. */
export async function makeUser(h: Harness, adminToken: string, role: string, email: string): Promise<string> {
  const res = await request(h.app)
    .post('/api/users')
    .set('Authorization', `Bearer ${adminToken}`)
    .send({ name: `Test ${role}`, email, role, password: PASSWORD });
  if (res.status !== 201) throw new Error(`make user: ${res.status} ${JSON.stringify(res.body)}`);
  return login(h, email);
}

export const SAMPLE = `title: Harbour Band
designer: Ines Marlow
beads: 11/0 round
layout: flat

colors:
  A  #F4F1EA  chalk
  B  #2E6F8E  deep teal

row 1: BBBB ABA BAB
row 2: BAB AB AB
`;
