/**
 * The real viewer for the browser: createApp on a fresh migrated and seeded
 * database of the test MariaDB, serving the built web app, listening on a
 * loopback port that is also its public URL (so share and invite links work).
 */
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app.js';
import { connect, migrate } from '../../server/db/connect.js';
import { createMailer, type Mailer } from '../../server/mail.js';
import { seedDemo } from '../../server/seed.js';
import { freshDatabaseUrl, PASSWORD } from '../server/harness.js';
import { ensureWebBuild } from './web-build.js';

export { PASSWORD };

export interface Viewer {
  url: string;
  mailer: Mailer;
  close(): Promise<void>;
}

export async function startViewer(): Promise<Viewer> {
  const webDir = await ensureWebBuild();
  const db = connect(await freshDatabaseUrl());
  await migrate(db.sequelize);
  await seedDemo(db, { password: PASSWORD });
  const mailer = await createMailer({ from: 'Fourfold <no-reply@fourfold.invalid>' });
  const server: Server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  server.on('request', createApp({ db, mailer, publicUrl: url, webDir, loginLimit: 1000, log: () => {} }));
  return {
    url,
    mailer,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await mailer.close();
      await db.close();
    },
  };
}
