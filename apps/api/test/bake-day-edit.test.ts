import { beforeEach, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { AuditEntry, BakeDay, Order, OutboxMessage, PickupWindow } from '../src/db/models/index.js';
import { Browser, signIn, useStack } from './support.js';
import { deliverMail, halfDozen, openDay, orderAndPay, remaining } from './order-helpers.js';

const stack = useStack();
let owner: Browser;
let customer: Browser;
beforeEach(async () => {
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
  customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
});

const edit = (dayId: string, body: unknown) => owner.send('PATCH', `/api/staff/bake-days/${dayId}`, body);
const windowsOf = async (dayId: string) => (await owner.getJson(`/api/staff/bake-days/${dayId}`)).body.windows as Array<{ id: string; start: string; end: string; maxOrders: number | null; booked: number; removed: boolean }>;
const keep = (w: { id: string; start: string; end: string; maxOrders: number | null }) => ({ id: w.id, start: w.start, end: w.end, maxOrders: w.maxOrders });

describe('changing an announced bake day', () => {
  it('only the owner may (customer and counter get 403)', async () => {
    const day = await openDay(stack);
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    expect((await customer.send('PATCH', `/api/staff/bake-days/${day.id}`, { place: 'Elsewhere' })).status).toBe(403);
    expect((await counter.send('PATCH', `/api/staff/bake-days/${day.id}`, { place: 'Elsewhere' })).status).toBe(403);
    expect((await counter.getJson(`/api/staff/bake-days/${day.id}`)).status).toBe(403);
    expect((await BakeDay.findByPk(day.id))!.place).toBe(day.place);
  });

  it('moving a window e-mails its paid customer once, with a link that lets them move or cancel with a full refund even after the cut-off', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day, 0));
    const windows = await windowsOf(day.id);
    const first = windows[0]!;
    // the first window moves half an hour earlier; the others stay
    const earlier = (hhmm: string) => DateTime.fromFormat(hhmm, 'HH:mm').minus({ minutes: 30 }).toFormat('HH:mm');
    const body = { windows: [{ ...keep(first), start: earlier(first.start), end: earlier(first.end) }, ...windows.slice(1).map(keep)] };
    const res = await edit(day.id, body);
    expect(res.status).toBe(200);
    expect(res.body.customersTold).toBe(1);
    expect(res.body.changes.join(' ')).toMatch(/Moved the pickup window/);
    const audit = await AuditEntry.findOne({ where: { action: 'bake_day.changed', subjectId: day.id } });
    expect(audit).not.toBeNull();

    await deliverMail(stack);
    const mails = stack.mail.messages().filter((m) => m.subject.startsWith('We changed your pickup'));
    expect(mails).toHaveLength(1);
    expect(mails[0]!.to).toEqual(['customer@fryline.test']);
    expect(mails[0]!.text).toMatch(/moved from/);
    const link = /(http:\/\/127\.0\.0\.1:\d+\/orders\/[0-9a-f-]+\?changed=1)/.exec(mails[0]!.text!)![1]!;
    expect(link).toContain(order.id);

    // the cut-off passes; the customer follows the link and may still cancel for everything back
    await BakeDay.update({ cutoffAt: new Date(Date.now() - 60_000), ordersOpenAt: new Date(Date.now() - 86_400_000) }, { where: { id: day.id } });
    const path = new URL(link).pathname;
    const page = await customer.getJson(`/api${path}`);
    expect(page.body.canCancel).toBe(true);
    const cancelled = await customer.send('POST', `/api${path}/cancel`);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body).toMatchObject({ status: 'cancelled', refundedCents: order.totalCents });
  });

  it("a change that touches no paid order's window or place e-mails nobody", async () => {
    const day = await openDay(stack);
    await orderAndPay(stack, customer, halfDozen(day, 1));
    const windows = await windowsOf(day.id);
    const res = await edit(day.id, { windows: [{ ...keep(windows[0]!), maxOrders: 40 }, ...windows.slice(1).map(keep)] });
    expect(res.status).toBe(200);
    expect(res.body.customersTold).toBe(0);
    expect(await OutboxMessage.count({ where: { kind: 'bake-day-change' } })).toBe(0);
  });

  it('taking a window with a paid order off the day keeps the order, hides the window from the shop, and asks the customer to pick another', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day, 0));
    const windows = await windowsOf(day.id);
    const res = await edit(day.id, { windows: windows.slice(1).map(keep) });
    expect(res.status).toBe(200);
    expect(res.body.customersTold).toBe(1);
    expect(res.body.day.windows.find((w: any) => w.id === windows[0]!.id)).toMatchObject({ removed: true, booked: 1 });
    const shop = (await (await fetch(`${stack.url}/api/bake-days/${day.id}`)).json()) as any;
    expect(shop.pickupWindows.map((w: any) => w.id)).not.toContain(windows[0]!.id);
    // nobody can order into it any more
    const into = await customer.send('POST', '/api/orders', halfDozen(day, 0));
    expect(into.status).toBe(400);
    // the customer moves to a window that is still there
    const moved = await customer.send('POST', `/api/orders/${order.id}/move`, { pickupWindowId: windows[1]!.id });
    expect(moved.status).toBe(200);
    expect(moved.body.pickupWindow.id).toBe(windows[1]!.id);
    const oldWindow = await PickupWindow.findByPk(windows[0]!.id);
    expect(oldWindow!.removedAt).not.toBeNull();
  });

  it('a window without orders is deleted outright; a new window can be added', async () => {
    const day = await openDay(stack);
    const windows = await windowsOf(day.id);
    const last = windows[windows.length - 1]!;
    const res = await edit(day.id, { windows: [...windows.slice(0, -1).map(keep), { start: '15:00', end: '16:00', maxOrders: 5 }] });
    expect(res.status).toBe(200);
    expect(await PickupWindow.findByPk(last.id)).toBeNull();
    expect(res.body.day.windows.at(-1)).toMatchObject({ start: '15:00', end: '16:00', maxOrders: 5, booked: 0, removed: false });
  });

  it('refuses a window cap below the orders already in it, with the numbers, and changes nothing', async () => {
    const day = await openDay(stack);
    await orderAndPay(stack, customer, halfDozen(day, 0));
    const windows = await windowsOf(day.id);
    const res = await edit(day.id, { windows: [{ ...keep(windows[0]!), maxOrders: 0 }, ...windows.slice(1).map(keep)] });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'window_below_booked', details: { booked: 1, requested: 0 } });
    expect((await PickupWindow.findByPk(windows[0]!.id))!.maxOrders).toBe(windows[0]!.maxOrders);
  });

  it('refuses capacity below what is sold, naming both numbers; nothing changes', async () => {
    const day = await openDay(stack);
    await orderAndPay(stack, customer, halfDozen(day, 0));
    const before = await remaining(day.id);
    const sold = day.capacity.rings - day.remaining.rings + 6;
    const res = await edit(day.id, { ringCapacity: sold - 1, place: 'A different corner' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('below_sold');
    expect(res.body.error.details.sold.rings).toBe(sold);
    expect(res.body.error.details.requested.rings).toBe(sold - 1);
    expect(res.body.error.message).toContain(`${sold} rings`);
    // the place in the same request did not change either
    expect((await BakeDay.findByPk(day.id))!.place).toBe(day.place);
    expect(await remaining(day.id)).toEqual(before);
    // exactly what is sold is fine: nothing left
    const ok = await edit(day.id, { ringCapacity: sold });
    expect(ok.status).toBe(200);
    expect((await remaining(day.id)).rings).toBe(0);
  });

  it('a new place e-mails every paid customer of the day once', async () => {
    const day = await openDay(stack);
    await orderAndPay(stack, customer, halfDozen(day, 0));
    const other = new Browser(stack.url);
    await signIn(other, 'june.plover@example.test');
    await orderAndPay(stack, other, halfDozen(day, 1));
    const res = await edit(day.id, { place: 'The old mill yard', address: '2 Wheel Street' });
    expect(res.status).toBe(200);
    expect(res.body.customersTold).toBe(2);
    const mails = await OutboxMessage.findAll({ where: { kind: 'bake-day-change' } });
    expect(mails.map((m) => m.toAddress).sort()).toEqual(['customer@fryline.test', 'june.plover@example.test']);
    expect(mails[0]!.textBody).toContain('The old mill yard, 2 Wheel Street');
  });

  it('menu and box prices change for new orders; paid orders keep their price', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day, 0));
    const boxes = day.boxes.map((b) => ({ size: b.size, pieces: b.pieces, priceCents: b.priceCents + 100 }));
    const res = await edit(day.id, { boxes, menuItemIds: day.menu.map((m) => m.id) });
    expect(res.status).toBe(200);
    const shop = (await (await fetch(`${stack.url}/api/bake-days/${day.id}`)).json()) as any;
    expect(shop.boxes.map((b: any) => b.priceCents)).toEqual(boxes.map((b) => b.priceCents));
    expect((await Order.findByPk(order.id))!.totalCents).toBe(order.totalCents);
    const noRings = await edit(day.id, { menuItemIds: day.menu.filter((m) => m.kind === 'hole').map((m) => m.id) });
    expect(noRings.status).toBe(400);
  });

  it('refuses a cut-off after the first pickup and one before orders open', async () => {
    const day = await openDay(stack);
    const late = await edit(day.id, { cutoffAt: new Date(Date.parse(day.pickupWindows[0]!.startsAt) + 60_000).toISOString() });
    expect(late.status).toBe(400);
    expect(late.body.error.details.fields).toHaveProperty('cutoffAt');
    const early = await edit(day.id, { cutoffAt: new Date(Date.parse(day.ordersOpenAt) - 60_000).toISOString() });
    expect(early.status).toBe(400);
  });

  it('closes orders early, opens them early, and marks the day done', async () => {
    const day = await openDay(stack);
    const closed = await owner.send('POST', `/api/staff/bake-days/${day.id}/close-now`);
    expect(closed.status).toBe(200);
    expect(closed.body.day.status).toBe('closed');
    expect((await customer.send('POST', '/api/orders', halfDozen(day, 0))).status).toBe(409);

    // a day whose orders open tomorrow, opened now
    await BakeDay.update({ ordersOpenAt: new Date(Date.now() + 86_400_000), cutoffAt: new Date(Date.now() + 2 * 86_400_000) }, { where: { id: day.id } });
    const opened = await owner.send('POST', `/api/staff/bake-days/${day.id}/open-now`);
    expect(opened.status).toBe(200);
    expect(opened.body.day.status).toBe('open');
    expect((await customer.send('POST', '/api/orders', halfDozen(day, 0))).status).toBe(201);

    const done = await owner.send('POST', `/api/staff/bake-days/${day.id}/mark-done`);
    expect(done.status).toBe(200);
    expect(done.body.day).toMatchObject({ state: 'done', status: 'done' });
    expect((await edit(day.id, { place: 'Too late' })).status).toBe(409);
    const actions = (await AuditEntry.findAll({ where: { subjectId: day.id } })).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['bake_day.close-now', 'bake_day.open-now', 'bake_day.mark-done']));
  });
});
