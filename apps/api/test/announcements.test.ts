import { beforeEach, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { AuditEntry, BakeDay, OutboxMessage } from '../src/db/models/index.js';
import { queueAnnouncements } from '../src/services/announcements/index.js';
import { Browser, signIn, useStack } from './support.js';
import { deliverMail } from './order-helpers.js';

const stack = useStack();
let owner: Browser;
beforeEach(async () => {
  owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
});

const subscribe = (email: string, browser?: Browser) =>
  browser
    ? browser.send('POST', '/api/announcements/subscribe', { email })
    : fetch(`${stack.url}/api/announcements/subscribe`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email }) });

async function announceNewDay(place: string, daysAhead: number) {
  const menu = (await owner.getJson('/api/staff/menu-items')).body as Array<{ id: string }>;
  const res = await owner.send('POST', '/api/staff/bake-days', {
    date: DateTime.now().setZone('America/Denver').plus({ days: daysAhead }).toISODate(),
    place,
    timeZone: 'America/Denver',
    windows: [{ start: '09:00', end: '10:30' }],
    menuItemIds: menu.map((m) => m.id),
    boxes: [{ size: 'dozen', pieces: 12, priceCents: 3000 }],
    ringCapacity: 60,
    holeCapacity: 0,
  });
  expect(res.status).toBe(201);
  return res.body as { id: string };
}

const inbox = (to: string, subject: RegExp) => stack.mail.messages().filter((m) => m.to.includes(to) && subject.test(m.subject));

describe('announcements of new bake days', () => {
  it('subscribe (not signed in), confirm from the e-mail, one e-mail when orders open, one-click unsubscribe, none the next time', async () => {
    // the demo's days were announced already; only new ones go out
    await queueAnnouncements(new Date());
    const res = await subscribe('regular.rook@example.test');
    expect((res as Response).status).toBe(202);

    // nothing goes to an address that has not confirmed
    await announceNewDay('Before confirming', 20);
    expect(await queueAnnouncements(new Date())).toBe(0);

    await deliverMail(stack);
    const [confirm] = inbox('regular.rook@example.test', /Please confirm/);
    expect(confirm).toBeDefined();
    const token = /\/news\/confirm\?token=([\w-]+)/.exec(confirm!.text!)![1]!;
    const confirmed = await fetch(`${stack.url}/api/announcements/confirm`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ token }) });
    expect(confirmed.status).toBe(200);
    expect(await confirmed.json()).toMatchObject({ confirmed: true, email: 'regular.rook@example.test' });

    const day = await announceNewDay('Larkspur Landing, north gate', 21);
    expect(await queueAnnouncements(new Date())).toBe(1);
    // a second run (or a second process) sends nothing more
    expect(await queueAnnouncements(new Date())).toBe(0);
    await deliverMail(stack);
    const news = inbox('regular.rook@example.test', /Pre-orders are open/);
    expect(news).toHaveLength(1);
    const mail = news[0]!;
    expect(mail.text).toContain('Larkspur Landing, north gate');
    expect(mail.text).toContain(`/days/${day.id}`);
    expect(mail.text).toContain(DateTime.fromISO((await BakeDay.findByPk(day.id))!.date).toFormat('cccc d LLLL'));
    // RFC 8058: an http(s) URI in List-Unsubscribe and the one-click marker
    const header = mail.headers['list-unsubscribe']!;
    expect(header).toMatch(/^<https?:\/\/[^>]+>$/);
    expect(mail.headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');

    // the mail program's one-click POST: no cookies, no sign-in, form-encoded body as RFC 8058 section 3.1 gives it
    const url = header.slice(1, -1);
    const gone = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: 'List-Unsubscribe=One-Click' });
    expect(gone.status).toBe(200);
    // opening the link does not unsubscribe by itself: it leads to a page with a button
    const opened = await fetch(url, { redirect: 'manual' });
    expect(opened.status).toBe(303);
    expect(opened.headers.get('location')).toMatch(/^\/news\/unsubscribe\?token=/);

    await announceNewDay('After leaving', 22);
    expect(await queueAnnouncements(new Date())).toBe(0);
    await deliverMail(stack);
    expect(inbox('regular.rook@example.test', /Pre-orders are open/)).toHaveLength(1);
    expect(await AuditEntry.count({ where: { action: 'announcements.unsubscribed' } })).toBe(1);
  });

  it('a signed-in customer subscribes the same way; asking twice sends one confirmation, and the answer never says who is subscribed', async () => {
    const customer = new Browser(stack.url);
    await signIn(customer, 'customer@fryline.test');
    const first = await subscribe('customer@fryline.test', customer);
    const second = await subscribe('customer@fryline.test', customer);
    expect(first.status).toBe(202);
    expect(second).toEqual(first);
    expect(await OutboxMessage.count({ where: { kind: 'announcement-confirm', toAddress: 'customer@fryline.test' } })).toBe(1);
  });

  it('spreads a large mailing over the minutes through the outbox', async () => {
    await queueAnnouncements(new Date());
    for (let i = 0; i < 5; i += 1) {
      await subscribe(`fan${i}@example.test`);
    }
    await deliverMail(stack);
    for (const m of stack.mail.messages().filter((x) => /Please confirm/.test(x.subject))) {
      const token = /\/news\/confirm\?token=([\w-]+)/.exec(m.text!)![1]!;
      await fetch(`${stack.url}/api/announcements/confirm`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ token }) });
    }
    await announceNewDay('Throttled', 23);
    const now = new Date();
    expect(await queueAnnouncements(now, 2)).toBe(5);
    const due = (await OutboxMessage.findAll({ where: { kind: 'announcement' } })).map((m) => Math.round((m.nextAttemptAt.getTime() - now.getTime()) / 60_000)).sort();
    // two a minute: 0, 0, 1, 1, 2 minutes from now
    expect(due).toEqual([0, 0, 1, 1, 2]);
  });

  it('refuses a bad address and an unknown token', async () => {
    expect(((await subscribe('not-an-address')) as Response).status).toBe(400);
    const bad = await fetch(`${stack.url}/api/announcements/confirm`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ token: 'x'.repeat(32) }) });
    expect(bad.status).toBe(404);
    const nobody = await fetch(`${stack.url}/api/announcements/unsubscribe?token=${'y'.repeat(32)}`, { method: 'POST', body: 'List-Unsubscribe=One-Click', headers: { 'content-type': 'application/x-www-form-urlencoded' } });
    expect(nobody.status).toBe(404);
  });
});
