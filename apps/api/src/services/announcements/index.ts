import crypto from 'node:crypto';
import { DateTime } from 'luxon';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Me } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { BakeDay, PickupWindow } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';
import { enqueueMail } from '../mail/outbox.js';
import { mailShopOf, paragraphMail } from '../mail/templates.js';
import { shopSettings } from '../shop/settings.js';
import { context } from '../../integrations/context.js';
import { audit } from '../audit/audit.js';

// Telling people about new bake days: double opt-in (a confirmation link by
// e-mail before anything else is sent), one e-mail per bake day when its
// orders open, and a one-click unsubscribe (RFC 8058) that needs no sign-in.

/** How many announcement e-mails leave per minute; the rest wait in the outbox. */
export const ANNOUNCEMENTS_PER_MINUTE = 60;
/** A second subscribe request for a pending address re-sends the confirmation at most this often. */
const RESEND_MINUTES = 10;

const token = () => crypto.randomBytes(24).toString('base64url');

interface SubscriberRow {
  id: string;
  email: string;
  status: 'pending' | 'confirmed' | 'unsubscribed';
  confirm_token: string;
  unsubscribe_token: string;
  confirm_sent_at: Date | null;
}

export const unsubscribeUrl = (unsubscribeToken: string) => `${context().config.publicUrl}/api/announcements/unsubscribe?token=${encodeURIComponent(unsubscribeToken)}`;

async function queueConfirmation(row: SubscriberRow, now: Date, transaction: Transaction) {
  const settings = await shopSettings(transaction);
  const { shopName } = settings;
  const link = `${context().config.publicUrl}/news/confirm?token=${encodeURIComponent(row.confirm_token)}`;
  const mail = await paragraphMail(`Please confirm: news of bake days from ${shopName}`, [
    'Hello,',
    `Someone (we hope you) asked to hear from ${shopName} when a new bake day opens for pre-orders.`,
    `To say yes, open this link: ${link}`,
    `If it wasn't you, ignore this e-mail: you won't hear from us again.`,
  ], mailShopOf(settings));
  const bucket = Math.floor(now.getTime() / (RESEND_MINUTES * 60_000));
  await enqueueMail({ kind: 'announcement-confirm', to: row.email, ...mail, dedupeKey: `announcement-confirm:${row.id}:${bucket}` }, transaction);
  await database().query(`UPDATE announcement_subscribers SET confirm_sent_at = :now, updated_at = now() WHERE id = :id`, { replacements: { id: row.id, now }, transaction });
}

/**
 * Someone asks to hear about new bake days. The answer is the same whatever
 * the address's state, so it tells nobody who is subscribed. A new or
 * unsubscribed address gets a confirmation link; a pending one gets it
 * again, at most every few minutes; a confirmed one gets nothing.
 */
export async function subscribe(email: string, user: Me | null, now: Date): Promise<void> {
  await database().transaction(async (transaction) => {
    await database().query(
      `INSERT INTO announcement_subscribers (email, user_id, confirm_token, unsubscribe_token)
       VALUES (:email, :userId, :confirm, :unsubscribe)
       ON CONFLICT ((lower(email))) DO NOTHING`,
      { replacements: { email, userId: user?.id ?? null, confirm: token(), unsubscribe: token() }, transaction },
    );
    const [row] = await database().query<SubscriberRow>(
      `SELECT id, email, status, confirm_token, unsubscribe_token, confirm_sent_at FROM announcement_subscribers WHERE lower(email) = lower(:email) FOR UPDATE`,
      { replacements: { email }, type: QueryTypes.SELECT, transaction },
    );
    if (!row || row.status === 'confirmed') return;
    if (row.status === 'unsubscribed') {
      const fresh = { ...row, status: 'pending' as const, confirm_token: token() };
      await database().query(
        `UPDATE announcement_subscribers SET status = 'pending', confirm_token = :confirm, unsubscribed_at = NULL, updated_at = now() WHERE id = :id`,
        { replacements: { id: row.id, confirm: fresh.confirm_token }, transaction },
      );
      await queueConfirmation(fresh, now, transaction);
    } else if (!row.confirm_sent_at || now.getTime() - row.confirm_sent_at.getTime() >= RESEND_MINUTES * 60_000) {
      await queueConfirmation(row, now, transaction);
    }
    await audit({ actorId: user?.id ?? null, action: 'announcements.subscribe', subjectType: 'announcement_subscriber', subjectId: row.id }, transaction);
  });
}

/** The link in the confirmation e-mail; opening it twice is fine. */
export async function confirmSubscription(confirmToken: string, now: Date): Promise<{ email: string }> {
  return database().transaction(async (transaction) => {
    const [row] = await database().query<{ id: string; email: string; status: string }>(
      `UPDATE announcement_subscribers SET status = 'confirmed', confirmed_at = COALESCE(confirmed_at, :now), updated_at = now()
        WHERE confirm_token = :confirmToken AND status IN ('pending', 'confirmed')
        RETURNING id, email, status`,
      { replacements: { confirmToken, now }, type: QueryTypes.SELECT, transaction },
    );
    if (!row) throw notFound('Subscription');
    await audit({ actorId: null, action: 'announcements.confirmed', subjectType: 'announcement_subscriber', subjectId: row.id }, transaction);
    return { email: row.email };
  });
}

