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
import { mailShopOf, renderMail } from '../mail/templates.js';
import { shopSettings } from '../shop/settings.js';
import { piecesOrderedBy } from '../../db/queries/orders.js';
import { context } from '../../integrations/context.js';

export const OFFER_MINUTES = 30;

const piecesText = (rings: number, holes: number) =>
  [rings ? `${rings} ring${rings === 1 ? '' : 's'}` : '', holes ? `${holes} hole${holes === 1 ? '' : 's'}` : ''].filter(Boolean).join(' and ');

const queuePosition = (entry: WaitlistEntry, transaction?: Transaction) =>
  WaitlistEntry.count({ where: { bakeDayId: entry.bakeDayId, status: 'waiting', createdAt: { [Op.lte]: entry.createdAt } }, transaction });

/**
 * A waitlist request only when the day can't take it now (sold out for it),
 * and never for more than the customer's share of the day (what they already
 * ordered counts).
 */
async function checkFairShare(user: Me, day: BakeDay, rings: number, holes: number, transaction: Transaction) {
  const { maxPiecesPerCustomer } = await shopSettings(transaction);
  const already = await piecesOrderedBy(user.id, day.id);
  if (rings + holes + already > maxPiecesPerCustomer) {
    throw new AppError('limit_exceeded', `Each customer can ask for up to ${maxPiecesPerCustomer} pieces for one bake day${already ? `; you already have ${already}` : ''}.`, 409, {
      limit: maxPiecesPerCustomer,
      alreadyOrdered: already,
    });
  }
  if (day.ringsRemaining >= rings && day.holesRemaining >= holes) {
    throw new AppError('not_sold_out', 'There are still enough left for this: order them now instead of waiting.', 409, {
      remaining: { rings: day.ringsRemaining, holes: day.holesRemaining },
    });
  }
}

/**
 * Puts the customer on a bake day's waitlist, or changes how many they are
 * waiting for (keeping their place), and confirms it by e-mail. An entry
 * that already has an offer out is left as it is.
 */
export async function joinWaitlist(user: Me, bakeDayId: string, rings: number, holes: number, now: Date) {
  return database().transaction(async (transaction) => {
    const day = await BakeDay.findByPk(bakeDayId, { transaction });
    if (!day || day.status !== 'published') throw notFound('Bake day');
    if (now >= day.cutoffAt) throw new AppError('closed', 'Orders for this bake day are closed', 409);
    const existing = await WaitlistEntry.findOne({
      where: { bakeDayId, userId: user.id, status: { [Op.in]: ['waiting', 'offered'] } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const changed = existing?.status === 'waiting' && (existing.rings !== rings || existing.holes !== holes);
    if (!existing || changed) await checkFairShare(user, day, rings, holes, transaction);
    if (changed) await existing.update({ rings, holes }, { transaction });
    const entry = existing ?? (await WaitlistEntry.create({ bakeDayId, userId: user.id, rings, holes }, { transaction }));
    const position = await queuePosition(entry, transaction);
    if (!existing || changed) {
      const settings = await shopSettings(transaction);
      const date = DateTime.fromISO(day.date, { zone: day.timeZone }).toFormat('cccc d LLLL');
      const what = piecesText(entry.rings, entry.holes);
      const mail = await renderMail({
        subject: `${existing ? 'Your waitlist place is updated' : "You're on the waitlist"} for ${date} — ${settings.shopName}`,
        shop: mailShopOf(settings),
        preview: `Number ${position} on the list, for ${what}.`,
        blocks: [
          { type: 'paragraph', text: `Hello ${user.name || 'there'},` },
          { type: 'paragraph', text: `You're on the waitlist for ${date} at ${day.place}: number ${position} on the list, for ${what}.` },
          { type: 'paragraph', text: `If doughnuts come free, we hold them for the next person on the list for ${OFFER_MINUTES} minutes and e-mail a link to claim them. Nothing is charged unless you claim them and pay.` },
          { type: 'button', label: 'See or change your place', href: `${context().config.publicUrl}/days/${day.id}` },
        ],
      });
      await enqueueMail(
        { kind: 'waitlist-joined', to: user.email, ...mail, dedupeKey: `waitlist-joined:${entry.id}:${entry.rings}:${entry.holes}:${now.getTime()}` },
        transaction,
      );
    }
    return { id: entry.id, position, status: entry.status, rings: entry.rings, holes: entry.holes };
  });
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
      position: e.status === 'waiting' ? await queuePosition(e) : null,
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
    const what = piecesText(entry.rings, entry.holes);
    const mail = await renderMail({
      subject: `Doughnuts freed up for ${date} — ${settings.shopName}`,
      shop: mailShopOf(settings),
      preview: `${what} are held for you for ${OFFER_MINUTES} minutes.`,
      blocks: [
        { type: 'paragraph', text: `Hello ${user!.name || 'there'},` },
        { type: 'paragraph', text: `Good news: ${what} came free for ${date} at ${day!.place}. We're holding them for you for ${OFFER_MINUTES} minutes.` },
        { type: 'button', label: 'Claim them', href: `${context().config.publicUrl}/claim/${token}` },
        { type: 'paragraph', text: "If you don't claim them in time, they go to the next person on the waitlist." },
      ],
    });
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
