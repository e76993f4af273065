import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PaymentsFake } from './server.js';
import { paySession, sessionParams, singleItem, startFake } from './test-support/fixture.js';

let fake: PaymentsFake;
let stripe: Stripe;

beforeAll(async () => {
  ({ fake, stripe } = await startFake({ publicUrl: 'http://pay.fryline.test:8080/' }));
});
afterAll(() => fake.close());

async function sessionCount(): Promise<number> {
  return (await stripe.checkout.sessions.list({ limit: 100 })).data.length;
}

describe('checkout sessions through the official SDK', () => {
  it('creates an open session with the fields the SDK types describe', async () => {
    const session = await stripe.checkout.sessions.create(
      sessionParams({ client_reference_id: 'box-7', customer_email: 'maple@example.test' }),
    );
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.object).toBe('checkout.session');
    expect(session.livemode).toBe(false);
    expect(session.mode).toBe('payment');
    expect(session.status).toBe('open');
    expect(session.payment_status).toBe('unpaid');
    expect(session.payment_intent).toBeNull();
    // 2 × 1800 + 1 × 600 cents: the session total is the sum of its lines (Stripe API reference, amount_total).
    expect(session.amount_subtotal).toBe(4200);
    expect(session.amount_total).toBe(4200);
    expect(session.currency).toBe('usd');
    expect(session.metadata).toEqual({ orderId: 'ord_demo_1' });
    expect(session.client_reference_id).toBe('box-7');
    expect(session.customer_email).toBe('maple@example.test');
    expect(session.success_url).toBe('https://shop.fryline.test/orders/thanks?session={CHECKOUT_SESSION_ID}');
    expect(session.cancel_url).toBe('https://shop.fryline.test/box');
    expect(session.url).toBe(`http://pay.fryline.test:8080/pay/${session.id}`);
    // Default lifetime is 24 hours (Stripe API reference, expires_at).
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);
    expect(session.lastResponse.requestId).toMatch(/^req_/);
  });

  it('retrieves the same session and lists its line items', async () => {
    const created = await stripe.checkout.sessions.create(sessionParams());
    const again = await stripe.checkout.sessions.retrieve(created.id);
    expect(again).toEqual(created);
    const items = await stripe.checkout.sessions.listLineItems(created.id);
    expect(items.object).toBe('list');
    expect(items.has_more).toBe(false);
    expect(items.url).toBe(`/v1/checkout/sessions/${created.id}/line_items`);
    expect(items.data.map((item) => [item.description, item.quantity, item.amount_total])).toEqual([
      ['Half dozen, brown butter glaze', 2, 3600],
      ['Bag of doughnut holes', 1, 600],
    ]);
    expect(items.data[0]?.price?.unit_amount).toBe(1800);
  });

  it('pages line items with limit and starting_after', async () => {
    const created = await stripe.checkout.sessions.create(sessionParams());
    const first = await stripe.checkout.sessions.listLineItems(created.id, { limit: 1 });
    expect(first.has_more).toBe(true);
    const second = await stripe.checkout.sessions.listLineItems(created.id, { limit: 1, starting_after: first.data[0]!.id });
    expect(second.has_more).toBe(false);
    expect(second.data[0]?.description).toBe('Bag of doughnut holes');
  });

  it('accepts 100 line items (bracketed arrays past the parser default of 20)', async () => {
    const lines = Array.from({ length: 100 }, (_, i) => ({
      price_data: { currency: 'usd', unit_amount: 100 + i, product_data: { name: `Hole flavour ${i + 1}` } },
      quantity: 1,
    }));
    const session = await stripe.checkout.sessions.create(sessionParams({ line_items: lines }));
    // Σ (100 + i) for i = 0…99 = 100·100 + 99·100/2 = 14950 (arithmetic series).
    expect(session.amount_total).toBe(14950);
    const page = await stripe.checkout.sessions.listLineItems(session.id, { limit: 100 });
    expect(page.data).toHaveLength(100);
    expect(page.data[99]?.description).toBe('Hole flavour 100');
  });

  it('expands payment_intent and line_items on retrieve', async () => {
    const created = await stripe.checkout.sessions.create(sessionParams());
    const unpaid = await stripe.checkout.sessions.retrieve(created.id, { expand: ['payment_intent', 'line_items'] });
    expect(unpaid.payment_intent).toBeNull();
    expect(unpaid.line_items?.data).toHaveLength(2);

    expect((await paySession(fake, created.id, '4242424242424242')).status).toBe(200);
    const paid = await stripe.checkout.sessions.retrieve(created.id, { expand: ['payment_intent.latest_charge'] });
    const intent = paid.payment_intent as Stripe.PaymentIntent;
    expect(intent.object).toBe('payment_intent');
    expect(intent.status).toBe('succeeded');
    expect(intent.amount).toBe(4200);
    expect((intent.latest_charge as Stripe.Charge).object).toBe('charge');
  });

  it('refuses to expand a property that is not expandable', async () => {
    const created = await stripe.checkout.sessions.create(sessionParams());
    await expect(stripe.checkout.sessions.retrieve(created.id, { expand: ['success_url'] })).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      statusCode: 400,
    });
  });

  it('expires an open session once, announcing it, and refuses a second expiry', async () => {
    const created = await stripe.checkout.sessions.create(sessionParams());
    const expired = await stripe.checkout.sessions.expire(created.id);
    expect(expired.status).toBe('expired');
    expect(expired.url).toBeNull();
    const events = await stripe.events.list({ type: 'checkout.session.expired' });
    const announced = events.data.find((event) => (event.data.object as Stripe.Checkout.Session).id === created.id);
    expect(announced).toBeDefined();
    expect(announced?.request?.id).toBe(expired.lastResponse.requestId);

    const again = stripe.checkout.sessions.expire(created.id);
    await expect(again).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(again).rejects.toMatchObject({ statusCode: 400 });
    expect((await stripe.checkout.sessions.retrieve(created.id)).status).toBe('expired');
  });

  it('refuses to expire a paid session', async () => {
    const created = await stripe.checkout.sessions.create(sessionParams());
    await paySession(fake, created.id, '4242424242424242');
    await expect(stripe.checkout.sessions.expire(created.id)).rejects.toMatchObject({ statusCode: 400 });
    expect((await stripe.checkout.sessions.retrieve(created.id)).status).toBe('complete');
  });

  it('answers 404 resource_missing for an unknown session', async () => {
    await expect(stripe.checkout.sessions.retrieve('cs_test_nothing_here')).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      statusCode: 404,
      code: 'resource_missing',
    });
  });

  it('accepts expires_at from 30 minutes to 24 hours ahead (Stripe API reference)', async () => {
    const now = fake.now();
    const soon = await stripe.checkout.sessions.create(sessionParams({ expires_at: now + 31 * 60 }));
    expect(soon.expires_at).toBe(now + 31 * 60);
    const late = await stripe.checkout.sessions.create(sessionParams({ expires_at: now + 24 * 60 * 60 - 10 }));
    expect(late.expires_at).toBe(now + 24 * 60 * 60 - 10);
  });

  const refused: [string, Partial<Stripe.Checkout.SessionCreateParams> & Record<string, unknown>, string][] = [
    ['a mode other than payment', { mode: 'subscription' }, 'mode'],
    ['no line items', { line_items: [] }, 'line_items'],
    [
      'a line without a product name',
      { line_items: [{ price_data: { currency: 'usd', unit_amount: 500, product_data: { description: 'no name' } as unknown as { name: string } }, quantity: 1 }] },
      'line_items[0][price_data][product_data][name]',
    ],
    [
      'a negative unit amount',
      { line_items: [{ price_data: { currency: 'usd', unit_amount: -5, product_data: { name: 'x' } }, quantity: 1 }] },
      'line_items[0][price_data][unit_amount]',
    ],
    [
      'a quantity of zero',
      { line_items: [{ price_data: { currency: 'usd', unit_amount: 500, product_data: { name: 'x' } }, quantity: 0 }] },
      'line_items[0][quantity]',
    ],
    [
      'an unknown currency',
      { line_items: [{ price_data: { currency: 'zzz', unit_amount: 500, product_data: { name: 'x' } }, quantity: 1 }] },
      'line_items[0][price_data][currency]',
    ],
    ['a relative success_url', { success_url: '/thanks' }, 'success_url'],
    ['expires_at only 29 minutes ahead (Stripe API reference: at least 30 minutes)', { expires_at: 0 }, 'expires_at'],
    ['expires_at 25 hours ahead (Stripe API reference: at most 24 hours)', { expires_at: 1 }, 'expires_at'],
    ['an invalid customer_email', { customer_email: 'not-an-address' }, 'customer_email'],
    ['an unknown parameter', { glaze: 'maple' }, 'glaze'],
    ['a total under $0.50 (Stripe minimum charge amount, USD)', { line_items: singleItem(49) }, 'line_items'],
  ];

  it.each(refused)('refuses %s with 400, names the param and creates nothing', async (_label, overrides, param) => {
    const now = fake.now();
    const params = { ...overrides } as Record<string, unknown>;
    if (params.expires_at === 0) params.expires_at = now + 29 * 60;
    if (params.expires_at === 1) params.expires_at = now + 25 * 60 * 60;
    const before = await sessionCount();
    const attempt = stripe.checkout.sessions.create(sessionParams(params as Partial<Stripe.Checkout.SessionCreateParams>));
    await expect(attempt).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(attempt).rejects.toMatchObject({ statusCode: 400, param });
    expect(await sessionCount()).toBe(before);
  });

  it('lists sessions newest first and filters by status', async () => {
    const a = await stripe.checkout.sessions.create(sessionParams());
    const b = await stripe.checkout.sessions.create(sessionParams());
    await stripe.checkout.sessions.expire(a.id);
    const latest = await stripe.checkout.sessions.list({ limit: 2 });
    expect(latest.data.map((s) => s.id)).toEqual([b.id, a.id]);
    const expired = await stripe.checkout.sessions.list({ status: 'expired', limit: 100 });
    expect(expired.data.some((s) => s.id === a.id)).toBe(true);
    expect(expired.data.some((s) => s.id === b.id)).toBe(false);
  });
});
