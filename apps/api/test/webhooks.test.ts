import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { beforeEach, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import { Order, OutboxMessage, PaymentEvent } from '../src/db/models/index.js';
import { sweepHolds } from '../src/jobs/hold-sweeper.js';
import { releaseOrder } from '../src/db/queries/capacity.js';
import { database } from '../src/db/sequelize.js';
import { context } from '../src/integrations/context.js';
import { BakeDay } from '../src/db/models/index.js';
import { Browser, WEBHOOK_SECRET, signIn, useStack } from './support.js';
import { CARD_OK, halfDozen, mixedDozen, openDay, remaining, sessionIdOf } from './order-helpers.js';

const stack = useStack();
let customer: Browser;
const sdk = new Stripe('sk_test_reference_only');

beforeEach(async () => {
  customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
});

async function heldOrder(body?: unknown) {
  const day = await openDay(stack);
  const res = await customer.send('POST', '/api/orders', body ?? halfDozen(day));
  return { day, order: res.body, session: sessionIdOf(res.body.checkoutUrl) };
}

const paid = (id: string) => Order.findByPk(id);

describe('payment webhooks: signed, recorded once, any order of arrival', () => {
  it('the same event three times in a row → one paid order, one e-mail', async () => {
    const { order, session } = await heldOrder();
    stack.payments.setDeliveryMode({ copies: 3 });
    stack.payments.paySession(session, CARD_OK);
    await stack.payments.webhooksIdle();
    const completed = stack.payments.deliveries().filter((d) => d.eventType === 'checkout.session.completed');
    expect(completed.length).toBe(3);
    expect((await paid(order.id))!.status).toBe('paid');
    expect(await OutboxMessage.count({ where: { kind: 'confirmation' } })).toBe(1);
    expect(await PaymentEvent.count({ where: { type: 'checkout.session.completed' } })).toBe(1);
  });

  it('the same event three times at once → one paid order, one e-mail', async () => {
    const { order, session } = await heldOrder();
    stack.payments.setDeliveryMode({ copies: 3, concurrent: true });
    stack.payments.paySession(session, CARD_OK);
    await stack.payments.webhooksIdle();
    const row = await paid(order.id);
    expect(row!.status).toBe('paid');
    expect(await OutboxMessage.count({ where: { kind: 'confirmation' } })).toBe(1);
    expect(await Order.count({ where: { pickupCode: row!.pickupCode } })).toBe(1);
  });

  it('expired arriving after completed leaves the order paid', async () => {
    const { order, session } = await heldOrder();
    stack.payments.paySession(session, CARD_OK);
    await stack.payments.webhooksIdle();
    const completed = stack.payments.events().find((e) => e.type === 'checkout.session.completed')!;
    const expired = { ...completed, id: 'evt_test_late_expired', type: 'checkout.session.expired', data: { object: { ...(completed.data.object as object), status: 'expired' } } };
    const res = await postSigned(JSON.stringify(expired));
    expect(res.status).toBe(200);
    expect((await paid(order.id))!.status).toBe('paid');
  });

  it('refunded arriving before completed ends refunded, with the pieces back', async () => {
    const { day, order, session } = await heldOrder();
    stack.payments.setDeliveryMode({ drop: true });
    stack.payments.paySession(session, CARD_OK);
    await stack.payments.webhooksIdle();
    const intent = stack.payments.events().find((e) => e.type === 'payment_intent.succeeded')!.data.object as { id: string };
    await context().payments.refunds.create({ payment_intent: intent.id });
    await stack.payments.webhooksIdle();
    const events = stack.payments.events();
    const refunded = events.find((e) => e.type === 'charge.refunded')!;
    const completed = events.find((e) => e.type === 'checkout.session.completed')!;
    expect((await postSigned(JSON.stringify(refunded))).status).toBe(200);
    expect((await postSigned(JSON.stringify(completed))).status).toBe(200);
    const row = await paid(order.id);
    expect(row!.status).toBe('refunded');
    expect(row!.refundedCents).toBe(order.totalCents);
    expect(await remaining(day.id)).toEqual(day.remaining);
    expect(await OutboxMessage.count({ where: { kind: 'confirmation' } })).toBe(0);
  });

  describe('refuses a bad signature with 400 and changes nothing', () => {
    async function expectRefused(send: (payload: string) => Promise<Response>) {
      const { order, session } = await heldOrder();
      stack.payments.setDeliveryMode({ drop: true });
      stack.payments.paySession(session, CARD_OK);
      await stack.payments.webhooksIdle();
      const event = stack.payments.events().find((e) => e.type === 'checkout.session.completed')!;
      const res = await send(JSON.stringify(event));
      expect(res.status).toBe(400);
      expect(((await res.json()) as any).error.code).toBe('bad_signature');
      expect((await paid(order.id))!.status).toBe('held');
      expect(await PaymentEvent.count()).toBe(0);
    }
    it('signed with a wrong secret', () => expectRefused((p) => postSigned(p, { secret: 'whsec_wrong' })));
    it('with one byte changed after signing', () => expectRefused((p) => postSigned(p, { tamper: true })));
    it('without the signature header', () => expectRefused((p) => fetch(`${stack.url}/webhooks/payments`, { method: 'POST', body: p, headers: { 'content-type': 'application/json' } })));
    it('with a timestamp over 5 minutes old', () => expectRefused((p) => postSigned(p, { timestamp: Math.floor(Date.now() / 1000) - 301 })));
  });

  it("the fake's signatures verify with the SDK's constructEvent and equal generateTestHeaderString (stripe SDK as reference)", async () => {
    const { session } = await heldOrder();
    // capture exactly what the fake sends, at a receiver of our own
    const received: Array<{ body: string; header: string }> = [];
    const receiver = http.createServer((req, res) => {
      let body = '';
      req.on('data', (c) => (body += c));
      req.on('end', () => {
        received.push({ body, header: String(req.headers['stripe-signature']) });
        res.end('ok');
      });
    });
    await new Promise<void>((r) => receiver.listen(0, '127.0.0.1', r));
    stack.payments.setWebhookEndpoint(`http://127.0.0.1:${(receiver.address() as AddressInfo).port}/`, WEBHOOK_SECRET);
    try {
      stack.payments.paySession(session, CARD_OK);
      await stack.payments.webhooksIdle();
    } finally {
      stack.payments.setWebhookEndpoint(`${stack.url}/webhooks/payments`, WEBHOOK_SECRET);
      receiver.close();
    }
    expect(received.length).toBeGreaterThanOrEqual(2);
    for (const { body, header } of received) {
      const timestamp = Number(/t=(\d+)/.exec(header)![1]);
      expect(sdk.webhooks.constructEvent(body, header, WEBHOOK_SECRET).id).toMatch(/^evt_/);
      expect(header).toBe(sdk.webhooks.generateTestHeaderString({ payload: body, secret: WEBHOOK_SECRET, timestamp }));
    }
  });
});

describe('holds', () => {
  it('advancing time past the hold returns the capacity exactly once, with the sweeper and the expiry webhook racing', async () => {
    const { day, order } = await heldOrder(mixedDozen(await openDay(stack)));
    expect(await remaining(day.id)).toEqual({ rings: day.remaining.rings - 12, holes: day.remaining.holes });
    stack.payments.setDeliveryMode({ copies: 2, concurrent: true });
    const later = new Date(Date.now() + 11 * 60_000);
    await Promise.all([sweepHolds(later), sweepHolds(later), Promise.resolve(stack.payments.advanceClock(32 * 60))]);
    await stack.payments.webhooksIdle();
    await sweepHolds(later);
    expect((await paid(order.id))!.status).toBe('expired');
    expect(await remaining(day.id)).toEqual(day.remaining);
    const window = (await BakeDay.findByPk(day.id, { include: ['pickupWindows'] }))!.pickupWindows!.find((w) => w.id === day.pickupWindows[0]!.id)!;
    expect(window.ordersRemaining).toBe(day.pickupWindows[0]!.ordersLeft);
  });

  it('a payment after the hold lapsed takes the pieces again if they are there', async () => {
    const { day, order, session } = await heldOrder();
    await database().transaction((t) => releaseOrder(order.id, ['held'], 'expired', t));
    expect(await remaining(day.id)).toEqual(day.remaining);
    stack.payments.paySession(session, CARD_OK);
    await stack.payments.webhooksIdle();
    expect((await paid(order.id))!.status).toBe('paid');
    expect(await remaining(day.id)).toEqual({ rings: day.remaining.rings - 6, holes: day.remaining.holes });
  });

  it('a payment after the hold lapsed on a sold-out day is refunded in full with an apology — never oversold', async () => {
    const { day, order, session } = await heldOrder();
    await database().transaction((t) => releaseOrder(order.id, ['held'], 'expired', t));
    await BakeDay.update({ ringsRemaining: 0 }, { where: { id: day.id } });
    stack.payments.paySession(session, CARD_OK);
    await stack.payments.webhooksIdle();
    const row = await paid(order.id);
    expect(row!.status).toBe('refunded');
    expect(row!.refundedCents).toBe(order.totalCents);
    expect(await remaining(day.id)).toEqual({ rings: 0, holes: day.remaining.holes });
    expect(await OutboxMessage.count({ where: { kind: 'late-payment-refund' } })).toBe(1);
    expect(stack.payments.events().filter((e) => e.type === 'charge.refunded')).toHaveLength(1);
  });
});

async function postSigned(payload: string, opts: { secret?: string; timestamp?: number; tamper?: boolean } = {}) {
  const header = sdk.webhooks.generateTestHeaderString({ payload, secret: opts.secret ?? WEBHOOK_SECRET, timestamp: opts.timestamp ?? Math.floor(Date.now() / 1000) });
  const body = opts.tamper ? payload.replace('"livemode":false', '"livemode":true ') : payload;
  return fetch(`${stack.url}/webhooks/payments`, { method: 'POST', body, headers: { 'content-type': 'application/json', 'stripe-signature': header } });
}

