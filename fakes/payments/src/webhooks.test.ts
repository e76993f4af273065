import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { PaymentsFake } from './server.js';
import { adminGet, adminPost, paySession, sessionParams, startFake, TEST_SECRET } from './test-support/fixture.js';
import { WebhookReceiver, type Received } from './test-support/receiver.js';

let fake: PaymentsFake;
let stripe: Stripe;
let receiver: WebhookReceiver;

beforeEach(async () => {
  receiver = await WebhookReceiver.start();
  ({ fake, stripe } = await startFake({ webhookUrl: receiver.url, retryDelaysMs: [40, 80] }));
});
afterEach(async () => {
  await fake.close();
  await receiver.close();
});

async function paidSession(): Promise<Stripe.Checkout.Session> {
  const session = await stripe.checkout.sessions.create(sessionParams());
  await paySession(fake, session.id, '4242424242424242');
  return session;
}

function verify(received: Received, secret = TEST_SECRET, tolerance?: number): Stripe.Event {
  return stripe.webhooks.constructEvent(received.rawBody, received.signature, secret, tolerance);
}

describe('webhook delivery', () => {
  it('posts signed events that the SDK verifies, signed exactly as its own test header helper signs', async () => {
    const session = await paidSession();
    const [first, second] = await receiver.waitFor(2);
    for (const received of [first!, second!]) {
      const event = verify(received);
      const timestamp = Number(/t=(\d+)/.exec(received.signature)?.[1]);
      // The SDK as reference: its test helper builds the same header from payload, secret and timestamp.
      expect(received.signature).toBe(stripe.webhooks.generateTestHeaderString({ payload: received.rawBody, secret: TEST_SECRET, timestamp }));
      expect(Math.abs(timestamp - Date.now() / 1000)).toBeLessThan(5);
      expect(event).toMatchObject({ object: 'event', livemode: false, api_version: Stripe.API_VERSION, pending_webhooks: 1 });
      expect(event.id).toMatch(/^evt_/);
      expect(received.headers['content-type']).toMatch(/^application\/json/);
    }
    const events = [first!, second!].map((r) => verify(r));
    expect(events.map((e) => e.type)).toEqual(['payment_intent.succeeded', 'checkout.session.completed']);
    const completed = events[1]!.data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({ id: session.id, status: 'complete', payment_status: 'paid', metadata: { orderId: 'ord_demo_1' } });

    await fake.webhooksIdle();
    const stored = await stripe.events.retrieve(events[1]!.id);
    expect(stored.pending_webhooks).toBe(0);
    expect(fake.deliveries().every((d) => d.outcome === 'delivered' && d.attempt === 1)).toBe(true);
  });

  it('retries after non-2xx answers on the configured schedule, then stops', async () => {
    receiver.failNext(500, 503);
    const session = await stripe.checkout.sessions.create(sessionParams());
    await stripe.checkout.sessions.expire(session.id);
    const arrivals = await receiver.waitFor(3);
    await fake.webhooksIdle();
    expect(new Set(arrivals.map((r) => r.event.id)).size).toBe(1);
    const log = fake.deliveries();
    expect(log.map((d) => [d.attempt, d.httpStatus, d.outcome])).toEqual([
      [1, 500, 'failed'],
      [2, 503, 'failed'],
      [3, 200, 'delivered'],
    ]);
    expect(log.map((d) => d.nextRetryInMs)).toEqual([40, 80, null]);
    expect(arrivals[1]!.at - arrivals[0]!.at).toBeGreaterThanOrEqual(35);
    expect(arrivals[2]!.at - arrivals[1]!.at).toBeGreaterThanOrEqual(75);
    // Every attempt is signed afresh and verifies.
    for (const arrival of arrivals) expect(verify(arrival).type).toBe('checkout.session.expired');
  });

  it('gives up after the last retry and keeps the log', async () => {
    receiver.alwaysAnswer(500);
    const session = await stripe.checkout.sessions.create(sessionParams());
    await stripe.checkout.sessions.expire(session.id);
    await receiver.waitFor(3);
    await fake.webhooksIdle();
    const log = await adminGet(fake, '/deliveries');
    expect(log.data).toHaveLength(3);
    expect(log.data[2]).toMatchObject({ attempt: 3, outcome: 'failed', gaveUp: true, nextRetryInMs: null });
    expect(receiver.received).toHaveLength(3);
  });

  it('retries connection errors too', async () => {
    const closed = await WebhookReceiver.start();
    const deadUrl = closed.url;
    await closed.close();
    await adminPost(fake, '/webhook', { url: deadUrl });
    const session = await stripe.checkout.sessions.create(sessionParams());
    await stripe.checkout.sessions.expire(session.id);
    await fake.webhooksIdle();
    const log = fake.deliveries();
    expect(log).toHaveLength(3);
    expect(log.every((d) => d.httpStatus === null && d.error !== null)).toBe(true);
    expect(log[2]?.gaveUp).toBe(true);
  });

  it('the endpoint and secret can be changed at runtime', async () => {
    const other = await WebhookReceiver.start('/hooks/other');
    try {
      const changed = await adminPost(fake, '/webhook', { url: other.url, secret: 'whsec_rotated_value' });
      expect(changed.body).toMatchObject({ url: other.url, secret: 'whsec_rotated_value' });
      await paidSession();
      const [arrival] = await other.waitFor(1);
      expect(verify(arrival!, 'whsec_rotated_value').type).toBe('payment_intent.succeeded');
      expect(() => verify(arrival!)).toThrow(Stripe.errors.StripeSignatureVerificationError);
      expect(receiver.received).toHaveLength(0);
    } finally {
      await other.close();
    }
  });

  it('refuses a bad admin setting and changes nothing', async () => {
    const bad = await adminPost(fake, '/webhook', { url: 'ftp://nowhere' });
    expect(bad.status).toBe(400);
    expect((await adminGet(fake, '/webhook')).url).toBe(receiver.url);
    const badMode = await adminPost(fake, '/webhook/mode', { copies: 0 });
    expect(badMode.status).toBe(400);
    expect((await adminGet(fake, '/webhook/mode')).copies).toBe(1);
  });
});