/** One-click unsubscribe: the token in the link is all it takes; doing it twice is fine. */
export async function unsubscribe(unsubscribeToken: string, now: Date): Promise<void> {
  await database().transaction(async (transaction) => {
    const [row] = await database().query<{ id: string }>(
      `UPDATE announcement_subscribers SET status = 'unsubscribed', unsubscribed_at = COALESCE(unsubscribed_at, :now), updated_at = now()
        WHERE unsubscribe_token = :unsubscribeToken RETURNING id`,
      { replacements: { unsubscribeToken, now }, type: QueryTypes.SELECT, transaction },
    );
    if (!row) throw notFound('Subscription');
    await audit({ actorId: null, action: 'announcements.unsubscribed', subjectType: 'announcement_subscriber', subjectId: row.id }, transaction);
  });
}

async function announceDay(dayId: string, now: Date, perMinute: number): Promise<number> {
  return database().transaction(async (transaction) => {
    // the guard: only the run that sets announced_at sends, so a bake day is announced once
    const claimed = await database().query(
      `UPDATE bake_days SET announced_at = :now WHERE id = :dayId AND announced_at IS NULL AND status = 'published' RETURNING id`,
      { replacements: { dayId, now }, type: QueryTypes.SELECT, transaction },
    );
    if (claimed.length === 0) return 0;
    const day = (await BakeDay.findByPk(dayId, { include: [{ model: PickupWindow, as: 'pickupWindows' }], transaction }))!;
    const subscribers = await database().query<{ id: string; email: string; unsubscribe_token: string }>(
      `SELECT id, email, unsubscribe_token FROM announcement_subscribers WHERE status = 'confirmed' ORDER BY confirmed_at, id`,
      { type: QueryTypes.SELECT, transaction },
    );
    const settings = await shopSettings(transaction);
    const { shopName } = settings;
    const zone = day.timeZone;
    const date = DateTime.fromISO(day.date, { zone }).toFormat('cccc d LLLL');
    const windows = (day.pickupWindows ?? [])
      .filter((w) => !w.removedAt)
      .sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime())
      .map((w) => `${DateTime.fromJSDate(w.startsAt, { zone }).toFormat('h:mm a')}–${DateTime.fromJSDate(w.endsAt, { zone }).toFormat('h:mm a')}`);
    const closes = DateTime.fromJSDate(day.cutoffAt, { zone }).toFormat("cccc d LLLL 'at' h:mm a");
    const link = `${context().config.publicUrl}/days/${day.id}`;
    for (const [i, sub] of subscribers.entries()) {
      const leave = unsubscribeUrl(sub.unsubscribe_token);
      const mail = await paragraphMail(`Pre-orders are open for ${date} — ${shopName}`, [
        'Hello,',
        `Pre-orders are open for our bake day on ${date} at ${day.place}${day.address ? `, ${day.address}` : ''}.`,
        `Pickup windows: ${windows.join(', ')}. Orders close ${closes}, or sooner if we sell out.`,
        `Order here: ${link}`,
        `You get this because you asked to hear about new bake days. To stop, open ${leave}`,
      ], mailShopOf(settings));
      await enqueueMail(
        {
          kind: 'announcement',
          to: sub.email,
          ...mail,
          dedupeKey: `announcement:${day.id}:${sub.id}`,
          // RFC 2369 / RFC 8058: mail programs show an unsubscribe button that POSTs here
          headers: { 'List-Unsubscribe': `<${leave}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
          notBefore: new Date(now.getTime() + Math.floor(i / perMinute) * 60_000),
        },
        transaction,
      );
    }
    await audit({ actorId: null, action: 'announcements.sent', subjectType: 'bake_day', subjectId: day.id, details: { subscribers: subscribers.length } }, transaction);
    return subscribers.length;
  });
}

/**
 * Announces every published bake day whose orders have opened and that was
 * not announced yet: one e-mail per confirmed subscriber, spread out over
 * the minutes (ANNOUNCEMENTS_PER_MINUTE) through the outbox. Returns how
 * many e-mails were queued.
 */
export async function queueAnnouncements(now: Date, perMinute = ANNOUNCEMENTS_PER_MINUTE): Promise<number> {
  const due = await database().query<{ id: string }>(
    `SELECT id FROM bake_days
      WHERE status = 'published' AND announced_at IS NULL
        AND orders_open_at <= CAST(:now AS timestamptz) AND cutoff_at > CAST(:now AS timestamptz)
      ORDER BY orders_open_at`,
    { replacements: { now }, type: QueryTypes.SELECT },
  );
  let queued = 0;
  for (const day of due) queued += await announceDay(day.id, now, perMinute);
  return queued;
}
