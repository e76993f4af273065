import crypto from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { DateTime } from 'luxon';
import type { Me, WaitlistEntryView, WaitlistOfferView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { BakeDay, User, WaitlistEntry } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { giveBackCapacity, takeCapacity } from '../../db/queries/capacity.js';
import { lapseDueOffers, lockNextWaiting, markOfferClaimed } from '../../db/queries/waitlist.js';
import { enqueueMail } from '../mail/outbox.js';
import { renderMail } from '../mail/templates.js';
import { shopSettings } from '../shop/settings.js';
import { context } from '../../integrations/context.js';

export const OFFER_MINUTES = 30;

export async function joinWaitlist(user: Me, bakeDayId: string, rings: number, holes: number, now: Date) {
  const day = await BakeDay.findByPk(bakeDayId);
  if (!day || day.status !== 'published') throw notFound('Bake day');
  if (now >= day.cutoffAt) throw new AppError('closed', 'Orders for this bake day are closed', 409);
  const existing = await WaitlistEntry.findOne({ where: { bakeDayId, userId: user.id, status: { [Op.in]: ['waiting', 'offered'] } } });
  const entry = existing ?? (await WaitlistEntry.create({ bakeDayId, userId: user.id, rings, holes }));
  const position = await WaitlistEntry.count({ where: { bakeDayId, status: 'waiting', createdAt: { [Op.lte]: entry.createdAt } } });
  return { id: entry.id, position, status: entry.status, rings: entry.rings, holes: entry.holes };
}

export async function listMyWaitlist(user: Me): Promise<WaitlistEntryView[]> {
  const entries = await WaitlistEntry.findAll({ where: { userId: user.id, status: { [Op.in]: ['waiting', 'offered'] } }, order: [['createdAt', 'DESC']] });
  return Promise.all(
    entries.map(async (e) => ({
      id: e.id,
      bakeDayId: e.bakeDayId,
      rings: e.rings,
      holes: e.holes,
      status: e.status,
      position: e.status === 'waiting' ? await WaitlistEntry.count({ where: { bakeDayId: e.bakeDayId, status: 'waiting', createdAt: { [Op.lte]: e.createdAt } } }) : null,
      offerExpiresAt: e.offerExpiresAt?.toISOString() ?? null,
    })),
  );
}

export async function leaveWaitlist(user: Me, id: string, now: Date) {
  await database().transaction(async (transaction) => {
    const entry = await WaitlistEntry.findOne({ where: { id, userId: user.id }, transaction, lock: transaction.LOCK.UPDATE });
    if (!entry) throw notFound('Waitlist entry');
    if (entry.status === 'offered') {
      await giveBackCapacity(entry.bakeDayId, entry.rings, entry.holes, transaction);
      await entry.update({ status: 'left' }, { transaction });
      await offerFreedCapacity(entry.bakeDayId, transaction, now);
    } else if (entry.status === 'waiting') {
      await entry.update({ status: 'left' }, { transaction });
    }
  });
}

export async function getOffer(user: Me, token: string, now: Date): Promise<WaitlistOfferView> {
  const entry = await WaitlistEntry.findOne({ where: { claimToken: token, userId: user.id } });
  if (!entry) throw notFound('Offer');
  if (entry.status !== 'offered' || !entry.offerExpiresAt || entry.offerExpiresAt <= now) {
    throw new AppError('offer_expired', 'This offer has expired or was already used', 409);
  }
  return { bakeDayId: entry.bakeDayId, rings: entry.rings, holes: entry.holes, expiresAt: entry.offerExpiresAt.toISOString() };
}

/**
 * Turns an offer into the pieces for an order: the offered pieces go back to
 * the pool inside the order's transaction, which then takes what the order
 * needs, so nobody else can take them in between.
 */
export async function claimOffer(user: Me, bakeDayId: string, token: string, transaction: Transaction, now: Date) {
  const offer = await markOfferClaimed(token, user.id, bakeDayId, now, transaction);
  if (!offer) throw new AppError('offer_expired', 'This offer has expired or was already used', 409);
  await giveBackCapacity(bakeDayId, offer.rings, offer.holes, transaction);
}

/**
 * Offers freed pieces to the waitlist, first come first served: each entry
 * at the head of the list whose request fits gets its pieces set aside for
 * OFFER_MINUTES and an e-mail with a claim link.
 */
export async function offerFreedCapacity(bakeDayId: string, transaction: Transaction, now: Date): Promise<number> {
  let offered = 0;
  for (;;) {
    const entry = await lockNextWaiting(bakeDayId, transaction);
    if (!entry) return offered;
    if (!(await takeCapacity(bakeDayId, entry.rings, entry.holes, transaction, { now }))) return offered;
    const token = crypto.randomBytes(24).toString('base64url');
    const expiresAt = new Date(now.getTime() + OFFER_MINUTES * 60_000);
    await WaitlistEntry.update({ status: 'offered', claimToken: token, offerExpiresAt: expiresAt }, { where: { id: entry.id }, transaction });
    const [user, day, settings] = await Promise.all([
      User.findByPk(entry.user_id, { transaction }),
      BakeDay.findByPk(bakeDayId, { transaction }),
      shopSettings(transaction),
    ]);
    const date = DateTime.fromISO(day!.date, { zone: day!.timeZone }).toFormat('cccc d LLLL');
    const what = [entry.rings ? `${entry.rings} rings` : '', entry.holes ? `${entry.holes} holes` : ''].filter(Boolean).join(' and ');
    const mail = renderMail(`Doughnuts freed up for ${date} — ${settings.shopName}`, [
      `Hello ${user!.name || 'there'},`,
      `Good news: ${what} came free for ${date} at ${day!.place}. We're holding them for you for ${OFFER_MINUTES} minutes.`,
      `Claim them here: ${context().config.publicUrl}/claim/${token}`,
      `If you don't claim them in time, they go to the next person on the waitlist.`,
      `— ${settings.shopName}`,
    ]);
    await enqueueMail({ kind: 'waitlist-offer', to: user!.email, ...mail, dedupeKey: `waitlist-offer:${entry.id}` }, transaction);
    offered += 1;
  }
}

/** Offers nobody claimed in time lapse; their pieces go to the next in line. */
export async function lapseOffers(now: Date): Promise<number> {
  return database().transaction(async (transaction) => {
    const lapsed = await lapseDueOffers(now, transaction);
    for (const row of lapsed) await giveBackCapacity(row.bake_day_id, row.rings, row.holes, transaction);
    for (const dayId of new Set(lapsed.map((r) => r.bake_day_id))) await offerFreedCapacity(dayId, transaction, now);
    return lapsed.length;
  });
}
