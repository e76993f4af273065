import type { ChildProcess } from 'node:child_process';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { database } from '../src/db/sequelize.js';
import { BakeDay } from '../src/db/models/index.js';
import { spawnApi, useStack } from './support.js';
import { openDay, signedInCustomers } from './order-helpers.js';

// Concurrency check of the capacity counter: many customers at once never get
// more rings than the bake day has. (Rule under test: one conditional UPDATE
// per counter plus CHECK (remaining >= 0); no read-then-write.)

const CAPACITY = 100;
const CLIENTS = 50;
const REQUESTS = 500;

const stack = useStack();
let second: ChildProcess | null = null;
let secondUrl = '';

afterAll(() => {
  second?.kill('SIGTERM');
});
beforeEach(() => {
  // no webhooks: these orders stay on hold
  stack.payments.setWebhookEndpoint(null);
});

async function crowd(urls: string[]) {
  const day = await openDay(stack);
  await BakeDay.update({ ringCapacity: CAPACITY, ringsRemaining: CAPACITY }, { where: { id: day.id } });
  const cookies = await signedInCustomers(stack, REQUESTS);
  const ring = day.menu.find((m) => m.kind === 'ring')!;
  const tokens = await Promise.all(
    cookies.map(async (cookie, i) => {
      const res = await fetch(`${urls[i % urls.length]}/api/csrf`, { headers: { cookie } });
      if (res.status !== 200) throw new Error(`csrf answered ${res.status}: ${await res.text()}`);
      return ((await res.json()) as any).token as string;
    }),
  );
  const statuses: Record<number, number> = {};
  let ringsGranted = 0;
  let next = 0;
  await Promise.all(
    Array.from({ length: CLIENTS }, async () => {
      while (next < REQUESTS) {
        const i = next++;
        const size = i % 3 === 0 ? 'dozen' : 'half-dozen';
        const pieces = size === 'dozen' ? 12 : 6;
        const res = await fetch(`${urls[i % urls.length]}/api/orders`, {
          method: 'POST',
          headers: { cookie: cookies[i]!, 'x-csrf-token': tokens[i]!, 'content-type': 'application/json' },
          body: JSON.stringify({ bakeDayId: day.id, pickupWindowId: day.pickupWindows[i % 3]!.id, boxes: [{ size, items: [{ menuItemId: ring.id, quantity: pieces }] }] }),
        });
        statuses[res.status] = (statuses[res.status] ?? 0) + 1;
        if (res.status === 201) ringsGranted += pieces;
        else if (res.status !== 409) throw new Error(`unexpected ${res.status}: ${await res.text()}`);
      }
    }),
  );
  const [totals] = await database().query<{ remaining: number; held: number; paid: number }>(
    `SELECT d.rings_remaining AS remaining,
            COALESCE(SUM(o.rings) FILTER (WHERE o.status = 'held' AND o.holds_capacity), 0)::int AS held,
            COALESCE(SUM(o.rings) FILTER (WHERE o.status IN ('paid', 'collected', 'no_show') AND o.holds_capacity), 0)::int AS paid
       FROM bake_days d LEFT JOIN orders o ON o.bake_day_id = d.id
      WHERE d.id = :id GROUP BY d.id`,
    { replacements: { id: day.id }, type: QueryTypes.SELECT },
  );
  return { statuses, ringsGranted, totals: totals! };
}

describe(`no oversell: ${REQUESTS} order requests from ${CLIENTS} concurrent clients for ${CAPACITY} rings`, () => {
  it('one API process: confirmed plus held never exceeds capacity, and capacity = remaining + held + paid', async () => {
    const { statuses, ringsGranted, totals } = await crowd([stack.url]);
    expect(statuses[201]).toBeGreaterThan(0);
    expect(ringsGranted).toBeLessThanOrEqual(CAPACITY);
    expect(totals.held + totals.paid).toBe(ringsGranted);
    expect(totals.remaining + totals.held + totals.paid).toBe(CAPACITY);
    // dozens and half dozens fill 100 exactly or leave less than a half dozen
    expect(totals.remaining).toBeLessThan(6);
  });

  it('two API processes sharing the database: the same holds', async () => {
    const spawned = await spawnApi(stack);
    second = spawned.child;
    secondUrl = spawned.url;
    const { statuses, ringsGranted, totals } = await crowd([stack.url, secondUrl]);
    expect(statuses[201]).toBeGreaterThan(0);
    expect(ringsGranted).toBeLessThanOrEqual(CAPACITY);
    expect(totals.held + totals.paid).toBe(ringsGranted);
    expect(totals.remaining + totals.held + totals.paid).toBe(CAPACITY);
    expect(totals.remaining).toBeLessThan(6);
  });
});
