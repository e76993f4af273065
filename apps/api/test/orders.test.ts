import { beforeEach, describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import jsQR from 'jsqr';
import ICAL from 'ical.js';
import { DateTime } from 'luxon';
import { BakeDay, Order, OutboxMessage, PickupWindow, ShopSettings } from '../src/db/models/index.js';
import { PICKUP_CODE_ALPHABET } from '../src/services/orders/pickup-codes.js';
import { context } from '../src/integrations/context.js';
import { Browser, signIn, useStack } from './support.js';
import { CARD_OK, deliverMail, halfDozen, mixedDozen, openDay, orderAndPay, remaining, sessionIdOf } from './order-helpers.js';

const stack = useStack();
let customer: Browser;
beforeEach(async () => {
  customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
});

describe('placing an order', () => {
  it('holds the pieces, prices from the menu and opens hosted checkout', async () => {
    const day = await openDay(stack);
    const res = await customer.send('POST', '/api/orders', mixedDozen(day));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'held', checkoutUrl: expect.stringContaining('/pay/cs_test_') });
    const rings = day.menu.filter((m) => m.kind === 'ring');
    expect(res.body.totalCents).toBe(day.boxes.find((b) => b.size === 'dozen')!.priceCents + 6 * rings[0]!.surchargeCents + 6 * rings[1]!.surchargeCents);
    const holdMs = new Date(res.body.holdExpiresAt).getTime() - Date.now();
    expect(holdMs).toBeGreaterThan(9 * 60_000);
    expect(holdMs).toBeLessThanOrEqual(10 * 60_000);
    expect(await remaining(day.id)).toEqual({ rings: day.remaining.rings - 12, holes: day.remaining.holes });
    const session = await context().payments.checkout.sessions.retrieve(sessionIdOf(res.body.checkoutUrl));
    expect(session).toMatchObject({ status: 'open', amount_total: res.body.totalCents, client_reference_id: res.body.id, metadata: { orderId: res.body.id } });
    const order = await customer.getJson(`/api/orders/${res.body.id}`);
    expect(order.body).toMatchObject({ status: 'held', pickupCode: null, totalCents: res.body.totalCents });
  });

  it.each([
    ['a box that does not add up to its size', (d: any) => ({ ...halfDozen(d), boxes: [{ size: 'half-dozen', items: [{ menuItemId: d.menu[0].id, quantity: 5 }] }] }), 'boxes.0.items'],
    ['an item not on the menu', (d: any) => ({ ...halfDozen(d), boxes: [{ size: 'half-dozen', items: [{ menuItemId: '11111111-1111-4111-8111-111111111111', quantity: 6 }] }] }), 'boxes.0.items.0.menuItemId'],
    ['a ring in a bag of holes', (d: any) => ({ ...halfDozen(d), boxes: [{ size: 'holes', items: [{ menuItemId: d.menu.find((m: any) => m.kind === 'ring').id, quantity: 12 }] }] }), 'boxes.0.items.0.menuItemId'],
    ['a fractional quantity', (d: any) => ({ ...halfDozen(d), boxes: [{ size: 'half-dozen', items: [{ menuItemId: d.menu[0].id, quantity: 5.5 }] }] }), 'boxes.0.items.0.quantity'],
    ['a negative quantity', (d: any) => ({ ...halfDozen(d), boxes: [{ size: 'half-dozen', items: [{ menuItemId: d.menu[0].id, quantity: -6 }] }] }), 'boxes.0.items.0.quantity'],
    ['a client-sent total', (d: any) => ({ ...halfDozen(d), totalCents: 1 }), 'totalCents'],
    ['a client-sent status', (d: any) => ({ ...halfDozen(d), status: 'paid' }), 'status'],
    ['a client-sent user id', (d: any) => ({ ...halfDozen(d), userId: '11111111-1111-4111-8111-111111111111' }), 'userId'],
    ['a client-sent price on an item', (d: any) => ({ ...halfDozen(d), boxes: [{ size: 'half-dozen', items: [{ menuItemId: d.menu[0].id, quantity: 6, priceCents: 0 }] }] }), 'boxes.0.items.0.priceCents'],
  ])('refuses %s with 400 invalid naming the field, and changes nothing', async (_name, make, field) => {
    const day = await openDay(stack);
    const res = await customer.send('POST', '/api/orders', make(day));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid');
    expect(Object.keys(res.body.error.details.fields)).toContain(field);
    expect(await Order.count()).toBe(10); // only the demo's past week
    expect(await remaining(day.id)).toEqual(day.remaining);
  });

  it('answers 409 sold_out when the pieces are not there, and 409 closed past the cut-off', async () => {
    const day = await openDay(stack);
    await BakeDay.update({ ringsRemaining: 5 }, { where: { id: day.id } });
    const sold = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(sold.status).toBe(409);
    expect(sold.body.error.code).toBe('sold_out');
    expect(await remaining(day.id)).toEqual({ rings: 5, holes: day.remaining.holes });
    await BakeDay.update({ ringsRemaining: 120, ordersOpenAt: new Date(Date.now() - 2 * 86400_000), cutoffAt: new Date(Date.now() - 1000) }, { where: { id: day.id } });
    const closed = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(closed.status).toBe(409);
    expect(closed.body.error.code).toBe('closed');
  });

  it('answers 409 window_full naming the field when the pickup window has no order left, and takes nothing', async () => {
    const day = await openDay(stack);
    await PickupWindow.update({ ordersRemaining: 0 }, { where: { id: day.pickupWindows[0]!.id } });
    const before = await remaining(day.id);
    const ordersBefore = await Order.count({ where: { bakeDayId: day.id } });
    const full = await customer.send('POST', '/api/orders', halfDozen(day, 0));
    expect(full.status).toBe(409);
    expect(full.body.error).toMatchObject({ code: 'window_full', details: { fields: { pickupWindowId: expect.stringMatching(/full/i) } } });
    expect(await remaining(day.id)).toEqual(before);
    expect(await Order.count({ where: { bakeDayId: day.id } })).toBe(ordersBefore);
    expect((await PickupWindow.findByPk(day.pickupWindows[0]!.id))!.ordersRemaining).toBe(0);
    // another window still takes it
    expect((await customer.send('POST', '/api/orders', halfDozen(day, 1))).status).toBe(201);
  });

  it('adds sales tax when the owner sets it added, and sends it to checkout as its own line', async () => {
    await ShopSettings.update({ taxMode: 'added', taxRateBp: 825 }, { where: { id: 1 } });
    const day = await openDay(stack);
    const res = await customer.send('POST', '/api/orders', mixedDozen(day));
    const rings = day.menu.filter((m) => m.kind === 'ring');
    const subtotal = 3000 + 6 * rings[0]!.surchargeCents + 6 * rings[1]!.surchargeCents;
    // 8.25 % rounded half up to the cent (worked by hand)
    expect(res.body.totalCents).toBe(subtotal + Math.floor((2 * subtotal * 825 + 10_000) / 20_000));
    const items = await context().payments.checkout.sessions.listLineItems(sessionIdOf(res.body.checkoutUrl));
    expect(items.data.map((i) => i.description)).toContain('Sales tax');
    expect(items.data.reduce((sum, i) => sum + i.amount_total, 0)).toBe(res.body.totalCents);
  });

  it('allows one hold per customer and bake day', async () => {
    const day = await openDay(stack);
    expect((await customer.send('POST', '/api/orders', halfDozen(day))).status).toBe(201);
    const second = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('hold_exists');
  });

  it("hides another customer's order (404)", async () => {
    const day = await openDay(stack);
    const mine = await customer.send('POST', '/api/orders', halfDozen(day));
    const other = new Browser(stack.url);
    await signIn(other, 'someone.else@example.test');
    expect((await other.getJson(`/api/orders/${mine.body.id}`)).status).toBe(404);
    expect((await other.send('POST', `/api/orders/${mine.body.id}/cancel`)).status).toBe(404);
  });
});

