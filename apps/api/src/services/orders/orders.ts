import QRCode from 'qrcode';
import { DatabaseError, UniqueConstraintError } from 'sequelize';
import type { CreatedOrder, CreateOrderInput, Me, OrderDetail } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { transactionWithRetry } from '../../db/retry.js';
import { BakeDay, Order, OrderBox, OrderLine, PickupWindow } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { bakeDayForOrdering } from '../bake-days/bake-days.js';
import { checkOrder } from './order-rules.js';
import { releaseOrder, takeWindowSlot, giveBackWindowSlot } from '../../db/queries/capacity.js';
import { holdOrder, saveCheckoutSession, WINDOW_FULL_CONSTRAINT, type HoldResult } from '../../db/queries/orders.js';
import { context } from '../../integrations/context.js';
import { shopSettings } from '../shop/settings.js';
import { audit } from '../audit/audit.js';
import { queueCancellation, queuePickupMoved } from '../mail/order-mails.js';
import { claimOffer, offerFreedCapacity } from '../waitlist/waitlist.js';
import { expireCheckout, openCheckout } from '../../integrations/checkout.js';
import { recordRefundIntent, refundableCents, sendRefundIntent } from '../payments/refund-intents.js';
import { applyCompletedSession } from '../payments/payment-events.js';
import { describePaymentsError } from '../payments/errors.js';
import { logger } from '../../lib/logger.js';

/** Customers may move or cancel until the cut-off, or later when the owner changed their order's window or place. */
export function changeDeadline(order: Pick<Order, 'changeGraceUntil'>, day: Pick<BakeDay, 'cutoffAt'>): Date {
  return order.changeGraceUntil && order.changeGraceUntil > day.cutoffAt ? order.changeGraceUntil : day.cutoffAt;
}

const orderInclude = [
  { model: OrderBox, as: 'boxes', include: [{ model: OrderLine, as: 'lines' }] },
  { model: PickupWindow, as: 'pickupWindow' },
  { model: BakeDay, as: 'bakeDay' },
];

export async function toOrderView(order: Order, now: Date): Promise<OrderDetail> {
  const day = order.bakeDay!;
  const window = order.pickupWindow!;
  const paidLike = order.pickupCode && ['paid', 'collected'].includes(order.status);
  return {
    id: order.id,
    status: order.status,
    subtotalCents: order.subtotalCents,
    taxCents: order.taxCents,
    totalCents: order.totalCents,
    refundedCents: order.refundedCents,
    currency: order.currency,
    pickupCode: order.status === 'held' || order.status === 'expired' ? null : order.pickupCode ?? null,
    holdExpiresAt: order.status === 'held' ? order.holdExpiresAt?.toISOString() ?? null : null,
    checkoutUrl: null,
    pickupWindow: { id: window.id, startsAt: window.startsAt.toISOString(), endsAt: window.endsAt.toISOString() },
    bakeDay: { id: day.id, date: day.date, place: day.place, address: day.address, timeZone: day.timeZone, cutoffAt: day.cutoffAt.toISOString() },
    boxes: [...(order.boxes ?? [])]
      .sort((a, b) => a.position - b.position)
      .map((box) => ({
        size: box.size,
        pieces: box.pieces,
        priceCents: box.priceCents,
        items: (box.lines ?? []).map((l) => ({ menuItemId: l.menuItemId, name: l.name, quantity: l.quantity, surchargeCents: l.surchargeCents, allergens: l.allergens })),
      })),
    createdAt: order.createdAt.toISOString(),
    canCancel: ['held', 'paid'].includes(order.status) && now < changeDeadline(order, day),
    qrDataUrl: paidLike ? await QRCode.toDataURL(order.pickupCode!, { errorCorrectionLevel: 'M', margin: 2, scale: 6 }) : null,
    calendarUrl: paidLike ? `/api/orders/${order.id}/calendar.ics` : null,
  };
}

async function findOwnOrder(user: Me, id: string): Promise<Order> {
  const order = await Order.findOne({ where: { id, userId: user.id }, include: orderInclude });
  if (!order) throw notFound('Order');
  return order;
}

export async function getOrder(user: Me, id: string, now: Date): Promise<OrderDetail> {
  return toOrderView(await findOwnOrder(user, id), now);
}

export async function listOrders(user: Me, now: Date): Promise<OrderDetail[]> {
  const orders = await Order.findAll({ where: { userId: user.id }, include: orderInclude, order: [['createdAt', 'DESC']], limit: 100 });
  return Promise.all(orders.map((o) => toOrderView(o, now)));
}

/**
 * Reserves the pieces as a hold, then opens hosted checkout for it. The hold
 * is one conditional statement (db/queries/orders.ts `holdOrder`): the
 * customer's share, the day's pieces, the window's slot, the order with its
 * boxes, lines and audit entry, all or nothing. If checkout can't be opened,
 * the hold is released at once. The session's id is saved without waiting
 * for the disk (see saveCheckoutSession).
 */
