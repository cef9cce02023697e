/**
 * Global set-up of the `db` test project: a real MariaDB from Debian's
 * package on a free loopback port, in a temporary data folder that is
 * removed afterwards. Never a mock.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { launchMariadb } from '../../server/db/mariadb-launcher.js';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The application user's URL of the test server's `fourfold` database. */
    databaseUrl: string;
    /** The server's socket, where `root` may create one database per test file. */
    mariadbSocket: string;
  }
}

export default async function setup(project: TestProject) {
  const dataDir = await mkdtemp(join(tmpdir(), 'fourfold-test-db-'));
  const db = await launchMariadb({ dataDir });
  project.provide('databaseUrl', db.url);
  project.provide('mariadbSocket', db.socket!);
  return async () => {
    await db.stop();
    await rm(dataDir, { recursive: true, force: true });
  };
}
