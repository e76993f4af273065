import { beforeEach, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import type { BakeDayView } from '@fryline/schemas';
import { signatureHeader } from '@fryline/fake-payments';
import { AuditEntry, BakeDay, BakeDayBox, Order, OutboxMessage, Refund } from '../src/db/models/index.js';
import { database } from '../src/db/sequelize.js';
import { context } from '../src/integrations/context.js';
import { reconcilePayments } from '../src/jobs/payment-reconciler.js';
import { customerAndOwner, type Browser, WEBHOOK_SECRET, useStack } from './support.js';
import { CARD_OK, halfDozen, openDay, orderAndPay, sessionIdOf } from './order-helpers.js';

// Payments that reconcile to the cent and refunds made exactly once, checked
// against the payments stand-in through the official SDK.

const stack = useStack();
let customer: Browser;
let owner: Browser;

beforeEach(async () => {
  ({ customer, owner } = await customerAndOwner(stack));
});

/** A dozen of rings without surcharge, in a box the test prices at $32.50. */
async function dozenAt3250(): Promise<{ day: BakeDayView; body: unknown }> {
  const day = await openDay(stack);
  await BakeDayBox.update({ priceCents: 3250 }, { where: { bakeDayId: day.id, size: 'dozen' } });
  const plain = day.menu.filter((m) => m.kind === 'ring' && m.surchargeCents === 0);
  const body = {
    bakeDayId: day.id,
    pickupWindowId: day.pickupWindows[0]!.id,
    boxes: [{ size: 'dozen', items: [{ menuItemId: plain[0]!.id, quantity: 6 }, { menuItemId: plain[1]!.id, quantity: 6 }] }],
  };
  return { day, body };
}

async function providerRefunds(paymentIntent: string) {
  return (await context().payments.refunds.list({ payment_intent: paymentIntent, limit: 100 })).data;
}

const refundCall = (orderId: string, amountCents: number, reason: string, key: string) =>
  owner.send('POST', `/api/staff/orders/${orderId}/refunds`, { amountCents, reason }, { 'idempotency-key': key });

describe('webhooks: the session is checked against the order', () => {
  it('a 50¢ session naming a $32.50 order: not paid, refunded in full at once, flagged for the owner', async () => {
    const { body } = await dozenAt3250();
    const created = await customer.send('POST', '/api/orders', body);
    expect(created.status).toBe(201);
    expect(created.body.totalCents).toBe(3250);
    const orderId = created.body.id as string;
    // someone with a checkout session of their own that names our order
    const sneaky = await context().payments.checkout.sessions.create({
      mode: 'payment',
      line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: 50, product_data: { name: 'A dozen' } } }],
      success_url: `${stack.url}/orders/${orderId}?paid=1`,
      cancel_url: `${stack.url}/`,
      client_reference_id: orderId,
      metadata: { orderId },
    });
    const paid = stack.payments.paySession(sneaky.id, CARD_OK);
    expect(paid.kind).toBe('paid');
    await stack.payments.webhooksIdle();

    const order = await Order.findByPk(orderId);
    expect(order!.status).toBe('held');
    expect(order!.paymentIntentId).toBeNull();
    const [flag] = await database().query<{ problem: string; amount_cents: number; refund_status: string; order_id: string }>(
      `SELECT problem, amount_cents, refund_status, order_id FROM payment_flags WHERE checkout_session_id = :id`,
      { replacements: { id: sneaky.id }, type: QueryTypes.SELECT },
    );
    expect(flag).toMatchObject({ amount_cents: 50, refund_status: 'succeeded', order_id: orderId });
    expect(flag!.problem).toMatch(/not the order's checkout session/);
    const intent = (await context().payments.checkout.sessions.retrieve(sneaky.id)).payment_intent as string;
    expect((await providerRefunds(intent)).map((r) => r.amount)).toEqual([50]);
    expect(await AuditEntry.count({ where: { action: 'payment.flagged' } })).toBe(1);
    // the owner sees it
    const flags = await owner.getJson('/api/staff/payment-flags');
    expect(flags.status).toBe(200);
    expect(flags.body).toEqual([expect.objectContaining({ orderId, checkoutSessionId: sneaky.id, amountCents: 50, refundStatus: 'succeeded' })]);
    // with whose order it was, for which bake day, and where that order stands
    expect(flags.body[0].order).toEqual({
      customerName: expect.any(String),
      customerEmail: (await customer.getJson('/api/me')).body.email,
      bakeDayId: (body as { bakeDayId: string }).bakeDayId,
      bakeDayDate: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
      status: 'held',
      totalCents: 3250,
    });
    expect((await customer.getJson('/api/staff/payment-flags')).status).toBe(403);
    expect(await OutboxMessage.count({ where: { kind: 'confirmation' } })).toBe(0);
  });

  it('refuses a signature whose timestamp is more than 5 minutes in the future, accepts one a little ahead', async () => {
    const payload = JSON.stringify({ id: 'evt_future_1', object: 'event', type: 'payment_intent.created', created: 1, data: { object: {} }, livemode: false });
    const post = (t: number) =>
      fetch(`${stack.url}/webhooks/payments`, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signatureHeader(payload, WEBHOOK_SECRET, t) }, body: payload });
    const now = Math.floor(Date.now() / 1000);
    expect((await post(now + 600)).status).toBe(400);
    expect((await post(now + 30)).status).toBe(200);
  });
});

