import { describe, expect, it } from 'vitest';
import { Browser, signIn, useStack } from './support.js';
import { halfDozen, mixedDozen, openDay, orderAndPay } from './order-helpers.js';

const stack = useStack();

describe("a bake day's order list for the staff", () => {
  it('lists held and paid orders with customer, code and boxes; customers get 403', async () => {
    const day = await openDay(stack);
    const paying = new Browser(stack.url);
    await signIn(paying, 'customer@fryline.test');
    const { order: paid } = await orderAndPay(stack, paying, mixedDozen(day, 1));
    const holding = new Browser(stack.url);
    await signIn(holding, 'holding@example.test');
    const held = await holding.send('POST', '/api/orders', halfDozen(day, 0));

    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    const list = await counter.getJson(`/api/staff/bake-days/${day.id}/orders`);
    expect(list.status).toBe(200);
    expect(list.body.map((o: any) => o.id)).toEqual([held.body.id, paid.id]); // earlier window first
    const paidRow = list.body[1];
    expect(paidRow).toMatchObject({ status: 'paid', customer: { email: 'customer@fryline.test' }, rings: 12 });
    expect(paidRow.pickupCode).toMatch(/^[A-Z0-9]{6}$/);
    expect(paidRow.boxes[0].items.reduce((n: number, i: any) => n + i.quantity, 0)).toBe(12);
    expect(list.body[0]).toMatchObject({ status: 'held', pickupCode: null });

    expect((await paying.getJson(`/api/staff/bake-days/${day.id}/orders`)).status).toBe(403);
  });

  it("lists recent past bake days for the staff, with last week's orders in their states", async () => {
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    const past = await counter.getJson('/api/staff/bake-days/past');
    expect(past.status).toBe(200);
    expect(past.body).toHaveLength(1);
    expect(past.body[0].status).toBe('done');
    const orders = await counter.getJson(`/api/staff/bake-days/${past.body[0].id}/orders`);
    const statuses = new Set(orders.body.map((o: any) => o.status));
    for (const s of ['collected', 'no_show', 'refunded', 'cancelled']) expect(statuses).toContain(s);
  });
});
