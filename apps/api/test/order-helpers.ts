import crypto from 'node:crypto';
import { sign } from 'cookie-signature';
import { BakeDay, User } from '../src/db/models/index.js';
import { relayOutbox } from '../src/jobs/outbox-relay.js';
import { createMailTransport } from '../src/integrations/mailer.js';
import { QueryTypes } from 'sequelize';
import { database } from '../src/db/sequelize.js';
import type { BakeDayView } from '@fryline/schemas';
import type { Browser, Stack } from './support.js';

export const CARD_OK = { cardNumber: '4242424242424242', expiry: '12/34', cvc: '123' };

export async function openDay(stack: Stack): Promise<BakeDayView> {
  const days: BakeDayView[] = (await (await fetch(`${stack.url}/api/bake-days`)).json()) as any;
  const day = days.find((d) => d.status === 'open');
  if (!day) throw new Error('no open bake day in the demo');
  return day;
}

export function mixedDozen(day: BakeDayView, windowIndex = 0) {
  const rings = day.menu.filter((m) => m.kind === 'ring');
  return {
    bakeDayId: day.id,
    pickupWindowId: day.pickupWindows[windowIndex]!.id,
    boxes: [{ size: 'dozen', items: [{ menuItemId: rings[0]!.id, quantity: 6 }, { menuItemId: rings[1]!.id, quantity: 6 }] }],
  };
}

export function halfDozen(day: BakeDayView, windowIndex = 0) {
  const ring = day.menu.find((m) => m.kind === 'ring')!;
  return { bakeDayId: day.id, pickupWindowId: day.pickupWindows[windowIndex]!.id, boxes: [{ size: 'half-dozen', items: [{ menuItemId: ring.id, quantity: 6 }] }] };
}

export const sessionIdOf = (checkoutUrl: string) => checkoutUrl.split('/pay/')[1]!;

export async function remaining(dayId: string) {
  const day = await BakeDay.findByPk(dayId);
  return { rings: day!.ringsRemaining, holes: day!.holesRemaining };
}

/** Orders a box and pays it with the given card; waits until the webhooks are through. */
export async function orderAndPay(stack: Stack, browser: Browser, body: unknown, card = CARD_OK) {
  const created = await browser.send('POST', '/api/orders', body);
  if (created.status !== 201) throw new Error(`order failed: ${JSON.stringify(created.body)}`);
  const outcome = stack.payments.paySession(sessionIdOf(created.body.checkoutUrl), card);
  await stack.payments.webhooksIdle();
  return { order: created.body, outcome };
}

export async function deliverMail(stack: Stack) {
  const transport = createMailTransport({ SMTP_HOST: '127.0.0.1', SMTP_PORT: stack.mail.smtpPort });
  const result = await relayOutbox(database(), transport, 'orders@fryline.test', 100);
  transport.close();
  return result;
}

/** Signed-in customers, made directly as session rows (the sign-in flow has its own tests); returns their Cookie headers. */
export async function signedInCustomers(stack: Stack, n: number, prefix = 'crowd'): Promise<string[]> {
  const users = await User.bulkCreate(Array.from({ length: n }, (_, i) => ({ email: `${prefix}${i}@example.test`, name: `Crowd ${i}`, role: 'customer' as const, emailVerified: true })));
  const expires = new Date(Date.now() + 3600_000);
  const sessions = users.map((u) => ({ sid: crypto.randomUUID(), user: u.id }));
  await database().query(
    `INSERT INTO "session" (sid, sess, expire) SELECT * FROM unnest(ARRAY[:sids]::varchar[], ARRAY[:sess]::json[], ARRAY[:exp]::timestamp[])`,
    {
      replacements: {
        sids: sessions.map((s) => s.sid),
        sess: sessions.map((s) => JSON.stringify({ cookie: { originalMaxAge: 3600_000, expires, httpOnly: true, path: '/', sameSite: 'lax' }, passport: { user: s.user } })),
        exp: sessions.map(() => expires),
      },
    },
  );
  return sessions.map((s) => `fryline.sid=${encodeURIComponent(`s:${sign(s.sid, stack.config.SESSION_SECRET)}`)}`);
}

/** capacity = remaining + held + paid + set aside for waitlist offers, per bake day (rings and holes). */
export async function capacityLedger() {
  return database().query<{ id: string; ring_capacity: number; rings_accounted: number; hole_capacity: number; holes_accounted: number }>(
    `SELECT d.id, d.ring_capacity, d.hole_capacity,
            d.rings_remaining + COALESCE(o.rings, 0) + COALESCE(w.rings, 0) AS rings_accounted,
            d.holes_remaining + COALESCE(o.holes, 0) + COALESCE(w.holes, 0) AS holes_accounted
       FROM bake_days d
       LEFT JOIN (SELECT bake_day_id, SUM(rings)::int AS rings, SUM(holes)::int AS holes FROM orders WHERE holds_capacity GROUP BY bake_day_id) o ON o.bake_day_id = d.id
       LEFT JOIN (SELECT bake_day_id, SUM(rings)::int AS rings, SUM(holes)::int AS holes FROM waitlist_entries WHERE status = 'offered' GROUP BY bake_day_id) w ON w.bake_day_id = d.id`,
    { type: QueryTypes.SELECT },
  );
}
