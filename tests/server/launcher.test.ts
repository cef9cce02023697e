/** The private MariaDB: initialise, start, create the app user, stop; a restart keeps data and password. */
import { mkdtemp, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import mariadb from 'mariadb';
import { describe, expect, it } from 'vitest';
import { findMariadbd, launchMariadb, openDatabase, type Database } from '../../server/db/mariadb-launcher.js';

async function query(url: string, sql: string): Promise<unknown[]> {
  const conn = await mariadb.createConnection(url);
  try {
    const result: unknown = await conn.query(sql);
    // Rows without the driver's `meta` property; statements that return no rows give [].
    return Array.isArray(result) ? [...(result as unknown[])] : [];
  } finally {
    await conn.end();
  }
}

describe('MariaDB launcher', () => {
  it('starts on loopback, keeps data across a restart, and stops', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'fourfold-launcher-'));
    // Every server started here is stopped, whatever fails (stop() is a no-op once stopped).
    const started: Database[] = [];
    const launch = async () => {
      const db = await launchMariadb({ dataDir: dir });
      started.push(db);
      return db;
    };
    try {
      const first = await launch();
      expect(new URL(first.url).hostname).toBe('127.0.0.1');
      await query(first.url, 'CREATE TABLE kept (n INT)');
      await query(first.url, 'INSERT INTO kept VALUES (42)');
      expect((await stat(join(dir, 'app-password'))).mode & 0o777).toBe(0o600);
      await first.stop();
      await expect(query(first.url, 'SELECT 1')).rejects.toThrow();
      const second = await launch();
      expect(await query(second.url, 'SELECT n FROM kept')).toEqual([{ n: 42 }]);
      // The application user may use its own database only.
      await expect(query(second.url, 'CREATE DATABASE elsewhere')).rejects.toThrow(/denied/i);
    } finally {
      for (const db of started) await db.stop();
      await rm(dir, { recursive: true, force: true });
    }
  });

  it('finds mariadbd on PATH or in /usr/sbin, and without it (not root) names the exact install command', async () => {
    expect(await findMariadbd(() => {}, { path: '', dirs: ['/usr/sbin'], root: false })).toBe('/usr/sbin/mariadbd');
    await expect(findMariadbd(() => {}, { path: '/nonexistent', dirs: [], root: false })).rejects.toThrow(
      'sudo apt-get install -y mariadb-server-core mariadb-client-core',
    );
  });

  it('starts nothing when DATABASE_URL is set', async () => {
    const db = await openDatabase({ DATABASE_URL: 'mariadb://u:p@db.invalid:3306/x' }, '/nonexistent');
    expect(db.url).toBe('mariadb://u:p@db.invalid:3306/x');
    expect(db.socket).toBeUndefined();
    await db.stop();
  });
});
