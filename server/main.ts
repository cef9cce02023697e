/**
 * Everything `fourfold serve` starts, in order, and stops in reverse: the
 * database (ours or DATABASE_URL's), migrations, the demo seed, mail, HTTP.
 */
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import type { Socket } from 'node:net';
import { join, resolve } from 'node:path';
import { createApp } from './app.js';
import { connect, migrate } from './db/connect.js';
import { openDatabase } from './db/mariadb-launcher.js';
import { closeEngine } from './engine.js';
import { createMailer } from './mail.js';
import { DEFAULT_DEMO_PASSWORD, seedDemo } from './seed.js';

export interface ServeOptions {
  port: number;
  /** Seed the demo studio into an empty database (never in production). */
  demo: boolean;
  examplesDir?: string;
  /** Project root: `.data/` and `dist/web` are found from here. */
  root: string;
  env: NodeJS.ProcessEnv;
  log: (line: string) => void;
}

export interface Running {
  url: string;
  seeded: boolean;
  demoPassword: string | null;
  close(): Promise<void>;
}

export async function startServer(options: ServeOptions): Promise<Running> {
  const { env, log } = options;
  const production = env.NODE_ENV === 'production';
  const database = await openDatabase(
    env,
    join(resolve(options.root, env.FOURFOLD_DATA_DIR ?? '.data'), 'mariadb'),
    log,
  );
  const stack: (() => Promise<void>)[] = [database.stop];
  const close = async () => {
    while (stack.length) await stack.pop()!().catch((error: unknown) => log(`while stopping: ${String(error)}`));
  };
  try {
    const db = connect(database.url, { socketPath: database.socket });
    stack.push(() => db.close());
    stack.push(closeEngine);
    const applied = await migrate(db.sequelize);
    if (applied.length) log(`applied migrations: ${applied.join(', ')}`);
    const demoPassword = env.FOURFOLD_DEMO_PASSWORD || DEFAULT_DEMO_PASSWORD;
    const seeded =
      options.demo && !production && (await seedDemo(db, { password: demoPassword, examplesDir: options.examplesDir }));
    if (seeded) log("seeded the demo studio: three accounts, and the examples as the designer's patterns");
    const mailer = await createMailer({
      smtpUrl: env.SMTP_URL || undefined,
      from: env.MAIL_FROM || 'Fourfold <no-reply@fourfold.invalid>',
    });
    stack.push(() => mailer.close());
    const sockets = new Set<Socket>();
    // Read at request time, once the server below is listening.
    const publicUrl = () =>
      (env.PUBLIC_URL || `http://127.0.0.1:${(server.address() as AddressInfo).port}`).replace(/\/+$/, '');
    const app = createApp({
      db,
      mailer,
      get publicUrl() {
        return publicUrl();
      },
      production,
      webDir: join(options.root, 'dist', 'web'),
      log: (error) => log(error instanceof Error ? (error.stack ?? error.message) : String(error)),
    });
    const server: Server = app.listen(options.port, '127.0.0.1');
    await once(server, 'listening');
    server.on('connection', (socket) => {
      sockets.add(socket);
      socket.once('close', () => sockets.delete(socket));
    });
    stack.push(
      () =>
        new Promise<void>((done) => {
          server.close(() => done());
          for (const socket of sockets) socket.destroy();
        }),
    );
    return { url: publicUrl(), seeded, demoPassword: options.demo && !production ? demoPassword : null, close };
  } catch (error) {
    await close();
    throw error;
  }
}
