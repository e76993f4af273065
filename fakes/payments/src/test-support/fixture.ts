import Stripe from 'stripe';
import { startPaymentsFake, type PaymentsFake, type PaymentsFakeOptions } from '../server.js';

export const TEST_KEY = 'sk_test_fryline_payments_fake';
export const TEST_SECRET = 'whsec_fryline_test_signing';

/** The official SDK pointed at the fake, configured as the app configures it. */
export function stripeFor(fake: PaymentsFake, key = TEST_KEY): Stripe {
  return new Stripe(key, {
    host: '127.0.0.1',
    port: fake.port,
    protocol: 'http',
    maxNetworkRetries: 1,
    timeout: 5000,
    telemetry: false,
  });
}

export async function startFake(options: PaymentsFakeOptions = {}): Promise<{ fake: PaymentsFake; stripe: Stripe }> {
  const fake = await startPaymentsFake({ port: 0, webhookSecret: TEST_SECRET, ...options });
  return { fake, stripe: stripeFor(fake) };
}

/** Our own demo order: a half dozen glazed rings and a bag of doughnut holes. */
export const DEMO_LINE_ITEMS = [
  { price_data: { currency: 'usd', unit_amount: 1800, product_data: { name: 'Half dozen, brown butter glaze' } }, quantity: 2 },
  { price_data: { currency: 'usd', unit_amount: 600, product_data: { name: 'Bag of doughnut holes' } }, quantity: 1 },
];

export function sessionParams(overrides: Partial<Stripe.Checkout.SessionCreateParams> = {}): Stripe.Checkout.SessionCreateParams {
  return {
    mode: 'payment',
    line_items: DEMO_LINE_ITEMS,
    success_url: 'https://shop.fryline.test/orders/thanks?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'https://shop.fryline.test/box',
    metadata: { orderId: 'ord_demo_1' },
    ...overrides,
  };
}

/** A session for a single line of `amount` cents. */
export function singleItem(amount: number): Stripe.Checkout.SessionCreateParams['line_items'] {
  return [{ price_data: { currency: 'usd', unit_amount: amount, product_data: { name: 'Catering tray' } }, quantity: 1 }];
}

export async function adminPost(fake: PaymentsFake, path: string, body: unknown): Promise<{ status: number; body: any }> {
  const response = await fetch(`${fake.url}/__admin${path}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(body),
  });
  return { status: response.status, body: await response.json() };
}

export async function adminGet(fake: PaymentsFake, path: string): Promise<any> {
  const response = await fetch(`${fake.url}/__admin${path}`);
  return response.json();
}

/** Pays a session through the admin route, as API tests do. */
export function paySession(fake: PaymentsFake, sessionId: string, cardNumber: string, extra: Record<string, unknown> = {}) {
  return adminPost(fake, `/sessions/${sessionId}/pay`, { cardNumber, ...extra });
}
