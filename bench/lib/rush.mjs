// Shared pieces of the opening-rush benchmarks: real sign-ins, a bake day
// with room for everyone, one order per customer under a load tool, the
// oversold check, pgbench on the equivalent SQL transaction, an open-loop
// run, and a description of the machine. Plain Node + autocannon; SQL goes
// through Debian's psql and pgbench.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';

export const env = process.env;

export function pgBin(name) {
  const base = '/usr/lib/postgresql';
  const version = fs.readdirSync(base).filter((v) => fs.existsSync(path.join(base, v, 'bin', name))).sort((a, b) => Number(b) - Number(a))[0];
  if (!version) throw new Error(`${name} not found under ${base}`);
  return path.join(base, version, 'bin', name);
}

/** One SQL statement through psql; rows as arrays of strings. */
export function sql(databaseUrl, statement) {
  const res = spawnSync(pgBin('psql'), [databaseUrl, '-v', 'ON_ERROR_STOP=1', '-tAF', '\t', '-c', statement], { encoding: 'utf8' });
  if (res.status !== 0) throw new Error(`psql: ${res.stderr}`);
  return res.stdout.trim() ? res.stdout.trim().split('\n').map((line) => line.split('\t')) : [];
}

export function machine(databaseUrl) {
  const cpus = os.cpus();
  const pgVersion = sql(databaseUrl, 'SHOW server_version')[0]?.[0];
  return `${cpus.length} × ${cpus[0]?.model ?? 'unknown CPU'}, ${(os.totalmem() / 2 ** 30).toFixed(1)} GiB RAM, ${os.type()} ${os.release()}, Node ${process.version}, PostgreSQL ${pgVersion}`;
}

const request = (url, init = {}) => fetch(url, { ...init, redirect: 'manual' });

function sessionCookie(res) {
  const line = res.headers.getSetCookie().find((c) => c.startsWith('fryline.sid='));
  return line ? line.split(';')[0] : null;
}

/**
 * Signs a new customer in through the real path: the app's /auth/google
 * redirect, the sign-in stand-in's chooser form, the app's callback.
 */
export async function signInCustomer(base, email) {
  const start = await request(`${base}/auth/google?returnTo=/`);
  if (start.status !== 302) throw new Error(`sign-in start answered ${start.status}${start.status === 429 ? ' (raise RATE_LIMIT_SIGNIN for the benchmark stack)' : ''}`);
  let cookie = sessionCookie(start);
  const authorize = new URL(start.headers.get('location'));
  const form = new URLSearchParams(authorize.searchParams);
  form.set('email', email);
  form.set('email_verified', 'true');
  const chosen = await request(`${authorize.origin}/authorize`, { method: 'POST', body: form });
  const callback = new URL(chosen.headers.get('location'));
  // the callback may name the public address; any API process behind it will do (sessions live in PostgreSQL)
  const done = await request(`${base}${callback.pathname}${callback.search}`, { headers: { cookie } });
  if (done.status !== 303) throw new Error(`sign-in callback answered ${done.status}`);
  cookie = sessionCookie(done) ?? cookie;
  const token = await (await request(`${base}/api/csrf`, { headers: { cookie } })).json();
  return { cookie, token: token.token };
}

export async function signInMany(base, n, prefix, concurrency = 16) {
  const out = new Array(n);
  let next = 0;
  const started = Date.now();
  await Promise.all(
    Array.from({ length: concurrency }, async () => {
      while (next < n) {
        const i = next++;
        out[i] = await signInCustomer(base, `${prefix}-${i}@example.test`);
      }
    }),
  );
  return { customers: out, seconds: (Date.now() - started) / 1000 };
}

/**
 * The open bake day, given room for `orders` more dozens and windows without
 * an order cap (so every order fits and only the capacity counter decides).
 */
export async function roomForEveryone(base, databaseUrl, orders) {
  const days = await (await request(`${base}/api/bake-days`)).json();
  const day = days.find((d) => d.status === 'open');
  if (!day) throw new Error('no open bake day: start the stack with the demo loaded');
  sql(databaseUrl, `UPDATE bake_days SET ring_capacity = ring_capacity + ${orders * 12}, rings_remaining = rings_remaining + ${orders * 12} WHERE id = '${day.id}'`);
  sql(databaseUrl, `UPDATE pickup_windows SET max_orders = NULL, orders_remaining = NULL WHERE bake_day_id = '${day.id}'`);
  sql(databaseUrl, `UPDATE shop_settings SET max_pieces_per_customer = greatest(max_pieces_per_customer, 12)`);
  const rings = day.menu.filter((m) => m.kind === 'ring');
  const body = (i) =>
    JSON.stringify({
      bakeDayId: day.id,
      pickupWindowId: day.pickupWindows[i % day.pickupWindows.length].id,
      boxes: [{ size: 'dozen', items: [{ menuItemId: rings[0].id, quantity: 6 }, { menuItemId: rings[1 % rings.length].id, quantity: 6 }] }],
    });
  return { day, body, rings, windows: day.pickupWindows };
}

