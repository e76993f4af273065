// Test clusters (the API tests' on [port], the browser journeys' on [port]+1) that stay up for a quick edit-and-run loop:
//   node scripts/test-cluster.mjs [port] [folder] > .test-env   (leave it running)
//   set -a; . ./.test-env; set +a; node_modules/.bin/vitest run --project api test/orders.test.ts
// It prints the same TEST_* variables `npm test` sets, then waits; Ctrl-C stops PostgreSQL.
import path from 'node:path';
import { root } from './lib/shell.mjs';
import { ensurePostgres } from './lib/postgres.mjs';

const port = Number(process.argv[2] ?? process.env.TEST_PGPORT ?? 5434);
const dataDir = path.resolve(process.argv[3] ?? process.env.TEST_DATA_DIR ?? path.join(root, `.test-data-${port}`));
const pg = await ensurePostgres({ dataDir, port, durable: false });
// the browser journeys' own cluster on the next port, as `npm test` has it
const pgE2e = await ensurePostgres({ dataDir: path.join(dataDir, 'e2e'), port: port + 1, durable: false });
const env = {
  NODE_ENV: 'test',
  TEST_PG_ADMIN_URL: pg.createDatabase('postgres'),
  TEST_DATABASE_URL: pg.createDatabase('fryline_test'),
  TEST_E2E_DATABASE_URL: pgE2e.createDatabase('fryline_e2e'),
  TEST_SETUP_DATABASE_URL: pgE2e.createDatabase('fryline_setup'),
};
for (const [k, v] of Object.entries(env)) console.log(`${k}=${v}`);
const stop = () => {
  pg.stop();
  pgE2e.stop();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
setInterval(() => {}, 1 << 30);
