import QRCode from 'qrcode';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { CreatedOrder, CreateOrderInput, Me, OrderDetail } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { BakeDay, Order, OrderBox, OrderLine, PickupWindow } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { getBakeDay } from '../bake-days/bake-days.js';
import { checkOrder, type CheckedOrder } from './order-rules.js';
import { releaseOrder, takeCapacity, takeWindowSlot, giveBackWindowSlot } from '../../db/queries/capacity.js';
import { context } from '../../integrations/context.js';
import { audit } from '../audit/audit.js';
import { queueCancellation } from '../mail/order-mails.js';
import { claimOffer, offerFreedCapacity } from '../waitlist/waitlist.js';
import { expireCheckout, openCheckout, refundPayment } from '../../integrations/checkout.js';
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

async function insertOrder(user: Me, input: CreateOrderInput, checked: CheckedOrder, holdExpiresAt: Date, transaction: Transaction): Promise<Order> {
  const order = await Order.create(
    {
      userId: user.id,
      bakeDayId: input.bakeDayId,
      pickupWindowId: input.pickupWindowId,
      status: 'held',
      rings: checked.rings,
      holes: checked.holes,
      subtotalCents: checked.price.subtotalCents,
      taxCents: checked.price.taxCents,
      totalCents: checked.price.totalCents,
      holdExpiresAt,
    },
    { transaction },
  );
  for (const [position, box] of checked.boxes.entries()) {
    const row = await OrderBox.create({ orderId: order.id, position, size: box.size, pieces: box.pieces, priceCents: box.priceCents }, { transaction });
    await OrderLine.bulkCreate(box.lines.map((l) => ({ ...l, orderBoxId: row.id })), { transaction });
  }
  return order;
}

/**
 * Reserves the pieces as a hold (one conditional update per counter, in the
 * order's transaction), then opens hosted checkout for it. If checkout can't
 * be opened, the hold is released at once.
 */
export async function createOrder(user: Me, input: CreateOrderInput & { claimToken?: string }, now: Date): Promise<CreatedOrder> {
  const day = await getBakeDay(input.bakeDayId, now);
  if (day.status !== 'open') {
    throw new AppError('closed', day.status === 'upcoming' ? 'Orders for this bake day are not open yet' : 'Orders for this bake day are closed', 409);
  }
  const checked = checkOrder(day, input);
  const holdExpiresAt = new Date(now.getTime() + context().config.HOLD_MINUTES * 60_000);

  let order: Order;
  try {
    order = await database().transaction(async (transaction) => {
      const existing = await Order.findOne({ where: { userId: user.id, bakeDayId: day.id, status: 'held' }, transaction });
      if (existing) {
        throw new AppError('hold_exists', 'You already have a box on hold for this bake day. Finish paying for it or cancel it first.', 409, { orderId: existing.id });
      }
      if (input.claimToken) await claimOffer(user, day.id, input.claimToken, transaction, now);
      if (!(await takeCapacity(day.id, checked.rings, checked.holes, transaction, { now }))) {
        throw new AppError('sold_out', 'Sorry — there are not enough doughnuts left for this order', 409, { remaining: day.remaining });
      }
      if (!(await takeWindowSlot(day.id, input.pickupWindowId, transaction))) {
        throw new AppError('window_full', 'That pickup window is full; please choose another', 409, { fields: { pickupWindowId: 'This window is full' } });
      }
      const created = await insertOrder(user, input, checked, holdExpiresAt, transaction);
      await audit({ actorId: user.id, action: 'order.held', subjectType: 'order', subjectId: created.id, details: { rings: checked.rings, holes: checked.holes } }, transaction);
      return created;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new AppError('hold_exists', 'You already have a box on hold for this bake day', 409);
    }
    throw err;
  }

  try {
    const session = await openCheckout(order, user, checked, day, now);
    await order.update({ checkoutSessionId: session.id });
    return { id: order.id, status: 'held', totalCents: order.totalCents, holdExpiresAt: holdExpiresAt.toISOString(), checkoutUrl: session.url! };
  } catch (err) {
    await database().transaction(async (transaction) => {
      if (await releaseOrder(order.id, ['held'], 'expired', transaction)) await offerFreedCapacity(day.id, transaction, now);
    });
    logger.error({ err, orderId: order.id }, 'checkout could not be opened');
    throw new AppError('payments_unavailable', 'Card payments are not available right now. Nothing was charged; please try again shortly.', 502);
  }
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
 * released, a paid order is refunded in full through the payments API, and
 * an e-mail goes out. Cancelling twice returns the cancelled order.
 */
export async function cancelOrder(user: Me, id: string, now: Date): Promise<OrderDetail> {
  const order = await findOwnOrder(user, id);
  if (order.status === 'cancelled') return toOrderView(order, now);
  if (!['held', 'paid'].includes(order.status)) throw new AppError('not_cancellable', `This order is ${order.status.replace('_', ' ')} and can't be cancelled`, 409);
  if (now >= changeDeadline(order, order.bakeDay!)) {
    throw new AppError('too_late', 'Orders can only be cancelled before the cut-off. Please contact the shop.', 409);
  }
  const wasHeld = order.status === 'held';
  if (wasHeld && order.checkoutSessionId) await expireCheckout(order.checkoutSessionId);

  await database().transaction(async (transaction) => {
    const released = await releaseOrder(order.id, [order.status], 'cancelled', transaction, { cancelledAt: now });
    if (!released) return; // something else moved it first
    let refunded = 0;
    if (!wasHeld) {
      refunded = order.totalCents - order.refundedCents;
      if (refunded > 0) await refundPayment(order, refunded, 'requested_by_customer', `cancel:${order.id}`, null, transaction);
    }
    await queueCancellation(order.id, refunded, transaction);
    await audit({ actorId: user.id, action: 'order.cancelled', subjectType: 'order', subjectId: order.id, details: { refundedCents: refunded } }, transaction);
    await offerFreedCapacity(order.bakeDayId, transaction, now);
  });
  return getOrder(user, id, now);
}

/** Moves a held or paid order to another pickup window of the same day that has room. */
export async function moveOrder(user: Me, id: string, pickupWindowId: string, now: Date): Promise<OrderDetail> {
  await database().transaction(async (transaction) => {
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
  });
  return getOrder(user, id, now);
}
