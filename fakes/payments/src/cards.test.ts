import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PaymentsFake } from './server.js';
import { adminPost, paySession, sessionParams, singleItem, startFake } from './test-support/fixture.js';

let fake: PaymentsFake;
let stripe: Stripe;

beforeAll(async () => {
  ({ fake, stripe } = await startFake());
});
afterAll(() => fake.close());

async function failedEventsFor(intentId: string): Promise<Stripe.Event[]> {
  const events = await stripe.events.list({ type: 'payment_intent.payment_failed', limit: 100 });
  return events.data.filter((event) => (event.data.object as Stripe.PaymentIntent).id === intentId);
}

describe('published test cards decide the outcome', () => {
  it('4242 4242 4242 4242 succeeds (Stripe testing docs)', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const paid = await paySession(fake, session.id, '4242424242424242');
    expect(paid.status).toBe(200);
    expect(paid.body.redirectUrl).toBe(`https://shop.fryline.test/orders/thanks?session=${session.id}`);

    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after.status).toBe('complete');
    expect(after.payment_status).toBe('paid');
    expect(after.url).toBeNull();
    const intent = await stripe.paymentIntents.retrieve(after.payment_intent as string);
    expect(intent.status).toBe('succeeded');
    expect(intent.amount_received).toBe(4200);
    const charge = await stripe.charges.retrieve(intent.latest_charge as string);
    expect(charge.status).toBe('succeeded');
    expect(charge.paid).toBe(true);
    expect(charge.amount).toBe(4200);
    expect(charge.payment_method_details?.card?.last4).toBe('4242');
    expect(charge.payment_method_details?.card?.brand).toBe('visa');

    const types = (await stripe.events.list({ limit: 100 })).data
      .filter((event) => [session.id, intent.id].includes((event.data.object as { id: string }).id))
      .map((event) => event.type);
    expect(types.sort()).toEqual(['checkout.session.completed', 'payment_intent.succeeded']);
  });

  const declines: [string, string, string, string][] = [
    ['4000000000000002', 'card_declined', 'generic_decline', 'Your card was declined.'],
    ['4000000000009995', 'card_declined', 'insufficient_funds', 'Your card has insufficient funds.'],
    ['4000000000000069', 'expired_card', 'expired_card', 'Your card has expired.'],
    ['4000000000000127', 'incorrect_cvc', 'incorrect_cvc', "Your card's security code is incorrect."],
    ['4000000000000119', 'processing_error', 'processing_error', 'An error occurred while processing your card. Try again in a little bit.'],
  ];

  it.each(declines)('%s is declined with %s / %s (Stripe testing docs)', async (card, code, declineCode, message) => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const attempt = await paySession(fake, session.id, card);
    expect(attempt.status).toBe(402);
    expect(attempt.body.error).toMatchObject({ type: 'card_error', code, decline_code: declineCode, message });

    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after.status).toBe('open');
    expect(after.payment_status).toBe('unpaid');
    expect(after.payment_intent).toBeNull();

    const intentId = attempt.body.payment_intent.id as string;
    const intent = await stripe.paymentIntents.retrieve(intentId, { expand: ['latest_charge'] });
    expect(intent.status).toBe('requires_payment_method');
    expect(intent.last_payment_error).toMatchObject({ code, decline_code: declineCode });
    const charge = intent.latest_charge as Stripe.Charge;
    expect(charge.status).toBe('failed');
    expect(charge.failure_code).toBe(code);
    expect(charge.balance_transaction).toBeNull();
    expect(await failedEventsFor(intentId)).toHaveLength(1);
  });

  it('a declined session stays payable and a retry with 4242 pays it (Stripe testing docs cards)', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const first = await paySession(fake, session.id, '4000000000009995');
    expect(first.status).toBe(402);
    const second = await paySession(fake, session.id, '4242424242424242');
    expect(second.status).toBe(200);
    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after.payment_status).toBe('paid');
    // One payment intent carries both attempts.
    expect(after.payment_intent).toBe(first.body.payment_intent.id);
    const charges = await stripe.charges.list({ payment_intent: after.payment_intent as string });
    expect(charges.data.map((c) => c.status)).toEqual(['succeeded', 'failed']);
  });

  it('4000 0025 0000 3155 asks for an extra confirmation; confirming pays (Stripe testing docs)', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const pending = await paySession(fake, session.id, '4000002500003155', { authentication: 'pending' });
    expect(pending.status).toBe(202);
    expect(pending.body.payment_intent.status).toBe('requires_action');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');

    const confirmed = await adminPost(fake, `/sessions/${session.id}/confirm`, { result: 'complete' });
    expect(confirmed.status).toBe(200);
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('paid');
  });

  it('4000 0025 0000 3155 with a failed confirmation is declined and the session stays open (Stripe testing docs)', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const failed = await paySession(fake, session.id, '4000002500003155', { authentication: 'fail' });
    expect(failed.status).toBe(402);
    expect(failed.body.error.code).toBe('payment_intent_authentication_failure');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect(await failedEventsFor(failed.body.payment_intent.id)).toHaveLength(1);
  });

  it('declines any other well-formed card number (4111 1111 1111 1111, from memory a network test number)', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const attempt = await paySession(fake, session.id, '4111111111111111');
    expect(attempt.status).toBe(402);
    expect(attempt.body.error.code).toBe('card_declined');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('refuses a number that fails the Luhn check (ISO/IEC 7812-1 check digit) without creating a payment', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const before = (await stripe.paymentIntents.list({ limit: 100 })).data.length;
    const attempt = await paySession(fake, session.id, '4242424242424241');
    expect(attempt.status).toBe(402);
    expect(attempt.body.error.code).toBe('incorrect_number');
    expect(attempt.body.payment_intent).toBeNull();
    expect((await stripe.paymentIntents.list({ limit: 100 })).data.length).toBe(before);
  });

  it('refuses an expiry date in the past on the fake clock', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const attempt = await paySession(fake, session.id, '4242424242424242', { expiry: '01/20' });
    expect(attempt.status).toBe(402);
    expect(attempt.body.error.code).toBe('invalid_expiry_year');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('will not charge a paid session twice', async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    await paySession(fake, session.id, '4242424242424242');
    const again = await paySession(fake, session.id, '4242424242424242');
    expect(again.status).toBe(409);
    const intent = (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string;
    expect((await stripe.charges.list({ payment_intent: intent })).data).toHaveLength(1);
  });
});

