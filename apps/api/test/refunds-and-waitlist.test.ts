import { beforeEach, describe, expect, it } from 'vitest';
import { BakeDay, Order, OutboxMessage, Refund, WaitlistEntry } from '../src/db/models/index.js';
import { lapseOffers, OFFER_MINUTES } from '../src/services/waitlist/waitlist.js';
import { Browser, signIn, useStack } from './support.js';
import { halfDozen, mixedDozen, openDay, orderAndPay, remaining } from './order-helpers.js';

const stack = useStack();
let customer: Browser;
let owner: Browser;
beforeEach(async () => {
  customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
});

const refund = (orderId: string, amountCents: number, key: string) =>
  owner.send('POST', `/api/staff/orders/${orderId}/refunds`, { amountCents, reason: 'Burnt batch' }, { 'idempotency-key': key });

const providerRefunds = () => stack.payments.events().filter((e) => e.type === 'refund.created').length;

describe('owner refunds', () => {
  it('a partial refund, then the rest: the order ends refunded with its pieces back', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, mixedDozen(day));
    const part = await refund(order.id, 500, 'refund-key-part-1');
    expect(part.status).toBe(201);
    expect(part.body.order).toMatchObject({ status: 'paid', refundedCents: 500 });
    const rest = await refund(order.id, order.totalCents - 500, 'refund-key-rest-2');
    expect(rest.status).toBe(201);
    expect(rest.body.order).toMatchObject({ status: 'refunded', refundedCents: order.totalCents });
    await stack.payments.webhooksIdle();
    expect(await remaining(day.id)).toEqual(day.remaining);
    expect(providerRefunds()).toBe(2);
    expect(await OutboxMessage.count({ where: { kind: 'refund' } })).toBe(2);
  });

  it('refuses an over-refund (400) and changes nothing', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day));
    const over = await refund(order.id, order.totalCents + 1, 'refund-key-over-1');
    expect(over.status).toBe(400);
    expect(over.body.error.code).toBe('over_refund');
    expect((await Order.findByPk(order.id))!.refundedCents).toBe(0);
    expect(providerRefunds()).toBe(0);
  });

  it('a double-clicked refund (same request key, sent twice at once) is made once', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day));
    const [a, b] = await Promise.all([refund(order.id, 700, 'refund-key-double'), refund(order.id, 700, 'refund-key-double')]);
    expect(a.status).toBe(201);
    expect(b.status).toBe(201);
    expect(a.body.id).toBe(b.body.id);
    expect(await Refund.count({ where: { orderId: order.id } })).toBe(1);
    expect((await Order.findByPk(order.id))!.refundedCents).toBe(700);
    expect(providerRefunds()).toBe(1);
  });

  it('refuses a refund without a request key', async () => {
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day));
    const res = await owner.send('POST', `/api/staff/orders/${order.id}/refunds`, { amountCents: 100, reason: 'x' });
    expect(res.status).toBe(400);
  });
});

describe('waitlist', () => {
  it('offers freed pieces to the first in line by e-mail; the claim link orders them', async () => {
    const day = await openDay(stack);
    // one half dozen left: the customer takes it, the day is then sold out for rings
    await BakeDay.update({ ringsRemaining: 6 }, { where: { id: day.id } });
    const { order } = await orderAndPay(stack, customer, halfDozen(day));
    const waiting = new Browser(stack.url);
    await signIn(waiting, 'waiting@example.test');
    const sold = await waiting.send('POST', '/api/orders', halfDozen(day));
    expect(sold.body.error.code).toBe('sold_out');
    const joined = await waiting.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 6 });
    expect(joined.status).toBe(201);
    expect(joined.body.position).toBe(1);

    await customer.send('POST', `/api/orders/${order.id}/cancel`);
    const entry = await WaitlistEntry.findByPk(joined.body.id);
    expect(entry!.status).toBe('offered');
    // the freed pieces are set aside for the offer, not back on sale
    expect((await remaining(day.id)).rings).toBe(0);
    const offerMail = await OutboxMessage.findOne({ where: { kind: 'waitlist-offer' } });
    expect(offerMail!.toAddress).toBe('waiting@example.test');
    const token = /\/claim\/([\w-]+)/.exec(offerMail!.textBody)![1]!;

    const stranger = new Browser(stack.url);
    await signIn(stranger, 'stranger@example.test');
    expect((await stranger.send('POST', '/api/orders', halfDozen(day))).body.error.code).toBe('sold_out');

    const offer = await waiting.getJson(`/api/waitlist/claims/${token}`);
    expect(offer.body).toMatchObject({ bakeDayId: day.id, rings: 6 });
    const claimed = await waiting.send('POST', '/api/orders', { ...halfDozen(day), claimToken: token });
    expect(claimed.status).toBe(201);
    expect((await remaining(day.id)).rings).toBe(0);
    expect((await WaitlistEntry.findByPk(joined.body.id))!.status).toBe('claimed');
    // a claim link works once
    const again = await waiting.getJson(`/api/waitlist/claims/${token}`);
    expect(again.status).toBe(409);
  });

  it('an offer nobody claims lapses and its pieces go to the next in line', async () => {
    const day = await openDay(stack);
    await BakeDay.update({ ringsRemaining: 6 }, { where: { id: day.id } });
    const { order } = await orderAndPay(stack, customer, halfDozen(day));
    const first = new Browser(stack.url);
    await signIn(first, 'first.in.line@example.test');
    const second = new Browser(stack.url);
    await signIn(second, 'second.in.line@example.test');
    const a = await first.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 6 });
    const b = await second.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 6 });
    expect(b.body.position).toBe(2);
    await customer.send('POST', `/api/orders/${order.id}/cancel`);
    expect((await WaitlistEntry.findByPk(a.body.id))!.status).toBe('offered');
    expect(await lapseOffers(new Date(Date.now() + (OFFER_MINUTES + 1) * 60_000))).toBe(1);
    expect((await WaitlistEntry.findByPk(a.body.id))!.status).toBe('lapsed');
    expect((await WaitlistEntry.findByPk(b.body.id))!.status).toBe('offered');
    expect((await remaining(day.id)).rings).toBe(0);
  });
});
