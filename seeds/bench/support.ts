// What the benchmarks share: a wiped and migrated database with the demo in
// it, the app listening on a free port, and a signed-in session cookie.
import http from 'node:http';
import crypto from 'node:crypto';
import type { AddressInfo } from 'node:net';
import pg from 'pg';
import { sign } from 'cookie-signature';
import { connectDatabase, closeDatabase, migrate, User } from '@fryline/api/db';
import { loadConfig } from '@fryline/api/config';
import { createApp } from '@fryline/api';
import { seedDemo } from '../src/index.js';

/** BENCH_DATABASE_URL, or a `fryline_bench` database on the start command's cluster; created if missing, then wiped and given the demo. */
export async function benchDatabase() {
  const url = process.env.BENCH_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5433/fryline_bench';
  const admin = new pg.Client({ connectionString: url.replace(/\/[^/]+$/, '/postgres') });
  await admin.connect();
  const name = new URL(url).pathname.slice(1);
  if ((await admin.query('SELECT 1 FROM pg_database WHERE datname = $1', [name])).rowCount === 0) await admin.query(`CREATE DATABASE "${name}"`);
  await admin.end();
  const sequelize = connectDatabase(url);
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
  await migrate(sequelize);
  await seedDemo(new Date());
  return { url, sequelize };
}

/** The app on a free port, and a session cookie for one of the demo's people. */
export async function benchApp(url: string, email: string) {
  const config = loadConfig({ DATABASE_URL: url, JOBS: 'off', PORT: '0' });
  const app = createApp(config);
  const server = http.createServer(app);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const user = (await User.findOne({ where: { email } }))!;
  const sid = crypto.randomUUID();
  await connectDatabase(url).query(`INSERT INTO "session" (sid, sess, expire) VALUES (:sid, :sess, now() + interval '1 hour')`, {
    replacements: { sid, sess: JSON.stringify({ cookie: { path: '/', httpOnly: true }, passport: { user: user.id } }) },
  });
  const cookie = `fryline.sid=${encodeURIComponent(`s:${sign(sid, config.SESSION_SECRET)}`)}`;
  return {
    base,
    cookie,
    async close() {
      server.close();
      await app.closeResources();
      await closeDatabase();
    },
  };
}

/** "median … p95 … max …" of a set of timings in ms. */
export function timings(times: number[]): string {
  const sorted = [...times].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!.toFixed(1);
  return `median ${at(0.5)} ms   p95 ${at(0.95)} ms   max ${sorted.at(-1)!.toFixed(1)} ms`;
}
