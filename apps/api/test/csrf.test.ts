import { describe, expect, it } from 'vitest';
import { BakeDay, Order } from '../src/db/models/index.js';
import { Browser, signIn, useStack } from './support.js';

const stack = useStack();

async function orderBody() {
  const [day] = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as any;
  const ring = day.menu.find((m: { kind: string }) => m.kind === 'ring');
  return { bakeDayId: day.id, pickupWindowId: day.pickupWindows[0].id, boxes: [{ size: 'half-dozen', items: [{ menuItemId: ring.id, quantity: 6 }] }] };
}

describe('CSRF: a state-changing request with a session cookie must carry the token', () => {
  it('refuses an order without the token and changes nothing', async () => {
    const browser = new Browser(stack.url);
    await signIn(browser, 'customer@fryline.test');
    const before = await BakeDay.findAll({ order: [['date', 'ASC']] });
    const res = await browser.fetch('/api/orders', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(await orderBody()) });
    expect(res.status).toBe(403);
    expect(((await res.json()) as any).error.code).toBe('csrf');
    expect(await Order.count({ where: { status: 'held' } })).toBe(0);
    const after = await BakeDay.findAll({ order: [['date', 'ASC']] });
    expect(after.map((d) => d.ringsRemaining)).toEqual(before.map((d) => d.ringsRemaining));
  });

  it('refuses a wrong token, and sign-out without the token leaves the session signed in', async () => {
    const browser = new Browser(stack.url);
    await signIn(browser, 'owner@fryline.test');
    const wrong = await browser.fetch('/auth/logout', { method: 'POST', headers: { 'x-csrf-token': 'not-the-token' } });
    expect(wrong.status).toBe(403);
    const bare = await browser.fetch('/auth/logout', { method: 'POST' });
    expect(bare.status).toBe(403);
    expect((await browser.getJson('/api/me')).status).toBe(200);
  });

  it('accepts the same request with the token', async () => {
    const browser = new Browser(stack.url);
    await signIn(browser, 'customer@fryline.test');
    const res = await browser.send('POST', '/api/orders', await orderBody());
    expect(res.status).toBe(201);
  });
});
