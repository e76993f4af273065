import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PaymentsFake } from './server.js';
import { sessionParams, startFake } from './test-support/fixture.js';

let fake: PaymentsFake;
let stripe: Stripe;

beforeAll(async () => {
  ({ fake, stripe } = await startFake());
});
afterAll(() => fake.close());

function submit(url: string, fields: Record<string, string>): Promise<Response> {
  return fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(fields).toString(),
    redirect: 'manual',
  });
}

const card = (cardNumber: string) => ({ cardNumber, expiry: '12 / 34', cvc: '123', name: 'June Ortolan' });

async function openSession(overrides: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  const session = await stripe.checkout.sessions.create(sessionParams(overrides));
  return { session, url: session.url as string };
}

async function chargeCount(): Promise<number> {
  return (await stripe.charges.list({ limit: 100 })).data.length;
}

describe('hosted pay page', () => {
  it('shows the line items, the total, a card form and a way back, with no outside assets', async () => {
    const { session, url } = await openSession();
    const response = await fetch(url);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/text\/html/);
    const html = await response.text();
    expect(html).toContain('Half dozen, brown butter glaze');
    expect(html).toContain('Bag of doughnut holes');
    expect(html).toContain('$42.00');
    expect(html).toContain(`action="/pay/${session.id}"`);
    for (const name of ['cardNumber', 'expiry', 'cvc']) expect(html).toContain(`name="${name}"`);
    expect(html).toContain('href="https://shop.fryline.test/box"');
    expect(html).not.toMatch(/<script|<link|<img|url\(/i);
  });

  it('escapes product names', async () => {
    const { url } = await openSession({
      line_items: [{ price_data: { currency: 'usd', unit_amount: 900, product_data: { name: '<b>Maple & "bacon"</b>' } }, quantity: 1 }],
    });
    const html = await (await fetch(url)).text();
    expect(html).toContain('&#60;b&#62;Maple &#38; &#34;bacon&#34;&#60;/b&#62;');
    expect(html).not.toContain('<b>Maple');
  });

  it('a good card redirects (303) to success_url with the session id filled in', async () => {
    const { session, url } = await openSession();
    const response = await submit(url, card('4242 4242 4242 4242'));
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe(`https://shop.fryline.test/orders/thanks?session=${session.id}`);
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('paid');
  });

  it('a decline re-renders the form with 402 and the message; the session stays open (Stripe testing docs card)', async () => {
    const { session, url } = await openSession();
    const response = await submit(url, card('4000 0000 0000 0002'));
    expect(response.status).toBe(402);
    const html = await response.text();
    expect(html).toContain('Your card was declined.');
    expect(html).toContain('role="alert"');
    expect(html).toContain('value="4000 0000 0000 0002"');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect((await fetch(url)).status).toBe(200);
  });

  it('the extra confirmation card shows a confirmation step; confirming pays (Stripe testing docs card)', async () => {
    const { session, url } = await openSession();
    const step = await submit(url, card('4000002500003155'));
    expect(step.status).toBe(200);
    const html = await step.text();
    expect(html).toContain('Confirm payment');
    expect(html).toContain('Fail confirmation');
    expect(html).toContain(`action="/pay/${session.id}/confirm"`);
    // Reloading the page keeps the confirmation step.
    expect(await (await fetch(url)).text()).toContain('Confirm payment');

    const done = await submit(`${url}/confirm`, { result: 'complete' });
    expect(done.status).toBe(303);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('complete');
  });

  it('failing the confirmation step re-renders the form with 402', async () => {
    const { session, url } = await openSession();
    await submit(url, card('4000002500003155'));
    const failed = await submit(`${url}/confirm`, { result: 'fail' });
    expect(failed.status).toBe(402);
    expect(await failed.text()).toContain('unable to authenticate');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
  });

  it('a paid session shows a clear page and is not charged again', async () => {
    const { url } = await openSession();
    await submit(url, card('4242424242424242'));
    const view = await fetch(url);
    expect(view.status).toBe(200);
    expect(await view.text()).toContain('already paid');
    const before = await chargeCount();
    const again = await submit(url, card('4242424242424242'));
    expect(again.status).toBe(409);
    expect(await chargeCount()).toBe(before);
  });

  it('an expired session shows a clear page and is not charged', async () => {
    const { session, url } = await openSession();
    await stripe.checkout.sessions.expire(session.id);
    const view = await fetch(url);
    expect(view.status).toBe(410);
    expect(await view.text()).toContain('expired');
    const before = await chargeCount();
    expect((await submit(url, card('4242424242424242'))).status).toBe(410);
    expect(await chargeCount()).toBe(before);
  });

  it('an unknown session is a 404 page', async () => {
    const response = await fetch(`${fake.url}/pay/cs_test_unknown`);
    expect(response.status).toBe(404);
    expect(await response.text()).toContain('not valid');
  });

  it('asks for an email when the session has none, and records it', async () => {
    const { session, url } = await openSession();
    expect(await (await fetch(url)).text()).toContain('name="email"');
    await submit(url, { ...card('4242424242424242'), email: 'crumb@example.test' });
    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after.customer_details?.email).toBe('crumb@example.test');
    expect(after.customer_details?.name).toBe('June Ortolan');
  });
});
