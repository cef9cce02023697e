/** One Sequelize instance over the mariadb dialect, migrated with umzug (never `sync()`). */
import { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { defineModels, type Models } from '../models/index.js';
import { migrations } from '../migrations/index.js';

export interface Db {
  sequelize: Sequelize;
  models: Models;
  close(): Promise<void>;
}

export interface ConnectOptions {
  poolMax?: number;
  /**
   * The socket of a server on this machine (our own launcher's). Every query
   * is a write to the database connection, and over loopback TCP the kernel's
   * TCP work for both ends is charged to that write; a Unix socket skips it.
   */
  socketPath?: string;
}

export function connect(url: string, options: ConnectOptions = {}): Db {
  const sequelize = new Sequelize(url, {
    dialect: 'mariadb',
    logging: false,
    pool: { max: options.poolMax ?? 10, min: 0, idle: 10_000 },
    // Dates come back as UTC, whatever the server's time zone.
    timezone: '+00:00',
    dialectOptions: { timezone: '+00:00', ...(options.socketPath ? { socketPath: options.socketPath } : {}) },
  });
  const models = defineModels(sequelize);
  return { sequelize, models, close: () => sequelize.close() };
}

export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const umzug = new Umzug({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
  const applied = await umzug.up();
  return applied.map((m) => m.name);
}
