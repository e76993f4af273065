import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PaymentsFake } from './server.js';
import { paySession, sessionParams, startFake, stripeFor, TEST_KEY } from './test-support/fixture.js';

interface ErrorBody {
  error: Record<string, unknown>;
}

let fake: PaymentsFake;
let stripe: Stripe;

beforeAll(async () => {
  ({ fake, stripe } = await startFake());
});
afterAll(() => fake.close());

describe('authentication', () => {
  it('a key that is not a test secret key is refused with 401, which the SDK maps to StripeAuthenticationError', async () => {
    const live = stripeFor(fake, 'sk_live_51NotOurs');
    const attempt = live.checkout.sessions.create(sessionParams());
    await expect(attempt).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    await expect(attempt).rejects.toMatchObject({ statusCode: 401, requestId: expect.stringMatching(/^req_/) });
    const publishable = stripeFor(fake, 'pk_test_123');
    await expect(publishable.events.list()).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });

  it('a request without a key is refused with 401 and the error body shape', async () => {
    const response = await fetch(`${fake.url}/v1/events`);
    expect(response.status).toBe(401);
    expect(response.headers.get('request-id')).toMatch(/^req_/);
    const body = (await response.json()) as ErrorBody;
    expect(body.error.type).toBe('invalid_request_error');
    expect(typeof body.error.message).toBe('string');
  });
});

describe('error bodies', () => {
  it('an unknown URL is 404 invalid_request_error', async () => {
    const response = await fetch(`${fake.url}/v1/doughnuts`, { headers: { Authorization: `Bearer ${TEST_KEY}` } });
    expect(response.status).toBe(404);
    expect(((await response.json()) as ErrorBody).error).toMatchObject({ type: 'invalid_request_error', message: expect.stringContaining('/v1/doughnuts') });
  });

  it('a bad parameter names it: { error: { type, code, message, param } } plus Request-Id', async () => {
    const response = await fetch(`${fake.url}/v1/checkout/sessions`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${TEST_KEY}`, 'Content-Type': 'application/x-www-form-urlencoded' },
      body: 'mode=payment&success_url=https://shop.fryline.test/ok&line_items[0][quantity]=two&line_items[0][price_data][currency]=usd&line_items[0][price_data][unit_amount]=500&line_items[0][price_data][product_data][name]=Ring',
    });
    expect(response.status).toBe(400);
    expect(response.headers.get('request-id')).toMatch(/^req_/);
    expect(((await response.json()) as ErrorBody).error).toEqual({
      type: 'invalid_request_error',
      code: 'parameter_invalid',
      message: 'Invalid integer: two',
      param: 'line_items[0][quantity]',
    });
  });
});

describe('idempotency keys', () => {
  it('a failed validation is not remembered, so the corrected request may reuse the key', async () => {
    const key = 'fix-and-retry-1';
    await expect(stripe.checkout.sessions.create(sessionParams({ success_url: 'nope' }), { idempotencyKey: key })).rejects.toMatchObject({ statusCode: 400 });
    const created = await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: key });
    expect(created.status).toBe('open');
  });

  it('replays the first answer, including a card-free session create', async () => {
    const a = await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: 'same-create' });
    const b = await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: 'same-create' });
    expect(b.id).toBe(a.id);
    expect(b.lastResponse.idempotencyKey).toBe('same-create');
  });

  it('forgets a key after 24 hours on the fake clock (Stripe docs: keys are kept at least 24 hours)', async () => {
    const own = await startFake();
    try {
      const first = await own.stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: 'day-old' });
      own.fake.advanceClock(24 * 60 * 60);
      const second = await own.stripe.checkout.sessions.create(sessionParams({ client_reference_id: 'other' }), { idempotencyKey: 'day-old' });
      expect(second.id).not.toBe(first.id);
    } finally {
      await own.fake.close();
    }
  });

  it('keys are scoped to the API key', async () => {
    const a = await stripe.checkout.sessions.create(sessionParams(), { idempotencyKey: 'per-account' });
    const other = stripeFor(fake, 'sk_test_another_account');
    const b = await other.checkout.sessions.create(sessionParams({ client_reference_id: 'x' }), { idempotencyKey: 'per-account' });
    expect(b.id).not.toBe(a.id);
  });
});

describe('events list', () => {
  it('pages newest first with limit and starting_after, and filters by type and created[gte]', async () => {
    const own = await startFake();
    try {
      const s = own.stripe;
      const ids: string[] = [];
      for (let i = 0; i < 3; i += 1) {
        const session = await s.checkout.sessions.create(sessionParams());
        await paySession(own.fake, session.id, '4242424242424242');
        ids.push(session.id);
      }
      const page1 = await s.events.list({ limit: 4 });
      expect(page1).toMatchObject({ object: 'list', has_more: true, url: '/v1/events' });
      expect(page1.data).toHaveLength(4);
      const page2 = await s.events.list({ limit: 4, starting_after: page1.data[3]!.id });
      expect(page2.has_more).toBe(false);
      expect(page2.data).toHaveLength(2);
      const all = await s.events.list({ limit: 100 }).autoPagingToArray({ limit: 100 });
      expect(all.map((e) => e.id)).toEqual([...page1.data, ...page2.data].map((e) => e.id));

      const completed = await s.events.list({ type: 'checkout.session.completed' });
      expect(completed.data.map((e) => (e.data.object as Stripe.Checkout.Session).id)).toEqual([...ids].reverse());
      const wildcard = await s.events.list({ type: 'checkout.session.*' });
      expect(wildcard.data).toHaveLength(3);

      const later = own.fake.now() + 60;
      own.fake.advanceClock(120);
      const fresh = await s.checkout.sessions.create(sessionParams());
      await s.checkout.sessions.expire(fresh.id);
      const recent = await s.events.list({ created: { gte: later } });
      expect(recent.data.map((e) => e.type)).toEqual(['checkout.session.expired']);

      const one = await s.events.retrieve(recent.data[0]!.id);
      expect(one).toMatchObject({ object: 'event', livemode: false, type: 'checkout.session.expired' });
      await expect(s.events.retrieve('evt_missing')).rejects.toMatchObject({ statusCode: 404 });
    } finally {
      await own.fake.close();
    }
  });

  it('refuses a starting_after that names no listed object, and a limit over 100', async () => {
    await expect(stripe.events.list({ starting_after: 'evt_nope' })).rejects.toMatchObject({ statusCode: 404 });
    await expect(stripe.events.list({ limit: 101 })).rejects.toMatchObject({ statusCode: 400, param: 'limit' });
  });
});