export async function createOrder(user: Me, input: CreateOrderInput & { claimToken?: string }, now: Date): Promise<CreatedOrder> {
  const day = await bakeDayForOrdering(input.bakeDayId, now);
  if (day.status !== 'open') {
    throw new AppError('closed', day.status === 'upcoming' ? 'Orders for this bake day are not open yet' : 'Orders for this bake day are closed', 409);
  }
  const checked = checkOrder(day, input);
  const { maxPiecesPerCustomer, holdMinutes } = await shopSettings();
  if (checked.rings + checked.holes > maxPiecesPerCustomer) throw overLimit(maxPiecesPerCustomer, 0);
  const holdExpiresAt = new Date(now.getTime() + holdMinutes * 60_000);

  const hold = {
    userId: user.id,
    bakeDayId: day.id,
    pickupWindowId: input.pickupWindowId,
    rings: checked.rings,
    holes: checked.holes,
    subtotalCents: checked.price.subtotalCents,
    taxCents: checked.price.taxCents,
    totalCents: checked.price.totalCents,
    holdExpiresAt,
    boxes: checked.boxes,
    maxPieces: maxPiecesPerCustomer,
    now,
  };
  let held: { id: string; currency: string };
  try {
    // the usual order is one statement; a claimed waitlist offer first gives its set-aside pieces back, in the same transaction
    held = input.claimToken
      ? await database().transaction(async (transaction) => {
          await claimOffer(user, day.id, input.claimToken!, transaction, now);
          return heldOrRefused(await holdOrder(hold, transaction), maxPiecesPerCustomer);
        })
      : heldOrRefused(await holdOrder(hold), maxPiecesPerCustomer);
  } catch (err) {
    if (err instanceof DatabaseError && (err.parent as { constraint?: string }).constraint === WINDOW_FULL_CONSTRAINT) {
      throw new AppError('window_full', 'That pickup window is full; please choose another', 409, { fields: { pickupWindowId: 'This window is full' } });
    }
    if (err instanceof UniqueConstraintError) {
      const existing = await Order.findOne({ where: { userId: user.id, bakeDayId: day.id, status: 'held' }, attributes: ['id'] });
      throw new AppError('hold_exists', 'You already have a box on hold for this bake day. Finish paying for it or cancel it first.', 409, existing ? { orderId: existing.id } : undefined);
    }
    throw err;
  }
  const orderId = held.id;

  try {
    const session = await openCheckout({ id: orderId, bakeDayId: day.id, holdExpiresAt, currency: held.currency }, user, checked, day, now);
    await saveCheckoutSession(orderId, session.id);
    return { id: orderId, status: 'held', totalCents: checked.price.totalCents, holdExpiresAt: holdExpiresAt.toISOString(), checkoutUrl: session.url! };
  } catch (err) {
    await database().transaction(async (transaction) => {
      if (await releaseOrder(orderId, ['held'], 'expired', transaction)) await offerFreedCapacity(day.id, transaction, now);
    });
    logger.error({ orderId, payments: describePaymentsError(err) }, 'checkout could not be opened');
    throw new AppError('payments_error', 'Card payments are not available right now. Nothing was charged; please try again shortly.', 502);
  }
}

/** The new order's id and currency, or the refusal as the customer should hear it (nothing was written). */
function heldOrRefused(result: HoldResult, maxPieces: number): { id: string; currency: string } {
  if (result.id !== null) return { id: result.id, currency: result.currency };
  if (result.refused === 'limit') throw overLimit(maxPieces, result.alreadyPieces);
  if (result.refused === 'window') {
    throw new AppError('invalid', 'pickupWindowId: This pickup window is not on this bake day', 400, { fields: { pickupWindowId: 'This pickup window is not on this bake day' } });
  }
  throw new AppError('sold_out', 'Sorry — there are not enough doughnuts left for this order', 409, { remaining: result.remaining });
}

function overLimit(limit: number, already: number): AppError {
  return new AppError(
    'limit_exceeded',
    already > 0
      ? `Each customer can order up to ${limit} pieces for one bake day; you already have ${already}.`
      : `Each customer can order up to ${limit} pieces for one bake day.`,
    409,
    { limit, alreadyOrdered: already },
  );
}

/** The checkout page for a held order that is still within its hold. */
export async function resumeCheckout(user: Me, id: string, now: Date): Promise<{ checkoutUrl: string }> {
  const order = await findOwnOrder(user, id);
  if (order.status !== 'held' || !order.checkoutSessionId || (order.holdExpiresAt && order.holdExpiresAt <= now)) {
    throw new AppError('not_payable', 'This order can no longer be paid', 409);
  }
  const session = await context().payments.checkout.sessions.retrieve(order.checkoutSessionId);
  if (session.status !== 'open' || !session.url) throw new AppError('not_payable', 'This order can no longer be paid', 409);
  return { checkoutUrl: session.url };
}