export function percentile(sorted, p) {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

function summarise(latencies, statuses, soldOut, seconds, count) {
  const sorted = [...latencies].sort((a, b) => a - b);
  return {
    orders: statuses[201] ?? 0,
    requests: count,
    seconds,
    perSecond: (statuses[201] ?? 0) / seconds,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    p99: percentile(sorted, 99),
    statuses,
    soldOut,
  };
}

/** One order per customer, `connections` in flight, with autocannon. */
export async function fire(base, customers, body, connections) {
  let next = 0;
  const statuses = {};
  const latencies = [];
  let soldOut = 0;
  const started = Date.now();
  const result = await new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: base,
        connections,
        amount: customers.length,
        timeout: 30,
        requests: [
          {
            method: 'POST',
            path: '/api/orders',
            setupRequest: (req) => {
              const i = next++;
              const c = customers[i % customers.length];
              return { ...req, headers: { 'content-type': 'application/json', cookie: c.cookie, 'x-csrf-token': c.token }, body: body(i) };
            },
            onResponse: (status, resBody) => {
              statuses[status] = (statuses[status] ?? 0) + 1;
              if (status === 409 && /"sold_out"/.test(resBody)) soldOut += 1;
            },
          },
        ],
      },
      (err, res) => (err ? reject(err) : resolve(res)),
    );
    instance.on('response', (_client, _status, _bytes, responseTime) => latencies.push(responseTime));
  });
  const seconds = (Date.now() - started) / 1000;
  return { ...summarise(latencies, statuses, soldOut, seconds, customers.length), errors: result.errors, timeouts: result.timeouts };
}

/**
 * Open loop: requests start on a fixed schedule (one every 1/rate seconds)
 * whether or not earlier ones have answered, and each latency is measured
 * from its scheduled start, so a slow server can't slow the arrivals down.
 */
export async function openLoop(base, customers, body, rate) {
  const statuses = {};
  const latencies = [];
  let soldOut = 0;
  const interval = 1000 / rate;
  const started = performance.now();
  const inFlight = [];
  for (let i = 0; i < customers.length; i += 1) {
    const due = started + i * interval;
    const wait = due - performance.now();
    if (wait > 1) await new Promise((r) => setTimeout(r, wait));
    const c = customers[i];
    inFlight.push(
      request(`${base}/api/orders`, { method: 'POST', headers: { 'content-type': 'application/json', cookie: c.cookie, 'x-csrf-token': c.token }, body: body(i) })
        .then(async (res) => {
          const text = await res.text();
          statuses[res.status] = (statuses[res.status] ?? 0) + 1;
          if (res.status === 409 && /"sold_out"/.test(text)) soldOut += 1;
        })
        .catch(() => {
          statuses.error = (statuses.error ?? 0) + 1;
        })
        .finally(() => latencies.push(performance.now() - due)),
    );
  }
  await Promise.all(inFlight);
  const seconds = (performance.now() - started) / 1000;
  return { ...summarise(latencies, statuses, soldOut, seconds, customers.length), rate };
}

/** Pieces confirmed or held beyond the day's capacity (must be 0), and the ledger check. */
export function oversold(databaseUrl, dayId) {
  const [[capacity, remaining, counted]] = sql(
    databaseUrl,
    `SELECT d.ring_capacity, d.rings_remaining,
            COALESCE((SELECT SUM(rings) FROM orders WHERE bake_day_id = d.id AND holds_capacity), 0)
              + COALESCE((SELECT SUM(rings) FROM waitlist_entries WHERE bake_day_id = d.id AND status = 'offered'), 0)
       FROM bake_days d WHERE d.id = '${dayId}'`,
  );
  return { capacity: Number(capacity), remaining: Number(remaining), counted: Number(counted), oversold: Math.max(0, Number(counted) - Number(capacity)), balanced: Number(capacity) === Number(remaining) + Number(counted) };
}

