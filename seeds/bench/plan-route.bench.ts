// Prints how fast GET /api/bake-days/:id/plan answers with 2,000 orders in
// the database. A benchmark, not a test: it asserts nothing.
//
//   node --import tsx seeds/bench/plan-route.bench.ts
//
// Uses BENCH_DATABASE_URL (default: a `fryline_bench` database on the start
// command's cluster, 127.0.0.1:5433 — run `npm start` first). The database is
// wiped and refilled.
import http from 'node:http';
import crypto from 'node:crypto';
import type { AddressInfo } from 'node:net';
import pg from 'pg';
import { sign } from 'cookie-signature';
import { connectDatabase, closeDatabase, migrate, BakeDay, User } from '@fryline/api/db';
import { loadConfig } from '@fryline/api/config';
import { createApp } from '@fryline/api';
import { seedDemo } from '../src/index.js';

const ORDERS = 2000;
const RUNS = 200;
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
const day = (await BakeDay.findOne({ where: { status: 'published' }, order: [['date', 'ASC']], include: ['pickupWindows', 'menuItems'] }))!;
await day.update({ ringCapacity: 100_000, ringsRemaining: 100_000 - ORDERS * 12 });
const customer = (await User.findOne({ where: { email: 'customer@fryline.test' } }))!;
const rings = day.menuItems!.filter((m) => m.kind === 'ring');

// 2,000 paid mixed dozens, written in bulk
await sequelize.query(
  `WITH o AS (
     INSERT INTO orders (user_id, bake_day_id, pickup_window_id, status, rings, holes, holds_capacity, subtotal_cents, tax_cents, total_cents, pickup_code, paid_at)
     SELECT :user, :day, :window, 'paid', 12, 0, true, 3000, 0, 3000, 'B' || lpad(g::text, 6, '0'), now()
       FROM generate_series(1, :n) g
     RETURNING id),
   b AS (INSERT INTO order_boxes (order_id, position, size, pieces, price_cents) SELECT id, 0, 'dozen', 12, 3000 FROM o RETURNING id, order_id)
   INSERT INTO order_lines (order_box_id, menu_item_id, name, kind, quantity, surcharge_cents, allergens)
   SELECT b.id, m.id, m.name, 'ring', 6, m.surcharge_cents, m.allergens
     FROM b CROSS JOIN LATERAL (SELECT * FROM menu_items WHERE id IN (:items) ORDER BY random() LIMIT 2) m`,
  { replacements: { user: customer.id, day: day.id, window: day.pickupWindows![0]!.id, n: ORDERS, items: rings.map((r) => r.id) } },
);

const config = loadConfig({ DATABASE_URL: url, JOBS: 'off', PORT: '0' });
const app = createApp(config);
const server = http.createServer(app);
await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
const owner = (await User.findOne({ where: { email: 'owner@fryline.test' } }))!;
const sid = crypto.randomUUID();
await sequelize.query(`INSERT INTO "session" (sid, sess, expire) VALUES (:sid, :sess, now() + interval '1 hour')`, {
  replacements: { sid, sess: JSON.stringify({ cookie: { path: '/', httpOnly: true }, passport: { user: owner.id } }) },
});
const cookie = `fryline.sid=${encodeURIComponent(`s:${sign(sid, config.SESSION_SECRET)}`)}`;

const times: number[] = [];
for (let i = 0; i < RUNS + 20; i += 1) {
  const start = performance.now();
  const res = await fetch(`${base}/api/bake-days/${day.id}/plan`, { headers: { cookie } });
  const body = (await res.json()) as { meta: { ordersCounted: number } };
  if (res.status !== 200 || body.meta.ordersCounted !== ORDERS) throw new Error(`unexpected answer ${res.status}`);
  if (i >= 20) times.push(performance.now() - start);
}
times.sort((a, b) => a - b);
const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))]!.toFixed(1);
console.log(`plan route, ${ORDERS} paid orders, ${RUNS} sequential requests after 20 warm-up:`);
console.log(`  median ${at(0.5)} ms   p95 ${at(0.95)} ms   max ${times.at(-1)!.toFixed(1)} ms   (target: p95 under 100 ms)`);

server.close();
await app.closeResources();
await closeDatabase();
