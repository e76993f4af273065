// Prints how fast the counter's pickup list answers and how long a hand-over
// takes, on a bake day with 300 paid pre-orders (a busy market day). A
// benchmark, not a test: it asserts nothing.
//
//   node --import tsx seeds/bench/counter.bench.ts
//
// Uses BENCH_DATABASE_URL (default: a `fryline_bench` database on the start
// command's cluster, 127.0.0.1:5433 — run `npm start` first). The database is
// wiped and refilled.
import crypto from 'node:crypto';
import { seedCounterDay, type CounterDayOrder } from '../src/index.js';
import { benchApp, benchDatabase, timings } from './support.js';

const ORDERS = 300;
const RUNS = 200;
const { url } = await benchDatabase();
const flavours = ['Vanilla Bean Glaze', 'Brown Butter Maple', 'Cardamom Sugar', 'Dark Chocolate Dip', 'Lemon Poppy Glaze', 'Honey Sesame'];
const orders: CounterDayOrder[] = Array.from({ length: ORDERS }, (_, i) => ({
  window: (i % 3) as 0 | 1 | 2,
  name: `Bench Customer ${i + 1}`,
  boxes: [{ size: 'half-dozen', items: [{ menuItem: flavours[i % flavours.length]!, quantity: 3 }, { menuItem: flavours[(i + 1) % flavours.length]!, quantity: 3 }] }],
}));
const { day, orders: seeded } = await seedCounterDay(new Date(), orders);

const { base, cookie, close } = await benchApp(url, 'counter@fryline.test');
// the session's CSRF token, as GET /api/csrf hands it out
const { token } = (await (await fetch(`${base}/api/csrf`, { headers: { cookie } })).json()) as { token: string };

const summary = (label: string, times: number[], target: string) => console.log(`${label}:\n  ${timings(times)}   (target: ${target})`);

const list: number[] = [];
for (let i = 0; i < RUNS + 20; i += 1) {
  const start = performance.now();
  const res = await fetch(`${base}/api/bake-days/${day.id}/pickups`, { headers: { cookie } });
  const body = (await res.json()) as unknown[];
  if (res.status !== 200 || body.length !== ORDERS) throw new Error(`unexpected answer ${res.status}`);
  if (i >= 20) list.push(performance.now() - start);
}
summary(`pickup list, ${ORDERS} paid orders, ${RUNS} sequential requests after 20 warm-up`, list, 'p95 under 100 ms, asked every 4 s by each phone');

const handOver: number[] = [];
for (const order of seeded.slice(0, RUNS)) {
  const start = performance.now();
  const res = await fetch(`${base}/api/orders/${order.id}/collect`, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': token, 'idempotency-key': crypto.randomUUID() },
    body: JSON.stringify({ bakeDayId: day.id }),
  });
  if (res.status !== 200) throw new Error(`hand-over answered ${res.status}: ${await res.text()}`);
  handOver.push(performance.now() - start);
}
summary(`hand-over with an Idempotency-Key, ${RUNS} orders one after another`, handOver, 'p95 under 100 ms: one tap, no wait');

await close();
