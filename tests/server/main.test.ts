/** startServer (what `fourfold serve` runs) on an existing database given by DATABASE_URL: migrate, seed once, serve, close. */
import { once } from 'node:events';
import { createServer, type AddressInfo } from 'node:net';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT_FAILURE, type CliIO } from '../../bin/command.js';
import { run as runServe } from '../../bin/commands/serve.js';
import { connect } from '../../server/db/connect.js';
import { startServer } from '../../server/main.js';
import { freshDatabaseUrl } from './harness.js';

const root = resolve(import.meta.dirname, '../..');

/** The parts of the answers these tests read: a sign-in and a library page. */
interface Answer {
  token?: string;
  total?: number;
  items?: { owner: { name: string } }[];
}

async function json(url: string, init?: RequestInit): Promise<{ status: number; body: Answer }> {
  const res = await fetch(url, { ...init, headers: { 'Content-Type': 'application/json', ...(init?.headers ?? {}) } });
  return { status: res.status, body: (await res.json()) as Answer };
}

describe('startServer', () => {
  it('migrates, seeds the demo studio once with the examples, and stops cleanly', async () => {
    const env = {
      DATABASE_URL: await freshDatabaseUrl(),
      NODE_ENV: 'development',
      FOURFOLD_DEMO_PASSWORD: 'demo-pass-123',
    };
    const lines: string[] = [];
    const first = await startServer({
      port: 0,
      demo: true,
      examplesDir: resolve(root, 'examples'),
      root,
      env,
      log: (l) => lines.push(l),
    });
    try {
      expect(first.seeded).toBe(true);
      expect(lines).toContain('applied migrations: 0001-initial');
      expect(lines.some((l) => l.startsWith('seeded the demo studio'))).toBe(true);
      const login = await json(`${first.url}/api/auth/login`, {
        method: 'POST',
        body: JSON.stringify({ email: 'designer@example.com', password: 'demo-pass-123' }),
      });
      expect(login.status).toBe(200);
      const list = await json(`${first.url}/api/patterns`, {
        headers: { Authorization: `Bearer ${login.body.token}` },
      });
      expect(list.body.total).toBeGreaterThan(0);
      expect(list.body.items!.every((p) => p.owner.name === 'Ines Marlow')).toBe(true);
    } finally {
      await first.close();
    }
    await expect(fetch(`${first.url}/api/health`)).rejects.toThrow();
    const again = await startServer({
      port: 0,
      demo: true,
      examplesDir: resolve(root, 'examples'),
      root,
      env,
      log: () => {},
    });
    try {
      expect(again.seeded).toBe(false);
    } finally {
      await again.close();
    }
  });

  it('says which port is taken and how to pick another, and leaves Ctrl-C alone afterwards', async () => {
    const blocker = createServer().listen(0, '127.0.0.1');
    await once(blocker, 'listening');
    const port = (blocker.address() as AddressInfo).port;
    const err: string[] = [];
    const out: string[] = [];
    const io: CliIO = {
      stdout: { write: (t) => out.push(String(t)) },
      stderr: { write: (t) => err.push(t) },
      readStdin: async () => Buffer.alloc(0),
      env: { DATABASE_URL: await freshDatabaseUrl(), NODE_ENV: 'development' },
      cwd: root,
    };
    const sigints = process.listenerCount('SIGINT');
    try {
      const code = await runServe({ name: 'serve', operands: [], options: { port } }, io);
      expect(code).toBe(EXIT_FAILURE);
    } finally {
      blocker.close();
    }
    expect(err.join('')).toContain(`port ${port} on 127.0.0.1 is already in use`);
    expect(err.join('')).toContain('--port or PORT');
    expect(out).toEqual([]);
    expect(process.listenerCount('SIGINT')).toBe(sigints);
  });

  it('never seeds the demo in production', async () => {
    const env = { DATABASE_URL: await freshDatabaseUrl(), NODE_ENV: 'production', SMTP_URL: 'smtp://127.0.0.1:9' };
    const running = await startServer({ port: 0, demo: true, root, env, log: () => {} });
    try {
      expect(running.seeded).toBe(false);
      expect(running.demoPassword).toBeNull();
      const db = connect(env.DATABASE_URL);
      try {
        expect(await db.models.User.count()).toBe(0);
      } finally {
        await db.close();
      }
    } finally {
      await running.close();
    }
  });
});