describe('lost webhooks are reconciled', () => {
  it('deliveries dropped while paying: the reconciliation job marks the order paid exactly once; a cancel then refunds the money', async () => {
    const day = await openDay(stack);
    stack.payments.setDeliveryMode({ drop: true });
    const created = await customer.send('POST', '/api/orders', halfDozen(day));
    stack.payments.paySession(sessionIdOf(created.body.checkoutUrl), CARD_OK);
    await stack.payments.webhooksIdle();
    expect((await Order.findByPk(created.body.id))!.status).toBe('held');

    await reconcilePayments(new Date());
    await reconcilePayments(new Date());
    const order = await Order.findByPk(created.body.id);
    expect(order!.status).toBe('paid');
    expect(order!.pickupCode).toMatch(/\S/);
    expect(await AuditEntry.count({ where: { action: 'order.paid', subjectId: order!.id } })).toBe(1);
    expect(await OutboxMessage.count({ where: { kind: 'confirmation' } })).toBe(1);

    const cancelled = await customer.send('POST', `/api/orders/${order!.id}/cancel`);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    const refunds = await providerRefunds(order!.paymentIntentId!);
    expect(refunds.reduce((n, r) => n + r.amount, 0)).toBe(order!.totalCents);
    expect((await Order.findByPk(order!.id))!.refundedCents).toBe(order!.totalCents);
  });

  it('a held order whose payment went through unseen: the cancel records the payment and refunds it', async () => {
    const day = await openDay(stack);
    stack.payments.setDeliveryMode({ drop: true });
    const created = await customer.send('POST', '/api/orders', halfDozen(day));
    stack.payments.paySession(sessionIdOf(created.body.checkoutUrl), CARD_OK);
    const before = await BakeDay.findByPk(day.id);
    const cancelled = await customer.send('POST', `/api/orders/${created.body.id}/cancel`);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    const order = await Order.findByPk(created.body.id);
    expect(order!.paymentIntentId).toMatch(/^pi_/);
    expect((await providerRefunds(order!.paymentIntentId!)).reduce((n, r) => n + r.amount, 0)).toBe(order!.totalCents);
    expect(order!.refundedCents).toBe(order!.totalCents);
    // the six rings went back once
    expect((await BakeDay.findByPk(day.id))!.ringsRemaining).toBe(before!.ringsRemaining + 6);
  });

  it('a cancel while the payments service is failing answers 502 payments_error and leaves the hold', async () => {
    const day = await openDay(stack);
    const created = await customer.send('POST', '/api/orders', halfDozen(day));
    stack.payments.runtime.apiFailures = { count: 10, path: '/checkout/sessions', mode: 'before' };
    const cancelled = await customer.send('POST', `/api/orders/${created.body.id}/cancel`);
    stack.payments.runtime.apiFailures = { count: 0, path: '/', mode: 'before' };
    expect(cancelled.status).toBe(502);
    expect(cancelled.body.error.code).toBe('payments_error');
    expect((await Order.findByPk(created.body.id))!.status).toBe('held');
  });
});

