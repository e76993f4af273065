import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { User, OutboxMessage } from '../src/db/models/index.js';
import { database } from '../src/db/sequelize.js';
import { Browser, signIn, useStack } from './support.js';

const stack = useStack();

describe('sign-in through the provider (OAuth 2.0 authorization code + PKCE, RFC 6749 / RFC 7636)', () => {
  for (const [email, role] of [
    ['owner@fryline.test', 'owner'],
    ['baker@fryline.test', 'baker'],
    ['counter@fryline.test', 'counter'],
    ['customer@fryline.test', 'customer'],
  ] as const) {
    it(`signs ${email} in as ${role} and returns to the page asked for`, async () => {
      const browser = new Browser(stack.url);
      const result = await signIn(browser, email, { returnTo: role === 'customer' ? '/orders' : '/staff/' });
      expect(result.status).toBe(303);
      expect(result.location).toBe(role === 'customer' ? '/orders' : '/staff/');
      const me = await browser.getJson('/api/me');
      expect(me.status).toBe(200);
      expect(me.body).toMatchObject({ email, role });
      // the demo account is now linked to the provider's stable subject id
      const user = await User.findOne({ where: { email } });
      expect(user?.googleSub).toMatch(/^\d{21}$/);
    });
  }

  it('sets the session cookie HttpOnly and SameSite=Lax (not Secure over plain http)', async () => {
    // the first cookie comes with the start of sign-in (an anonymous visitor gets none)
    const res = await fetch(`${stack.url}/auth/google`, { redirect: 'manual' });
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith('fryline.sid='))!;
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Lax/i);
    expect(cookie).not.toMatch(/; Secure/i);
  });

  it('regenerates the session id at sign-in (no session fixation)', async () => {
    const browser = new Browser(stack.url);
    await browser.fetch('/auth/google');
    const before = browser.cookieHeader();
    expect(before).toMatch(/^fryline\.sid=/);
    await signIn(browser, 'baker@fryline.test');
    expect(browser.cookieHeader()).not.toBe(before);
  });

  it("pages and files answer without a session cookie, so one answered late can't undo a sign-in", async () => {
    // The staff app's service worker fetches its files in the background while the person signs in.
    // A file asked for with the sign-in's starting cookie and answered after the sign-in had set the
    // new one would, if it re-sent the old cookie (sessions roll), sign the person out again.
    const browser = new Browser(stack.url);
    await browser.fetch('/auth/google?returnTo=%2Fstaff%2F');
    const startCookie = browser.cookieHeader();
    expect(startCookie).toMatch(/^fryline\.sid=/);
    for (const path of ['/staff/', '/staff/pickups', '/staff/index.html', '/', '/orders']) {
      const res = await fetch(`${stack.url}${path}`, { headers: { cookie: startCookie, accept: 'text/html' }, redirect: 'manual' });
      expect(res.headers.getSetCookie(), path).toEqual([]);
    }
    await signIn(browser, 'counter@fryline.test', { returnTo: '/staff/' });
    expect(browser.cookieHeader()).not.toBe(startCookie);
    const page = await fetch(`${stack.url}/staff/`, { headers: { cookie: browser.cookieHeader(), accept: 'text/html' } });
    expect(page.headers.getSetCookie()).toEqual([]);
    // the API still rolls the signed-in session forward
    const me = await browser.fetch('/api/me');
    expect(me.status).toBe(200);
    expect(me.headers.getSetCookie().some((c) => c.startsWith('fryline.sid='))).toBe(true);
  });

  it('makes an unknown address a new customer, keyed by sub, and queues a welcome e-mail', async () => {
    const browser = new Browser(stack.url);
    await signIn(browser, 'newcomer@example.test');
    const me = await browser.getJson('/api/me');
    expect(me.body).toMatchObject({ email: 'newcomer@example.test', role: 'customer' });
    const welcome = await OutboxMessage.findAll({ where: { toAddress: 'newcomer@example.test', kind: 'welcome' } });
    expect(welcome).toHaveLength(1);
    // a second sign-in finds the same account and sends nothing new
    const again = new Browser(stack.url);
    await signIn(again, 'newcomer@example.test');
    expect((await again.getJson('/api/me')).body.id).toBe(me.body.id);
    expect(await OutboxMessage.count({ where: { toAddress: 'newcomer@example.test' } })).toBe(1);
  });

  it('never links an unverified address to an existing account', async () => {
    const browser = new Browser(stack.url);
    const result = await signIn(browser, 'owner@fryline.test', { verified: false });
    expect(result.location).toBe('/signin?error=conflict');
    expect((await browser.getJson('/api/me')).status).toBe(401);
    expect((await User.findOne({ where: { email: 'owner@fryline.test' } }))?.googleSub).toBeNull();
  });

  it('lands a forged state on the sign-in error page with no session', async () => {
    const browser = new Browser(stack.url);
    const result = await signIn(browser, 'owner@fryline.test', { tamperState: true });
    expect(result.location).toBe('/signin?error=state');
    expect(browser.hasCookie('fryline.sid')).toBe(false);
    expect((await browser.getJson('/api/me')).status).toBe(401);
  });

  it('lands a denied consent on the sign-in error page with no session', async () => {
    const browser = new Browser(stack.url);
    const result = await signIn(browser, 'owner@fryline.test', { deny: true });
    expect(result.location).toBe('/signin?error=access_denied');
    expect(browser.hasCookie('fryline.sid')).toBe(false);
    expect((await browser.getJson('/api/me')).status).toBe(401);
  });

  it('refuses a reused authorization code', async () => {
    const browser = new Browser(stack.url);
    const first = await signIn(browser, 'counter@fryline.test');
    expect(first.status).toBe(303);
    // replay the same callback (same code, same state) in a fresh browser that started its own sign-in
    const other = new Browser(stack.url);
    const start = await other.fetch('/auth/google');
    expect(start.status).toBe(302);
    const state = new URL(start.headers.get('location')!).searchParams.get('state');
    const replay = new URL(first.callback);
    replay.searchParams.set('state', state!);
    const res = await other.fetch(replay.pathname + replay.search);
    expect(res.headers.get('location')).toBe('/signin?error=failed');
    expect((await other.getJson('/api/me')).status).toBe(401);
  });

  it('only accepts a same-origin path as the return address', async () => {
    const browser = new Browser(stack.url);
    const result = await signIn(browser, 'customer@fryline.test', { returnTo: '//evil.example/steal' });
    expect(result.location).toBe('/');
  });

  it('signs out: the session is destroyed server-side', async () => {
    const browser = new Browser(stack.url);
    await signIn(browser, 'owner@fryline.test');
    const cookie = browser.cookieHeader();
    const out = await browser.send('POST', '/auth/logout');
    expect(out.status).toBe(204);
    const replayed = await fetch(`${stack.url}/api/me`, { headers: { cookie } });
    expect(replayed.status).toBe(401);
    const [row] = await database().query(`SELECT count(*)::int AS n FROM "session" WHERE sess::text LIKE '%passport%'`);
    expect((row as Array<{ n: number }>)[0]?.n).toBe(0);
  });
});

describe('roles on staff routes', () => {
  it('gives a customer 403 on a staff route and the counter 403 on an owner route', async () => {
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    const asCustomer = await customer.send('POST', '/api/staff/orders/00000000-0000-4000-8000-000000000000/refunds', { amountCents: 100, reason: 'x' }, { 'idempotency-key': 'abcdefgh1' });
    expect(asCustomer.status).toBe(403);
    expect(asCustomer.body.error.code).toBe('forbidden');
    const counter = new Browser(stack.url);
    await signIn(counter, 'counter@fryline.test');
    const asCounter = await counter.send('POST', '/api/staff/orders/00000000-0000-4000-8000-000000000000/refunds', { amountCents: 100, reason: 'x' }, { 'idempotency-key': 'abcdefgh2' });
    expect(asCounter.status).toBe(403);
  });

  it('answers 401 to /api/me without a session', async () => {
    const res = await request(stack.app).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthenticated', message: expect.any(String), details: { requestId: res.headers['x-request-id'] } } });
  });
});
