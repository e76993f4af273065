import { Sequelize } from 'sequelize';
import pg from 'pg';
import { initModels } from './models/index.js';

// Return int8 (bigint, count(*)) as numbers; our counts stay far below 2^53.
pg.types.setTypeParser(20, (value) => Number(value));

let current: Sequelize | null = null;

/** One Sequelize per process: models are bound to it once. */
export function connectDatabase(url: string, opts: { poolMax?: number } = {}): Sequelize {
  if (current) return current;
  current = new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    // a short acquire wait and connect timeout: during a database outage requests fail fast with 503
    pool: { max: opts.poolMax ?? 10, min: 0, idle: 10_000, acquire: 10_000, evict: 1_000 },
    dialectOptions: { connectionTimeoutMillis: 10_000 },
    define: { underscored: true },
  });
  initModels(current);
  return current;
}

export function database(): Sequelize {
  if (!current) throw new Error('connectDatabase() has not been called');
  return current;
}

export async function closeDatabase() {
  await current?.close();
  current = null;
}
