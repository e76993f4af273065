import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCounterDay } from '@fryline/seeds';
import { database } from '../src/db/sequelize.js';
import { Browser, signIn, useStack } from './support.js';

const stack = useStack();
const apiRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Another API process on the same database, as a second server behind a load balancer would be. */
function startApiProcess(): Promise<{ url: string; child: ChildProcess }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
    cwd: apiRoot,
    env: { ...process.env, NODE_ENV: 'test', PORT: '0', DATABASE_URL: process.env.TEST_DATABASE_URL, JOBS: 'off', STATIC_DIR: '/nonexistent' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  return new Promise((resolve, reject) => {
    let out = '';
    const timer = setTimeout(() => reject(new Error(`API process did not start: ${out}`)), 30_000);
    const read = (chunk: Buffer) => {
      out += chunk.toString();
      const m = /listening on (http:\/\/[\d.]+:\d+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        resolve({ url: m[1]!, child });
      }
    };
    child.stdout!.on('data', read);
    child.stderr!.on('data', read);
    child.on('exit', (code) => reject(new Error(`API process exited (${code}): ${out}`)));
  });
}

let processes: Array<{ url: string; child: ChildProcess }> = [];
beforeAll(async () => {
  processes = await Promise.all([startApiProcess(), startApiProcess()]);
});
afterAll(async () => {
  for (const p of processes) p.child.kill('SIGTERM');
});

describe('the last rings, sold from two API processes at once', () => {
  it('20 concurrent walk-up sales for the last 10 rings: exactly 10 sold, none left, the rest 409 surplus_gone', async () => {
    const seeded = await seedCounterDay(new Date());
    // the baker plans at least 12 spare rings, glazed vanilla
    await database().query(`UPDATE production_settings SET spare = '{"percent": 5, "minimumRings": 12, "minimumHoles": 0, "glazeId": "vanilla-milk-glaze"}'`);
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    const surplus = (await counter.getJson(`/api/bake-days/${seeded.day.id}/surplus`)).body;
    const rings = surplus.items.filter((i: any) => i.kind === 'ring' && i.left > 0);
    const last = rings.reduce((a: any, b: any) => (b.left > a.left ? b : a));
    expect(last.left).toBeGreaterThanOrEqual(10);
    // sell everything but 10 rings of one flavour first
    const clear = rings.map((i: any) => ({ menuItemId: i.menuItemId, quantity: i === last ? i.left - 10 : i.left })).filter((i: any) => i.quantity > 0);
    if (clear.length) expect((await counter.send('POST', `/api/bake-days/${seeded.day.id}/walk-ups`, { items: clear, method: 'card', amountCents: 0 })).status).toBe(201);
    expect((await counter.getJson(`/api/bake-days/${seeded.day.id}/surplus`)).body.rings).toBe(10);

    const token = await counter.csrf();
    const headers = { 'content-type': 'application/json', 'x-csrf-token': token, cookie: counter.cookieHeader() };
    const body = JSON.stringify({ items: [{ menuItemId: last.menuItemId, quantity: 1 }], method: 'cash', amountCents: 300 });
    const results = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        fetch(`${processes[i % 2]!.url}/api/bake-days/${seeded.day.id}/walk-ups`, { method: 'POST', headers, body }).then(async (r) => ({ status: r.status, body: (await r.json()) as any })),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(10);
    expect(statuses.filter((s) => s === 409)).toHaveLength(10);
    for (const r of results.filter((x) => x.status === 409)) expect(r.body.error).toMatchObject({ code: 'surplus_gone', details: { name: last.name, left: 0 } });
    const after = (await counter.getJson(`/api/bake-days/${seeded.day.id}/surplus`)).body;
    expect(after.rings).toBe(0);
    expect(after.items.find((i: any) => i.menuItemId === last.menuItemId)).toMatchObject({ left: 0, sold: last.sold + (last.left - 10) + 10 });
  });
});