/**
 * A customer cancels before the cut-off: the hold or the paid order is
 * released, a paid order is refunded in full, and an e-mail goes out. A held
 * order whose checkout turns out to be complete is first recorded as paid
 * (as its webhook would have), then cancelled and refunded like any paid
 * one. The refund's amount is worked out under the order's row lock (so a
 * refund the owner is making at the same moment is counted) and recorded as
 * an intent before the payments service is called; if the service doesn't
 * answer, the cancellation stands and the refund is retried until it does.
 * Cancelling twice returns the cancelled order.
 */
export async function cancelOrder(user: Me, id: string, now: Date): Promise<OrderDetail> {
  const order = await findOwnOrder(user, id);
  if (order.status === 'cancelled') return toOrderView(order, now);
  if (!['held', 'paid'].includes(order.status)) throw new AppError('not_cancellable', `This order is ${order.status.replace('_', ' ')} and can't be cancelled`, 409);
  if (now >= changeDeadline(order, order.bakeDay!)) {
    throw new AppError('too_late', 'Orders can only be cancelled before the cut-off. Please contact the shop.', 409);
  }
  if (order.status === 'held' && order.checkoutSessionId) {
    const status = await expireCheckout(order.checkoutSessionId);
    if (status === 'complete') await applyCompletedSession(order.checkoutSessionId, now);
  }

  let refundId: string | null = null;
  await database().transaction(async (transaction) => {
    const fresh = await Order.findOne({ where: { id, userId: user.id }, transaction, lock: transaction.LOCK.UPDATE });
    if (!fresh || !['held', 'paid'].includes(fresh.status)) return; // something else moved it first
    const wasPaid = fresh.status === 'paid';
    const released = await releaseOrder(fresh.id, [fresh.status], 'cancelled', transaction, { cancelledAt: now });
    if (!released) return;
    let refunded = 0;
    if (wasPaid && fresh.paymentIntentId) {
      refunded = await refundableCents(fresh, transaction);
      if (refunded > 0) refundId = (await recordRefundIntent(fresh, refunded, 'cancelled by the customer', { kind: 'cancel', requestedBy: user.id }, transaction)).id;
    }
    await queueCancellation(fresh.id, refunded, transaction);
    await audit({ actorId: user.id, action: 'order.cancelled', subjectType: 'order', subjectId: fresh.id, details: { refundedCents: refunded } }, transaction);
    await offerFreedCapacity(fresh.bakeDayId, transaction, now);
  });
  if (refundId) {
    await sendRefundIntent(refundId, now).catch(() => {
      // logged by sendRefundIntent; the cancellation stands and the retry job sends the refund
    });
  }
  return getOrder(user, id, now);
}

/** Moves a held or paid order to another pickup window of the same day that has room. */
export async function moveOrder(user: Me, id: string, pickupWindowId: string, now: Date): Promise<OrderDetail> {
  // an owner's edit of the day locks its windows and then their orders; this locks the order and then the windows
  await transactionWithRetry(async (transaction) => {
    // the row lock makes a move wait for a cancellation or payment in flight
    const fresh = await Order.findOne({ where: { id, userId: user.id }, transaction, lock: transaction.LOCK.UPDATE });
    if (!fresh) throw notFound('Order');
    if (!['held', 'paid'].includes(fresh.status)) throw new AppError('not_movable', 'This order can no longer be changed', 409);
    const day = await BakeDay.findByPk(fresh.bakeDayId, { transaction });
    if (now >= changeDeadline(fresh, day!)) throw new AppError('too_late', 'Pickup windows can only be changed before the cut-off', 409);
    if (fresh.pickupWindowId === pickupWindowId) return;
    if (!(await takeWindowSlot(fresh.bakeDayId, pickupWindowId, transaction))) {
      const exists = await PickupWindow.findOne({ where: { id: pickupWindowId, bakeDayId: fresh.bakeDayId }, transaction });
      if (!exists) throw new AppError('invalid', 'pickupWindowId: not a window of this bake day', 400, { fields: { pickupWindowId: 'Not a window of this bake day' } });
      throw new AppError('window_full', 'That pickup window is full', 409, { fields: { pickupWindowId: 'This window is full' } });
    }
    const from = fresh.pickupWindowId;
    await giveBackWindowSlot(from, transaction);
    await fresh.update({ pickupWindowId }, { transaction });
    await audit({ actorId: user.id, action: 'order.moved', subjectType: 'order', subjectId: id, details: { from, to: pickupWindowId } }, transaction);
    await queuePickupMoved(id, transaction);
  });
  return getOrder(user, id, now);
}