describe('paying (Stripe testing docs: published test cards)', () => {
  it('4242 4242 4242 4242 pays: a pickup code, a confirmation e-mail with a QR code and a calendar entry', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, mixedDozen(day, 1));
    const paid = await customer.getJson(`/api/orders/${order.id}`);
    expect(paid.body.status).toBe('paid');
    const code: string = paid.body.pickupCode;
    expect(code).toMatch(new RegExp(`^[${PICKUP_CODE_ALPHABET}]{6}$`));
    expect(paid.body.qrDataUrl).toMatch(/^data:image\/png;base64,/);

    expect((await deliverMail(stack)).sent).toBeGreaterThanOrEqual(1);
    const mail = await stack.mail.waitFor((m) => m.subject.includes(code), 5000);
    expect(mail.text).toContain(code);
    expect(mail.text).toMatch(/Allergens in this order: .*eggs.*milk.*wheat/);

    // the QR code, read by a general-purpose decoder (jsQR), gives the pickup code
    const png = mail.attachments.find((a) => a.contentType === 'image/png')!;
    const image = PNG.sync.read(Buffer.from(png.content));
    expect(jsQR(new Uint8ClampedArray(image.data), image.width, image.height)?.data).toBe(code);

    // the calendar entry, read by a general-purpose iCalendar parser (ical.js, RFC 5545), gives the pickup window
    const ics = mail.attachments.find((a) => a.contentType.startsWith('text/calendar'))!;
    const event = new ICAL.Event(new ICAL.Component(ICAL.parse(Buffer.from(ics.content).toString('utf8'))).getFirstSubcomponent('vevent')!);
    const window = day.pickupWindows[1]!;
    const start = DateTime.fromJSDate(event.startDate.toJSDate()).setZone(day.timeZone);
    const end = DateTime.fromJSDate(event.endDate.toJSDate()).setZone(day.timeZone);
    expect(start.toISO()).toBe(DateTime.fromISO(window.startsAt).setZone(day.timeZone).toISO());
    expect(end.toISO()).toBe(DateTime.fromISO(window.endsAt).setZone(day.timeZone).toISO());
    expect(start.toFormat('HH:mm')).toBe('09:00'); // the demo's second window starts at 9 a.m. local time
    expect(event.description).toContain(code);
  });

  it('4000…0002 and 4000…9995 decline and leave the order payable; a retry with 4242 pays', async () => {
    const day = await openDay(stack);
    const created = await customer.send('POST', '/api/orders', halfDozen(day));
    const session = sessionIdOf(created.body.checkoutUrl);
    for (const [card, reason] of [['4000000000000002', 'generic_decline'], ['4000000000009995', 'insufficient_funds']]) {
      const outcome = stack.payments.paySession(session, { ...CARD_OK, cardNumber: card! });
      expect(outcome.kind).toBe('declined');
      expect(JSON.stringify(outcome)).toContain(reason);
      await stack.payments.webhooksIdle();
      expect((await customer.getJson(`/api/orders/${created.body.id}`)).body.status).toBe('held');
    }
    const resumed = await customer.send('POST', `/api/orders/${created.body.id}/checkout`);
    expect(resumed.body.checkoutUrl).toBe(created.body.checkoutUrl);
    expect(stack.payments.paySession(session, CARD_OK).kind).toBe('paid');
    await stack.payments.webhooksIdle();
    expect((await customer.getJson(`/api/orders/${created.body.id}`)).body.status).toBe('paid');
  });
});

