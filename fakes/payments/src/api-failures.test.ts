import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import Stripe from 'stripe';
import type { PaymentsFake } from './server.js';
import { adminPost, paySession, sessionParams, singleItem, startFake } from './test-support/fixture.js';

let fake: PaymentsFake;
let stripe: Stripe;
beforeAll(async () => {
  ({ fake, stripe } = await startFake());
});
afterAll(() => fake.close());

async function paidIntent(amount: number): Promise<string> {
  const session = await stripe.checkout.sessions.create(sessionParams({ line_items: singleItem(amount) }));
  return (await paySession(fake, session.id, '4242424242424242')).body.payment_intent.id;
}

describe('injected API failures', () => {
  it('"after": the refund is made but both answers are lost; the same key later replays it, so there is one refund', async () => {
    const intent = await paidIntent(3250);
    // two failures: the first attempt and the SDK's own retry
    expect((await adminPost(fake, '/api-failures', { count: 2, path: '/refunds', mode: 'after' })).status).toBe(200);
    await expect(stripe.refunds.create({ payment_intent: intent, amount: 1000 }, { idempotencyKey: 'lost-answer' })).rejects.toBeInstanceOf(Stripe.errors.StripeConnectionError);
    const again = await stripe.refunds.create({ payment_intent: intent, amount: 1000 }, { idempotencyKey: 'lost-answer' });
    expect(again.amount).toBe(1000);
    expect((await stripe.refunds.list({ payment_intent: intent })).data).toHaveLength(1);
  });

  it('"before": 500 without doing anything', async () => {
    const intent = await paidIntent(3250);
    await adminPost(fake, '/api-failures', { count: 2, path: '/refunds', mode: 'before' });
    await expect(stripe.refunds.create({ payment_intent: intent, amount: 1000 })).rejects.toMatchObject({ type: 'StripeAPIError', statusCode: 500 });
    expect((await stripe.refunds.list({ payment_intent: intent })).data).toHaveLength(0);
  });

  it('refuses a bad switch', async () => {
    expect((await adminPost(fake, '/api-failures', { count: 1, mode: 'sometimes' })).status).toBe(400);
  });
});