/**
 * pgbench running the order's SQL transaction (the conditional capacity
 * update, the order, its box and two lines) on the same database and day, at
 * the same concurrency; its rows are removed and the rings given back after.
 */
export function pgbench(databaseUrl, { dayId, windowId, itemA, itemB, clients, seconds }) {
  const [[userId]] = sql(databaseUrl, `INSERT INTO users (email, name, role) VALUES ('pgbench-${Date.now()}@example.test', 'pgbench', 'customer') RETURNING id`);
  sql(databaseUrl, `UPDATE bake_days SET ring_capacity = ring_capacity + 2000000, rings_remaining = rings_remaining + 2000000 WHERE id = '${dayId}'`);
  const script = `BEGIN;
UPDATE bake_days SET rings_remaining = rings_remaining - 12, holes_remaining = holes_remaining - 0, updated_at = now() WHERE id = :day AND rings_remaining >= 12 AND holes_remaining >= 0 AND status = 'published' RETURNING id \\gset
UPDATE pickup_windows SET orders_remaining = orders_remaining - 1, updated_at = now() WHERE id = :win AND bake_day_id = :day AND (orders_remaining IS NULL OR orders_remaining >= 1) RETURNING id AS w \\gset
INSERT INTO orders (user_id, bake_day_id, pickup_window_id, status, rings, holes, subtotal_cents, tax_cents, total_cents, hold_expires_at) VALUES (:usr, :day, :win, 'paid', 12, 0, 3250, 0, 3250, now() + interval '10 minutes') RETURNING id AS order_id \\gset
INSERT INTO order_boxes (order_id, position, size, pieces, price_cents) VALUES (':order_id', 0, 'dozen', 12, 3000) RETURNING id AS box_id \\gset
INSERT INTO order_lines (order_box_id, menu_item_id, name, kind, quantity, surcharge_cents, allergens) VALUES (':box_id', :a, 'A', 'ring', 6, 0, '{wheat,milk,eggs}'), (':box_id', :b, 'B', 'ring', 6, 0, '{wheat,milk,eggs}');
INSERT INTO audit_log (actor_id, action, subject_type, subject_id, details) VALUES (:usr, 'order.held', 'order', ':order_id', '{}');
COMMIT;
`;
  const file = path.join(os.tmpdir(), `fryline-pgbench-${process.pid}.sql`);
  fs.writeFileSync(file, script);
  const q = (v) => `'${v}'`;
  const res = spawnSync(
    pgBin('pgbench'),
    ['-n', '-c', String(clients), '-j', String(Math.min(clients, os.cpus().length)), '-T', String(seconds), '-f', file, '-D', `day=${q(dayId)}`, '-D', `win=${q(windowId)}`, '-D', `usr=${q(userId)}`, '-D', `a=${q(itemA)}`, '-D', `b=${q(itemB)}`, databaseUrl],
    { encoding: 'utf8' },
  );
  fs.rmSync(file, { force: true });
  const [[count]] = sql(databaseUrl, `SELECT count(*) FROM orders WHERE user_id = '${userId}'`);
  sql(databaseUrl, `DELETE FROM audit_log WHERE actor_id = '${userId}'; DELETE FROM orders WHERE user_id = '${userId}'; DELETE FROM users WHERE id = '${userId}'`);
  sql(databaseUrl, `UPDATE bake_days SET ring_capacity = ring_capacity - 2000000, rings_remaining = rings_remaining - 2000000 + ${Number(count) * 12} WHERE id = '${dayId}'`);
  const tps = /tps = ([\d.]+) \(without initial connection time\)/.exec(res.stdout)?.[1];
  if (res.status !== 0 || !tps) throw new Error(`pgbench failed: ${res.stderr || res.stdout}`);
  const latency = /latency average = ([\d.]+) ms/.exec(res.stdout)?.[1];
  return { tps: Number(tps), latencyAverageMs: Number(latency), transactions: Number(count) };
}

export const fmt = (n, digits = 0) => (Number.isFinite(n) ? n.toFixed(digits) : 'n/a');

export function printRun(label, run) {
  console.log(
    `${label}: ${run.orders} orders of ${run.requests} in ${fmt(run.seconds, 1)} s = ${fmt(run.perSecond, 1)} orders/s; ` +
      `latency p50 ${fmt(run.p50)} ms, p95 ${fmt(run.p95)} ms, p99 ${fmt(run.p99)} ms; sold out ${run.soldOut}; answers ${JSON.stringify(run.statuses)}`,
  );
}