describe('cancelling and moving', () => {
  it('cancels a paid order before the cut-off: refunded in full, pieces back, e-mail sent', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, mixedDozen(day));
    const res = await customer.send('POST', `/api/orders/${order.id}/cancel`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'cancelled', refundedCents: order.totalCents });
    await stack.payments.webhooksIdle();
    expect(await remaining(day.id)).toEqual(day.remaining);
    const refunds = stack.payments.events().filter((e) => e.type === 'charge.refunded');
    expect(refunds).toHaveLength(1);
    expect((await customer.getJson(`/api/orders/${order.id}`)).body.refundedCents).toBe(order.totalCents);
    expect(await OutboxMessage.count({ where: { kind: 'cancellation' } })).toBe(1);
    // cancelling again changes nothing
    const again = await customer.send('POST', `/api/orders/${order.id}/cancel`);
    expect(again.body.status).toBe('cancelled');
    expect(stack.payments.events().filter((e) => e.type === 'refund.created')).toHaveLength(1);
  });

  it('refuses to cancel after the cut-off (409), leaving the order paid', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day));
    await BakeDay.update({ ordersOpenAt: new Date(Date.now() - 5 * 86400_000), cutoffAt: new Date(Date.now() - 1000) }, { where: { id: day.id } });
    const res = await customer.send('POST', `/api/orders/${order.id}/cancel`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('too_late');
    expect((await Order.findByPk(order.id))!.status).toBe('paid');
  });

  it('moves a paid order to another window with room, and refuses a full one', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day, 0));
    const moved = await customer.send('POST', `/api/orders/${order.id}/move`, { pickupWindowId: day.pickupWindows[2]!.id });
    expect(moved.status).toBe(200);
    expect(moved.body.pickupWindow.id).toBe(day.pickupWindows[2]!.id);
    const [w0, w2] = await Promise.all([PickupWindow.findByPk(day.pickupWindows[0]!.id), PickupWindow.findByPk(day.pickupWindows[2]!.id)]);
    expect(w0!.ordersRemaining).toBe(25);
    expect(w2!.ordersRemaining).toBe(24);
    await PickupWindow.update({ ordersRemaining: 0 }, { where: { id: day.pickupWindows[1]!.id } });
    const full = await customer.send('POST', `/api/orders/${order.id}/move`, { pickupWindowId: day.pickupWindows[1]!.id });
    expect(full.status).toBe(409);
    expect(full.body.error.code).toBe('window_full');
  });
});