describe('refunds exactly once', () => {
  it('a reason holding \\u0000 or a lone surrogate → 400 before anything is sent; nothing at the provider', async () => {
    const { order } = await orderAndPay(stack, customer, halfDozen(await openDay(stack)));
    const paid = await Order.findByPk(order.id);
    for (const reason of ['one box short\u0000', 'short \ud800 box']) {
      const res = await refundCall(order.id, 100, reason, `bad-text-${reason.length}`);
      expect(res.status).toBe(400);
    }
    expect(await providerRefunds(paid!.paymentIntentId!)).toEqual([]);
    expect(await Refund.count()).toBe(0);
    expect(await AuditEntry.count({ where: { action: 'order.refund_requested' } })).toBe(0);
  });

  it('the provider fails after the intent is recorded (the refund made, the answer lost): a retry from a reopened dialog makes exactly one refund', async () => {
    const { order } = await orderAndPay(stack, customer, halfDozen(await openDay(stack)));
    const paid = await Order.findByPk(order.id);
    // the first attempt and the SDK's own retry both lose their answers
    stack.payments.runtime.apiFailures = { count: 2, path: '/refunds', mode: 'after' };
    const first = await refundCall(order.id, 500, 'one ring dropped', 'dialog-one-key');
    expect(first.status).toBe(502);
    expect(first.body.error.code).toBe('payments_error');
    expect(await Refund.count({ where: { status: 'pending' } })).toBe(1);
    expect((await providerRefunds(paid!.paymentIntentId!)).length).toBe(1);

    const retry = await refundCall(order.id, 500, 'one ring dropped', 'dialog-two-key');
    expect(retry.status).toBe(201);
    expect(retry.body.order.refundedCents).toBe(500);
    expect((await providerRefunds(paid!.paymentIntentId!)).map((r) => r.amount)).toEqual([500]);
    expect(await Refund.count({ where: { status: 'succeeded' } })).toBe(1);
    expect(await OutboxMessage.count({ where: { kind: 'refund' } })).toBeLessThanOrEqual(1);
  });

  it('a cancel racing an owner partial refund: the cancel succeeds and the refunds add up to the total', async () => {
    const { order } = await orderAndPay(stack, customer, halfDozen(await openDay(stack)));
    const paid = await Order.findByPk(order.id);
    const [partial, cancelled] = await Promise.all([
      refundCall(order.id, 300, 'a ring short', 'race-partial-key'),
      customer.send('POST', `/api/orders/${order.id}/cancel`),
    ]);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    // the owner's refund either went first (201) or found nothing left (400 over_refund)
    expect([201, 400]).toContain(partial.status);
    const refunds = await providerRefunds(paid!.paymentIntentId!);
    expect(refunds.reduce((n, r) => n + r.amount, 0)).toBe(paid!.totalCents);
    const after = await Order.findByPk(order.id);
    expect(after!.refundedCents).toBe(paid!.totalCents);
    expect(await Refund.count({ where: { status: 'pending' } })).toBe(0);
  });
});

describe('fair shares', () => {
  it('an order over the per-customer limit → 409 naming the limit, nothing written', async () => {
    expect((await owner.getJson('/api/staff/order-limit')).body).toEqual({ maxPiecesPerCustomer: 36 });
    expect((await owner.send('PUT', '/api/staff/order-limit', { maxPiecesPerCustomer: 0 })).status).toBe(400);
    expect((await customer.send('PUT', '/api/staff/order-limit', { maxPiecesPerCustomer: 1000 })).status).toBe(403);
    expect((await owner.send('PUT', '/api/staff/order-limit', { maxPiecesPerCustomer: 12 })).body).toEqual({ maxPiecesPerCustomer: 12 });
    const day = await openDay(stack);
    const { body } = await dozenAt3250();
    await orderAndPay(stack, customer, body);
    const orders = await Order.count();
    const more = await customer.send('POST', '/api/orders', halfDozen(day));
    expect(more.status).toBe(409);
    expect(more.body.error.code).toBe('limit_exceeded');
    expect(more.body.error.message).toMatch(/\b12 pieces\b/);
    expect(more.body.error.details).toMatchObject({ limit: 12, alreadyOrdered: 12 });
    expect(await Order.count()).toBe(orders);
  });

  it('the waitlist takes a request only when the day is sold out for it, and never more than the share', async () => {
    const day = await openDay(stack);
    const early = await customer.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 6 });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('not_sold_out');
    await BakeDay.update({ ringsRemaining: 0 }, { where: { id: day.id } });
    const greedy = await customer.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 120 });
    expect(greedy.status).toBe(409);
    expect(greedy.body.error).toMatchObject({ code: 'limit_exceeded', details: { limit: 36 } });
    expect((await customer.send('POST', `/api/bake-days/${day.id}/waitlist`, { rings: 6 })).status).toBe(201);
  });
});
