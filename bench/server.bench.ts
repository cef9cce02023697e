/**
 * The viewer under load: autocannon, in a separate process, with 50
 * connections against `GET /api/patterns` over 1,000 stored patterns and
 * against `GET /api/patterns/:id/chart.svg`, each next to `GET /api/health`
 * in the same run, taking turns. Goal: p99 latency at most 4x health's, and no errors.
 * Uses DATABASE_URL when set, otherwise a private MariaDB in a temporary folder.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { createRequire } from 'node:module';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { createApp } from '../server/app.js';
import { connect, migrate } from '../server/db/connect.js';
import { openDatabase } from '../server/db/mariadb-launcher.js';
import { closeEngine } from '../server/engine.js';
import { issueSession } from '../server/auth.js';
import { createMailer } from '../server/mail.js';
import { seedDemo } from '../server/seed.js';
import { createPatterns } from '../server/versions.js';
import type { Bench, Figure } from './harness.js';

const run = promisify(execFile);
const autocannonBin = createRequire(import.meta.url).resolve('autocannon/autocannon.js');
const PATTERNS = 1000;
const CONNECTIONS = 50;
const SECONDS = 3;
/** Health and the route take turns this many times; the medians are compared, so load drifts hit both alike. */
const ROUNDS = 3;

const band = (i: number) => `title: Bench Band ${String(i).padStart(4, '0')}
designer: Sable Quint
layout: flat
colors:
  A  #F4F1EA  chalk
  B  #2E6F8E  deep teal
row 1: BBBB ${'ABA '.repeat(1 + (i % 7))}
row 2: BAB ${'AB '.repeat(1 + (i % 7))}
`;

interface Load {
  p99: number;
  errors: number;
}

/** One autocannon run in its own process, so the load generator does not share the server's event loop. */
async function load(url: string, token: string): Promise<Load> {
  const { stdout } = await run(
    process.execPath,
    [
      autocannonBin,
      '-c',
      String(CONNECTIONS),
      '-d',
      String(SECONDS),
      '-H',
      `Authorization=Bearer ${token}`,
      '--json',
      url,
    ],
    { maxBuffer: 16 * 1024 * 1024 },
  );
  const result = JSON.parse(stdout) as { latency: { p99: number }; errors: number; non2xx: number; timeouts: number };
  return { p99: result.latency.p99, errors: result.errors + result.non2xx + result.timeouts };
}

const bench: Bench = {
  name: 'server',
  async run() {
    const dataDir = await mkdtemp(join(tmpdir(), 'fourfold-bench-db-'));
    const database = await openDatabase(process.env, dataDir);
    const db = connect(database.url, { poolMax: 20, socketPath: database.socket });
    const mailer = await createMailer({ from: 'bench@fourfold.invalid' });
    try {
      await migrate(db.sequelize);
      await seedDemo(db, { password: 'bench-password' });
      const designer = (await db.models.User.findOne({ where: { email: 'designer@example.com' } }))!;
      for (let start = 0; start < PATTERNS; start += 50) {
        await createPatterns(
          db,
          designer,
          Array.from({ length: 50 }, (_, k) => ({ name: 'b.ffp', source: band(start + k) })),
        );
      }
      // A database that has been in use has table statistics; fresh bulk inserts may not yet.
      await db.sequelize.query('ANALYZE TABLE patterns, versions, share_links, invitations');
      const { token } = await issueSession(db.models, designer);
      const first = (await db.models.Pattern.findOne({ where: { ownerId: designer.id }, order: [['id', 'ASC']] }))!;
      const app = createApp({ db, mailer, publicUrl: 'http://127.0.0.1', log: () => {} });
      const server = app.listen(0, '127.0.0.1');
      await new Promise((r) => server.once('listening', r));
      const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
      const figures: Figure[] = [];
      try {
        for (const [name, path] of [
          ['GET /api/patterns (1,000 stored)', '/api/patterns'],
          ['GET /api/patterns/:id/chart.svg', `/api/patterns/${first.id}/chart.svg`],
        ] as const) {
          const health: Load[] = [];
          const route: Load[] = [];
          for (let i = 0; i < ROUNDS; i++) {
            health.push(await load(`${base}/api/health`, token));
            route.push(await load(`${base}${path}`, token));
          }
          const median = (xs: Load[]) => xs.map((x) => x.p99).sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
          const errors = [...health, ...route].reduce((sum, x) => sum + x.errors, 0);
          figures.push({
            name: `${name} p99 vs /api/health, ${CONNECTIONS} connections`,
            value: median(route),
            baseline: median(health),
            unit: 'ms',
            goal: { atMost: 4 },
          });
          figures.push({
            name: `${name} errors and non-2xx answers`,
            value: errors,
            unit: 'requests',
            goal: { atMost: 0 },
          });
        }
      } finally {
        server.closeAllConnections();
        await new Promise((r) => server.close(r));
      }
      return figures;
    } finally {
      await mailer.close();
      await closeEngine();
      await db.close();
      await database.stop();
      await rm(dataDir, { recursive: true, force: true });
    }
  },
};

export default bench;
