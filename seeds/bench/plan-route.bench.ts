// Prints how fast GET /api/bake-days/:id/plan answers with 2,000 orders in
// the database. A benchmark, not a test: it asserts nothing.
//
//   node --import tsx seeds/bench/plan-route.bench.ts
//
// Uses BENCH_DATABASE_URL (default: a `fryline_bench` database on the start
// command's cluster, 127.0.0.1:5433 — run `npm start` first). The database is
// wiped and refilled.
import { BakeDay, User } from '@fryline/api/db';
import { benchApp, benchDatabase, timings } from './support.js';

const ORDERS = 2000;
const RUNS = 200;
const { url, sequelize } = await benchDatabase();
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

const { base, cookie, close } = await benchApp(url, 'owner@fryline.test');

const times: number[] = [];
for (let i = 0; i < RUNS + 20; i += 1) {
  const start = performance.now();
  const res = await fetch(`${base}/api/bake-days/${day.id}/plan`, { headers: { cookie } });
  const body = (await res.json()) as { meta: { ordersCounted: number } };
  if (res.status !== 200 || body.meta.ordersCounted !== ORDERS) throw new Error(`unexpected answer ${res.status}`);
  if (i >= 20) times.push(performance.now() - start);
}
console.log(`plan route, ${ORDERS} paid orders, ${RUNS} sequential requests after 20 warm-up:`);
console.log(`  ${timings(times)}   (target: p95 under 100 ms)`);

await close();
