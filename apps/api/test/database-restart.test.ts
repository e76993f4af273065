import type { ChildProcess } from 'node:child_process';
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { database } from '../src/db/sequelize.js';
import { BakeDay, PickupWindow } from '../src/db/models/index.js';
import { spawnApi, useStack } from './support.js';
import { capacityLedger, halfDozen, openDay, signedInCustomers } from './order-helpers.js';

// Fault injection: PostgreSQL is stopped (fast shutdown: the server ends
// every connection, 57P01 on idle ones) while customers keep ordering, and
// started again a few seconds later.

const stack = useStack();
const children: ChildProcess[] = [];
afterAll(() => {
  for (const child of children) child.kill('SIGTERM');
});

/** pg_ctl for the cluster behind the test database, as the postgres user when we are root. */
async function cluster() {
  const [row] = await database().query<{ data_directory: string }>('SHOW data_directory', { type: QueryTypes.SELECT });
  const dataDir = row!.data_directory;
  const base = '/usr/lib/postgresql';
  const version = fs.readdirSync(base).sort((a, b) => Number(b) - Number(a))[0]!;
  const pgCtl = path.join(base, version, 'bin/pg_ctl');
  // the server's own command line, minus the binary and -D, as pg_ctl restart would reuse it
  const opts = fs.readFileSync(path.join(dataDir!, 'postmaster.opts'), 'utf8').trim().split(/\s+(?=")/).slice(1).map((a) => a.replace(/^"|"$/g, ''));
  const serverArgs = opts.filter((_, i) => opts[i] !== '-D' && opts[i - 1] !== '-D').join(' ');
  const asPostgres = (args: string[]) => {
    const isRoot = process.getuid?.() === 0;
    const res = isRoot ? spawnSync('runuser', ['-u', 'postgres', '--', pgCtl, ...args], { encoding: 'utf8' }) : spawnSync(pgCtl, args, { encoding: 'utf8' });
    if (res.status !== 0) throw new Error(`pg_ctl ${args.join(' ')}: ${res.stderr}`);
  };
  return {
    stop: () => asPostgres(['-D', dataDir!, '-m', 'fast', '-w', 'stop']),
    start: () => asPostgres(['-D', dataDir!, '-l', path.join(dataDir!, '..', 'postgres.log'), '-w', '-o', serverArgs, 'start']),
  };
}

describe('PostgreSQL restarted while orders come in', () => {
  it('no process exits, the outage answers 503 with Retry-After, service is back within 5 s, and every acknowledged order is there', async () => {
    const pg = await cluster();
    const day = await openDay(stack);
    await BakeDay.update({ ringCapacity: 100_000, ringsRemaining: 100_000 }, { where: { id: day.id } });
    await PickupWindow.update({ ordersRemaining: null, maxOrders: null }, { where: { bakeDayId: day.id } });
    stack.payments.setWebhookEndpoint(null);
    const cookies = await signedInCustomers(stack, 3000);
    const second = await spawnApi(stack);
    children.push(second.child);
    const urls = [stack.url, second.url];

    const acknowledged: string[] = [];
    const answers: Array<{ startedAt: number; at: number; status: number; retryAfter: string | null; code?: string }> = [];
    let next = 0;
    let stopAt = Infinity;
    const client = async () => {
      while (next < cookies.length && Date.now() < stopAt) {
        const i = next++;
        const startedAt = Date.now();
        try {
          // the customer's token: fetched per request, since during the outage it too may answer 503
          const url = urls[i % 2]!;
          const tokenRes = await fetch(`${url}/api/csrf`, { headers: { cookie: cookies[i]! } });
          if (tokenRes.status !== 200) {
            answers.push({ startedAt, at: Date.now(), status: tokenRes.status, retryAfter: tokenRes.headers.get('retry-after'), code: ((await tokenRes.json()) as any).error?.code });
            await new Promise((r) => setTimeout(r, 50));
            continue;
          }
          const { token } = (await tokenRes.json()) as { token: string };
          const res = await fetch(`${url}/api/orders`, {
            method: 'POST',
            headers: { cookie: cookies[i]!, 'x-csrf-token': token, 'content-type': 'application/json' },
            body: JSON.stringify(halfDozen(day, i % 3)),
          });
          const body = (await res.json()) as any;
          answers.push({ startedAt, at: Date.now(), status: res.status, retryAfter: res.headers.get('retry-after'), code: body.error?.code });
          if (res.status === 201) acknowledged.push(body.id);
          else await new Promise((r) => setTimeout(r, 50));
        } catch (err) {
          answers.push({ startedAt, at: Date.now(), status: -1, retryAfter: null, code: (err as Error).message });
        }
      }
    };
    const load = Promise.all(Array.from({ length: 8 }, client));

    await new Promise((r) => setTimeout(r, 1500));
    pg.stop();
    // from here (pg_ctl has waited for the server to stop) until it is started again, PostgreSQL is down
    const downAt = Date.now();
    await new Promise((r) => setTimeout(r, 3000));
    const startingAt = Date.now();
    pg.start();
    const upAt = Date.now();
    stopAt = upAt + 6000;
    await load;

    // both API processes are still running
    expect(second.child.exitCode).toBeNull();
    const statuses = new Set(answers.map((a) => a.status));
    expect([...statuses].every((s) => [201, 503].includes(s)), `answers: ${JSON.stringify(answers.filter((a) => ![201, 503].includes(a.status)).slice(0, 5))}`).toBe(true);
    // requests made while it was down (one begun earlier may still finish with 201)
    const outage = answers.filter((a) => a.startedAt > downAt && a.at < startingAt);
    expect(outage.length).toBeGreaterThan(0);
    for (const a of outage) expect(a).toMatchObject({ status: 503, code: 'database_unavailable', retryAfter: expect.stringMatching(/^\d+$/) });
    const firstBack = answers.find((a) => a.at > upAt && a.status === 201);
    expect(firstBack, 'an order succeeded after the restart').toBeDefined();
    expect(firstBack!.at - upAt).toBeLessThan(5000);

    const found = await database().query<{ id: string }>(`SELECT id FROM orders WHERE id IN (:ids)`, { replacements: { ids: acknowledged }, type: QueryTypes.SELECT });
    expect(found.length).toBe(acknowledged.length);
    for (const row of await capacityLedger()) {
      expect(row.rings_accounted).toBe(row.ring_capacity);
      expect(row.holes_accounted).toBe(row.hole_capacity);
    }
  });
});
