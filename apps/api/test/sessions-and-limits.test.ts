import type { ChildProcess } from 'node:child_process';
import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { database } from '../src/db/sequelize.js';
import { Browser, signIn, spawnApi, useStack } from './support.js';
import { openDay } from './order-helpers.js';

// Sessions only when needed, CSRF decided by the session the middleware found,
// and rate limits counted in PostgreSQL so every API process shares them.
const SIGN_IN_LIMIT = 4;
const ORDER_LIMIT = 3;
const stack = useStack({ env: { RATE_LIMIT_SIGNIN: String(SIGN_IN_LIMIT), RATE_LIMIT_ORDERS: String(ORDER_LIMIT) } });
const children: ChildProcess[] = [];
afterAll(() => {
  for (const child of children) child.kill('SIGTERM');
});

const sessionRows = async () =>
  (await database().query<{ n: number }>(`SELECT count(*)::int AS n FROM "session"`, { type: QueryTypes.SELECT }))[0]!.n;

describe('sessions', () => {
  it('an anonymous visitor browsing the shop and asking for a token creates no session row', async () => {
    const day = await openDay(stack);
    const visitor = new Browser(stack.url);
    for (const path of ['/', '/api/bake-days', `/api/bake-days/${day.id}`, '/api/csrf', '/api/me', '/api/csrf']) {
      const res = await visitor.fetch(path);
      expect(res.status).toBeLessThan(500);
      expect(res.headers.getSetCookie().some((c) => c.startsWith('fryline.sid='))).toBe(false);
    }
    // a state-changing request without a session is refused for want of a sign-in, and makes no row either
    const order = await visitor.send('POST', '/api/orders', { bakeDayId: day.id });
    expect(order.status).toBe(401);
    expect(await sessionRows()).toBe(0);
  });

  it('starting sign-in makes a short-lived session (the sign-in state), signing in a 30-day one', async () => {
    const browser = new Browser(stack.url);
    const start = await browser.fetch('/auth/google');
    const cookie = start.headers.getSetCookie().find((c) => c.startsWith('fryline.sid='))!;
    const expires = Date.parse(/Expires=([^;]+)/i.exec(cookie)![1]!);
    expect(expires - Date.now()).toBeLessThanOrEqual(15 * 60_000 + 5_000);
    await signIn(browser, 'customer@fryline.test');
    const [row] = await database().query<{ expire: Date }>(`SELECT expire FROM "session" ORDER BY expire DESC LIMIT 1`, { type: QueryTypes.SELECT });
    expect(row!.expire.getTime() - Date.now()).toBeGreaterThan(29 * 24 * 3600_000);
  });

  it('CSRF: a session cookie written with a space before "=" still needs the token (the session middleware finds the session)', async () => {
    const browser = new Browser(stack.url);
    await signIn(browser, 'customer@fryline.test');
    const [name, value] = browser.cookieHeader().split(/=(.*)/s);
    const odd = `${name} =${value}`;
    const me = await fetch(`${stack.url}/api/me`, { headers: { cookie: odd } });
    expect(me.status).toBe(200);
    const logout = await fetch(`${stack.url}/auth/logout`, { method: 'POST', headers: { cookie: odd } });
    expect(logout.status).toBe(403);
    expect((await browser.getJson('/api/me')).status).toBe(200);
  });
});

describe('rate limits (counted in PostgreSQL)', () => {
  it('sign-in: the limit is shared by two API processes; over it, 429 with Retry-After', async () => {
    const second = await spawnApi(stack, { RATE_LIMIT_SIGNIN: String(SIGN_IN_LIMIT) });
    children.push(second.child);
    const statuses: number[] = [];
    let limited: Response | null = null;
    for (let i = 0; i < SIGN_IN_LIMIT + 2; i += 1) {
      const res = await fetch(`${i % 2 === 0 ? stack.url : second.url}/auth/google`, { redirect: 'manual' });
      statuses.push(res.status);
      if (res.status === 429) limited ??= res;
    }
    // four starts in all, alternating between the processes, then refused on both
    expect(statuses).toEqual([302, 302, 302, 302, 429, 429]);
    expect(Number(limited!.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(((await limited!.json()) as any).error.code).toBe('rate_limited');
  });

  it('order creation: per customer, 429 with Retry-After past the limit', async () => {
    const day = await openDay(stack);
    const browser = new Browser(stack.url);
    await signIn(browser, 'customer@fryline.test');
    const statuses: number[] = [];
    for (let i = 0; i < ORDER_LIMIT + 1; i += 1) {
      // invalid bodies still count: the limit is on attempts
      statuses.push((await browser.send('POST', '/api/orders', { bakeDayId: day.id, boxes: [] })).status);
    }
    expect(statuses.slice(0, ORDER_LIMIT).every((s) => s === 400)).toBe(true);
    expect(statuses[ORDER_LIMIT]).toBe(429);
    // another customer has a count of their own
    const other = new Browser(stack.url);
    await signIn(other, 'another.customer@example.test');
    expect((await other.send('POST', '/api/orders', { bakeDayId: day.id, boxes: [] })).status).toBe(400);
  });
});
