import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';

// Migrations are listed here (not globbed) and imported through this module,
// so they load the same way under tsx, vitest and a bundler; names are
// recorded without an extension.
const migrations = {
  '0001-core': () => import('./migrations/0001-core.js'),
  '0002-production': () => import('./migrations/0002-production.js'),
  '0010-bake-day-counter': () => import('./migrations/0010-bake-day-counter.js'),
  '0020-owner-menu': () => import('./migrations/0020-owner-menu.js'),
  '0021-owner-ops': () => import('./migrations/0021-owner-ops.js'),
  '0030-hardening': () => import('./migrations/0030-hardening.js'),
  '0040-production-line': () => import('./migrations/0040-production-line.js'),
  '0050-shop-logo': () => import('./migrations/0050-shop-logo.js'),
  '0060-order-currency': () => import('./migrations/0060-order-currency.js'),
} as const;

export function createMigrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: Object.entries(migrations).map(([name, load]) => ({
      name,
      up: async (params) => (await load()).up(params),
      down: async (params) => (await load()).down?.(params),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}
