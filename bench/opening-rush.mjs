// The opening rush, measured (prints figures; asserts nothing):
//   1. signs K new customers in through the real sign-in path,
//   2. gives the open bake day room for everyone,
//   3. fires one dozen order per customer with CONNECTIONS in flight (autocannon),
//   4. checks oversold pieces (must be 0) and the capacity ledger,
//   5. runs pgbench with the order's SQL transaction on the same database at the same concurrency,
//   6. prints Fryline's rate ÷ pgbench's (target ≥ 0.5),
//   7. an open-loop run at half the pgbench rate (target p99 ≤ 250 ms).
//
// Against a running stack, e.g. one started for benchmarking with:
//   RATE_LIMIT_SIGNIN=100000 RATE_LIMIT_ORDERS=100000 PORT=3200 OAUTH_FAKE_PORT=3201 PAYMENTS_FAKE_PORT=3202 \
//   MAIL_INBOX_PORT=3203 SMTP_PORT=2625 PGPORT=5455 FRYLINE_DATA_DIR=.data-bench npm start
// then:
//   BASE_URL=http://127.0.0.1:3200 DATABASE_URL=postgres://postgres@127.0.0.1:5455/fryline node bench/opening-rush.mjs
// Settings: CUSTOMERS (1000), CONNECTIONS (100), PGBENCH_SECONDS (15), OPEN_LOOP_SECONDS (10), OPEN_LOOP (on|off).
import { env, fire, fmt, machine, openLoop, oversold, pgbench, printRun, roomForEveryone, signInMany } from './lib/rush.mjs';

const base = (env.BASE_URL ?? 'http://127.0.0.1:3200').replace(/\/$/, '');
const databaseUrl = env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5455/fryline';
const customersWanted = Number(env.CUSTOMERS ?? 1000);
const connections = Number(env.CONNECTIONS ?? 100);
const run = `rush${Date.now().toString(36)}`;

console.log(`Opening rush against ${base}`);
console.log(`machine: ${machine(databaseUrl)}`);

const { customers, seconds: signInSeconds } = await signInMany(base, customersWanted, `${run}-a`);
console.log(`signed in ${customers.length} new customers through the sign-in path in ${fmt(signInSeconds, 1)} s`);
const { day, body, rings, windows } = await roomForEveryone(base, databaseUrl, customers.length);

const rush = await fire(base, customers, body, connections);
printRun(`Fryline, ${connections} in flight`, rush);
const ledger = oversold(databaseUrl, day.id);
console.log(`oversold pieces: ${ledger.oversold} (capacity ${ledger.capacity} = remaining ${ledger.remaining} + held/paid/offered ${ledger.counted}: ${ledger.balanced ? 'balanced' : 'NOT BALANCED'})`);

const bench = pgbench(databaseUrl, { dayId: day.id, windowId: windows[0].id, itemA: rings[0].id, itemB: rings[1 % rings.length].id, clients: connections, seconds: Number(env.PGBENCH_SECONDS ?? 15) });
console.log(`pgbench, same SQL transaction, ${connections} clients: ${fmt(bench.tps, 1)} transactions/s (latency average ${fmt(bench.latencyAverageMs, 1)} ms, ${bench.transactions} transactions)`);
console.log(`ratio Fryline ÷ pgbench: ${fmt(rush.perSecond / bench.tps, 2)} (target ≥ 0.5)`);

if ((env.OPEN_LOOP ?? 'on') === 'on') {
  const rate = bench.tps / 2;
  const count = Math.max(100, Math.round(rate * Number(env.OPEN_LOOP_SECONDS ?? 10)));
  const more = await signInMany(base, count, `${run}-b`);
  await roomForEveryone(base, databaseUrl, count);
  const open = await openLoop(base, more.customers, body, rate);
  printRun(`open loop at ${fmt(rate, 1)} arrivals/s (half the pgbench rate)`, open);
  console.log(`open-loop p99 ${fmt(open.p99)} ms (target ≤ 250 ms)`);
  const after = oversold(databaseUrl, day.id);
  console.log(`oversold pieces after both runs: ${after.oversold}; ledger ${after.balanced ? 'balanced' : 'NOT BALANCED'}`);
}