describe('fees on the balance transaction', () => {
  async function balanceFor(amount: number): Promise<Stripe.BalanceTransaction> {
    const session = await stripe.checkout.sessions.create(sessionParams({ line_items: singleItem(amount) }));
    await paySession(fake, session.id, '4242424242424242');
    const intent = await stripe.paymentIntents.retrieve((await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string);
    const charge = await stripe.charges.retrieve(intent.latest_charge as string, { expand: ['balance_transaction'] });
    return charge.balance_transaction as Stripe.BalanceTransaction;
  }

  it('a $100 charge pays a $3.20 fee and nets $96.80 (Stripe published pricing: 2.9 % + 30¢)', async () => {
    const txn = await balanceFor(10_000);
    expect(txn.type).toBe('charge');
    expect(txn.amount).toBe(10_000);
    expect(txn.fee).toBe(320);
    expect(txn.net).toBe(9_680);
    expect(txn.fee_details).toEqual([expect.objectContaining({ amount: 320, type: 'stripe_fee' })]);
  });

  it('charging $103.30 nets $100.00 (Stripe published pricing, derived check value)', async () => {
    const txn = await balanceFor(10_330);
    expect(txn.fee).toBe(330);
    expect(txn.net).toBe(10_000);
  });

  it('lists balance transactions, filterable by source', async () => {
    const txn = await balanceFor(2_000);
    const listed = await stripe.balanceTransactions.list({ source: txn.source as string });
    expect(listed.data.map((t) => t.id)).toEqual([txn.id]);
    // $20.00 × 2.9 % = 58¢, + 30¢ (Stripe published pricing).
    expect(listed.data[0]?.fee).toBe(88);
  });
});
