import { afterEach, describe, expect, it } from 'vitest';
import { captureLogs, logger } from '../src/lib/logger.js';
import { every } from '../src/jobs/scheduler.js';
import { Browser, WEBHOOK_SECRET, signIn, useStack } from './support.js';
import { CARD_OK, deliverMail, halfDozen, openDay, orderAndPay } from './order-helpers.js';

const stack = useStack();
let capture: ReturnType<typeof captureLogs> | null = null;
afterEach(() => {
  capture?.stop();
  capture = null;
});

const parsed = (lines: string[]) => lines.map((l) => JSON.parse(l) as Record<string, any>);

describe('structured logs', () => {
  it('writes one JSON line per request with its id, returned in X-Request-Id and in the error body', async () => {
    capture = captureLogs('info');
    const res = await fetch(`${stack.url}/api/orders/not-an-id`, { headers: { 'x-request-id': 'trace-abc-12345' } });
    expect(res.headers.get('x-request-id')).toBe('trace-abc-12345');
    const body = (await res.json()) as any;
    expect(body.error.details.requestId).toBe('trace-abc-12345');
    const fresh = await fetch(`${stack.url}/api/bake-days`);
    const freshId = fresh.headers.get('x-request-id');
    expect(freshId).toMatch(/^[0-9a-f-]{36}$/);
    const lines = parsed(capture.lines).filter((l) => l.req);
    expect(lines.filter((l) => l.req.id === 'trace-abc-12345')).toHaveLength(1);
    expect(lines.filter((l) => l.req.id === freshId)).toHaveLength(1);
    expect(lines.find((l) => l.req.id === freshId)).toMatchObject({ level: 30, req: { method: 'GET', path: '/api/bake-days' }, res: { statusCode: 200 } });
  });

  it('keeps the card number, the webhook secret, the session cookie and the payments key out of every line of a checkout', async () => {
    capture = captureLogs('trace');
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    const day = await openDay(stack);
    const { order } = await orderAndPay(stack, customer, halfDozen(day), CARD_OK);
    expect((await customer.getJson(`/api/orders/${order.id}`)).body.status).toBe('paid');
    await deliverMail(stack);
    // hostile requests that carry the secrets where a careless logger would print them
    await customer.send('POST', '/api/orders', { ...halfDozen(day), cardNumber: CARD_OK.cardNumber, cvc: CARD_OK.cvc });
    await fetch(`${stack.url}/api/me?token=${WEBHOOK_SECRET}`, { headers: { authorization: `Bearer ${stack.config.STRIPE_SECRET_KEY}` } });
    await fetch(`${stack.url}/webhooks/payments`, { method: 'POST', headers: { 'stripe-signature': `t=1,v1=${WEBHOOK_SECRET}` }, body: '{}' });
    await fetch(`${stack.url}/api/waitlist/claims/${WEBHOOK_SECRET}`, { headers: { cookie: customer.cookieHeader() } });
    // and a log call that passes them as fields: redaction removes them
    logger.warn({ cardNumber: CARD_OK.cardNumber, secret: WEBHOOK_SECRET, headers: { cookie: customer.cookieHeader(), authorization: stack.config.STRIPE_SECRET_KEY } }, 'careless call');

    const text = capture.text();
    const cookieValue = customer.cookieHeader().split('fryline.sid=')[1]!.split(';')[0]!;
    const sessionId = decodeURIComponent(cookieValue).replace(/^s:/, '').split('.')[0]!;
    expect(cookieValue.length).toBeGreaterThan(20);
    expect(sessionId.length).toBeGreaterThan(10);
    expect(parsed(capture.lines).filter((l) => l.req).length).toBeGreaterThan(8);
    expect(text).toContain('careless call');
    expect(text).toContain('[redacted]');
    for (const secret of [CARD_OK.cardNumber, WEBHOOK_SECRET, cookieValue, sessionId, stack.config.STRIPE_SECRET_KEY, stack.config.SESSION_SECRET]) {
      expect(text).not.toContain(secret);
    }
  });

  it('logs the jobs through the same logger, with the job named on each line', async () => {
    capture = captureLogs('info');
    const stop = every('test-job', 5, async () => ({ sent: 2 }));
    await new Promise((resolve) => setTimeout(resolve, 50));
    await stop();
    const failing = every('failing-job', 5, async () => {
      throw new Error('smtp down');
    });
    await new Promise((resolve) => setTimeout(resolve, 50));
    await failing();
    const lines = parsed(capture.lines);
    expect(lines.find((l) => l.job === 'test-job')).toMatchObject({ service: 'fryline-api', level: 30, result: { sent: 2 } });
    expect(lines.find((l) => l.job === 'failing-job')).toMatchObject({ level: 50, err: { message: 'smtp down' } });
  });
});
