import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { PaymentsFake } from './server.js';
import { adminGet, adminPost, paySession, sessionParams, startFake } from './test-support/fixture.js';
import { WebhookReceiver } from './test-support/receiver.js';

let fake: PaymentsFake;
let stripe: Stripe;
let receiver: WebhookReceiver;

beforeEach(async () => {
  receiver = await WebhookReceiver.start();
  ({ fake, stripe } = await startFake({ webhookUrl: receiver.url }));
});
afterEach(async () => {
  await fake.close();
  await receiver.close();
});

describe('the fake clock', () => {
  it('expires a session when the clock passes expires_at, and announces it', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams({ expires_at: fake.now() + 30 * 60 }));
    const early = await adminPost(fake, '/clock/advance', { seconds: 30 * 60 - 10 });
    expect(early.body.expiredSessions).toEqual([]);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');

    const due = await adminPost(fake, '/clock/advance', { seconds: 10 });
    expect(due.body.expiredSessions).toEqual([session.id]);
    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after.status).toBe('expired');
    expect(after.url).toBeNull();

    const [arrival] = await receiver.waitFor(1);
    expect(arrival!.event.type).toBe('checkout.session.expired');

    const pay = await paySession(fake, session.id, '4242424242424242');
    expect(pay.status).toBe(410);
    expect((await stripe.charges.list()).data).toHaveLength(0);
  });

  it('a session without expires_at lasts 24 hours (Stripe API reference default)', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    fake.advanceClock(24 * 60 * 60 - 1);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    fake.advanceClock(1);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
  });

  it('an abandoned payment intent is canceled when its session expires', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const declined = await paySession(fake, session.id, '4000000000000002');
    fake.advanceClock(24 * 60 * 60);
    const intent = await stripe.paymentIntents.retrieve(declined.body.payment_intent.id);
    expect(intent.status).toBe('canceled');
    expect(intent.cancellation_reason).toBe('abandoned');
  });

  it('paid sessions do not expire, and charge funds become available two days later', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    await paySession(fake, session.id, '4242424242424242');
    const [txn] = (await stripe.balanceTransactions.list({ type: 'charge' })).data;
    expect(txn?.status).toBe('pending');
    expect(txn!.available_on - txn!.created).toBe(2 * 86_400);
    fake.advanceClock(2 * 86_400);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('complete');
    expect((await stripe.balanceTransactions.retrieve(txn!.id)).status).toBe('available');
  });

  it('refuses to move the clock backwards', async () => {
    const before = await adminGet(fake, '/clock');
    const back = await adminPost(fake, '/clock/advance', { seconds: -60 });
    expect(back.status).toBe(400);
    expect((await adminGet(fake, '/clock')).offsetSeconds).toBe(before.offsetSeconds);
  });
});

describe('reset', () => {
  it('forgets every object, event and setting', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    await adminPost(fake, '/webhook/mode', { copies: 2 });
    fake.advanceClock(3600);
    const reset = await adminPost(fake, '/reset', {});
    expect(reset.status).toBe(200);
    await expect(stripe.checkout.sessions.retrieve(session.id)).rejects.toMatchObject({ statusCode: 404 });
    const state = await adminGet(fake, '/state');
    expect(state).toMatchObject({ sessions: 0, events: 0, clockOffsetSeconds: 0, idempotencyKeys: 0, deliveries: 0 });
    expect(state.deliveryMode.copies).toBe(1);
    expect(state.webhook.url).toBe(receiver.url);
  });
});