describe('delivery switches', () => {
  it('copies: each event arrives N times, one after another', async () => {
    receiver.responseDelayMs = 20;
    await adminPost(fake, '/webhook/mode', { copies: 3 });
    await paidSession();
    await receiver.waitFor(6);
    await fake.webhooksIdle();
    expect(receiver.received).toHaveLength(6);
    expect(receiver.types()).toEqual([
      'payment_intent.succeeded',
      'payment_intent.succeeded',
      'payment_intent.succeeded',
      'checkout.session.completed',
      'checkout.session.completed',
      'checkout.session.completed',
    ]);
    expect(new Set(receiver.received.map((r) => r.event.id)).size).toBe(2);
    expect(receiver.maxInFlight).toBe(1);
  });

  it('concurrent: the copies arrive at the same time', async () => {
    receiver.responseDelayMs = 150;
    await adminPost(fake, '/webhook/mode', { copies: 3, concurrent: true });
    await paidSession();
    await receiver.waitFor(6);
    expect(receiver.maxInFlight).toBe(3);
  });

  it('shuffle: the events of one action arrive in varying order', async () => {
    await adminPost(fake, '/webhook/mode', { shuffle: true });
    const rounds = 16;
    for (let i = 0; i < rounds; i += 1) await paidSession();
    await receiver.waitFor(rounds * 2);
    const firsts = receiver.received.filter((_, i) => i % 2 === 0).map((r) => r.event.type);
    // Each action yields two events; across 16 shuffled pairs both orders show up (chance of one order only: 2 × 2⁻¹⁶).
    expect(new Set(firsts).size).toBe(2);
  });

  it('wrong secret: the SDK rejects the signature', async () => {
    await adminPost(fake, '/webhook/mode', { wrongSecret: true });
    await paidSession();
    const [arrival] = await receiver.waitFor(1);
    expect(() => verify(arrival!)).toThrow(/No signatures found matching the expected signature/);
  });

  it('stale timestamp: signed 10 minutes ago, outside the SDK default tolerance of 300 s', async () => {
    await adminPost(fake, '/webhook/mode', { staleTimestamp: true });
    await paidSession();
    const [arrival] = await receiver.waitFor(1);
    const timestamp = Number(/t=(\d+)/.exec(arrival!.signature)?.[1]);
    expect(Date.now() / 1000 - timestamp).toBeGreaterThanOrEqual(599);
    expect(() => verify(arrival!)).toThrow(/Timestamp outside the tolerance zone/);
    // The signature itself is right: a wide tolerance accepts it.
    expect(verify(arrival!, TEST_SECRET, 3600).type).toBe('payment_intent.succeeded');
  });

  it('fail first N: those attempts are sent but count as failed, so the events come again', async () => {
    await adminPost(fake, '/webhook/mode', { failFirst: 2 });
    await paidSession();
    await receiver.waitFor(4);
    await fake.webhooksIdle();
    const log = fake.deliveries();
    expect(log.filter((d) => d.forcedFailure)).toHaveLength(2);
    expect(log.filter((d) => d.outcome === 'delivered')).toHaveLength(2);
    expect(receiver.received).toHaveLength(4);
    expect((await adminGet(fake, '/webhook/mode')).forcedFailuresLeft).toBe(0);
  });

  it('delay: each attempt waits before it is sent', async () => {
    await adminPost(fake, '/webhook/mode', { delayMs: 200 });
    const started = Date.now();
    await paidSession();
    const [arrival] = await receiver.waitFor(1);
    expect(arrival!.at - started).toBeGreaterThanOrEqual(195);
  });

  it('drop: events are recorded and listed but never sent', async () => {
    await adminPost(fake, '/webhook/mode', { drop: true });
    const session = await paidSession();
    await fake.webhooksIdle();
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(receiver.received).toHaveLength(0);
    expect(fake.deliveries().map((d) => d.outcome)).toEqual(['dropped', 'dropped']);
    const listed = await stripe.events.list({ type: 'checkout.session.completed' });
    expect((listed.data[0]?.data.object as Stripe.Checkout.Session).id).toBe(session.id);
  });

  it('a dropped event can be sent again from the admin route', async () => {
    await adminPost(fake, '/webhook/mode', { drop: true });
    await paidSession();
    await fetch(`${fake.url}/__admin/webhook/mode`, { method: 'DELETE' });
    const [event] = fake.events();
    const resent = await adminPost(fake, `/events/${event!.id}/redeliver`, {});
    expect(resent.status).toBe(202);
    const [arrival] = await receiver.waitFor(1);
    expect(verify(arrival!).id).toBe(event!.id);
  });
});
