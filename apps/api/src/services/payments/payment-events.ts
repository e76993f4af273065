import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { database } from '../../db/sequelize.js';
import { recordEvent, recordOutcome } from '../../db/queries/payment-events.js';
import { Order } from '../../db/models/index.js';
import { context } from '../../integrations/context.js';
import { releaseOrder, takeCapacity, takeWindowSlot } from '../../db/queries/capacity.js';
import { newPickupCode } from '../orders/pickup-codes.js';
import { queueConfirmation, queueLateRefundApology } from '../mail/order-mails.js';
import { refundPayment } from '../../integrations/checkout.js';
import { offerFreedCapacity } from '../waitlist/waitlist.js';
import { audit } from '../audit/audit.js';
import { logger } from '../../lib/logger.js';
import { recordProcessingFee } from './fees.js';

/** Rolls back the savepoint when a late payment's pieces can't all be taken again. */
class NotRetaken extends Error {}

/**
 * Applies one verified payment event. The event id is recorded in the same
 * transaction as its effect, so a duplicate (in a row or at the same time)
 * finds the id taken and does nothing; events may arrive in any order.
 */
export async function handlePaymentEvent(event: Stripe.Event, now: Date): Promise<'applied' | 'duplicate'> {
  return database().transaction(async (transaction) => {
    if (!(await recordEvent(event.id, event.type, transaction))) return 'duplicate';
    let orderId: string | null = null;
    let outcome = 'ignored';
    switch (event.type) {
      case 'checkout.session.completed':
      case 'checkout.session.async_payment_succeeded':
        ({ orderId, outcome } = await sessionPaid(event.data.object as Stripe.Checkout.Session, transaction, now));
        break;
      case 'checkout.session.expired':
        ({ orderId, outcome } = await sessionExpired(event.data.object as Stripe.Checkout.Session, transaction, now));
        break;
      case 'charge.refunded':
        ({ orderId, outcome } = await chargeRefunded(event.data.object as Stripe.Charge, transaction, now));
        break;
      default:
        break;
    }
    await recordOutcome(event.id, orderId, outcome, transaction);
    return 'applied';
  });
}

const orderIdOf = (session: Stripe.Checkout.Session) => session.metadata?.orderId ?? session.client_reference_id ?? null;
const intentIdOf = (value: string | { id: string } | null | undefined) => (typeof value === 'string' ? value : value?.id ?? null);

async function lockOrder(id: string | null, transaction: Transaction) {
  if (!id || !/^[0-9a-f-]{36}$/i.test(id)) return null;
  return Order.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
}

/** Marks a held (or re-taken) order paid with a fresh pickup code; retries on the rare code clash. */
async function markPaid(order: Order, paymentIntentId: string | null, holdsCapacity: boolean, transaction: Transaction, now: Date) {
  for (let attempt = 0; ; attempt += 1) {
    try {
      await database().transaction({ transaction }, async (savepoint) => {
        await order.update(
          { status: 'paid', paidAt: now, paymentIntentId, pickupCode: newPickupCode(), holdExpiresAt: null, holdsCapacity },
          { transaction: savepoint },
        );
      });
      break;
    } catch (err) {
      if (attempt >= 5 || (err as Error).name !== 'SequelizeUniqueConstraintError') throw err;
      await order.reload({ transaction });
    }
  }
  await recordProcessingFee(order.id, paymentIntentId, transaction);
  await queueConfirmation(order.id, transaction);
  await audit({ actorId: null, action: 'order.paid', subjectType: 'order', subjectId: order.id }, transaction);
}

async function sessionPaid(session: Stripe.Checkout.Session, transaction: Transaction, now: Date) {
  const order = await lockOrder(orderIdOf(session), transaction);
  if (!order) return { orderId: null, outcome: 'unknown order' };
  if (session.payment_status !== 'paid') return { orderId: order.id, outcome: 'not paid yet' };
  const paymentIntentId = intentIdOf(session.payment_intent as string | { id: string } | null);
  if (session.amount_total !== order.totalCents) {
    logger.error({ orderId: order.id, paidCents: session.amount_total, totalCents: order.totalCents }, 'paid amount differs from the order total');
  }
  switch (order.status) {
    case 'held':
      await markPaid(order, paymentIntentId, true, transaction, now);
      return { orderId: order.id, outcome: 'paid' };
    case 'expired': {
      // Paid after its hold lapsed: keep it if the pieces are still there, else refund in full.
      const retaken = await database()
        .transaction({ transaction }, async (savepoint) => {
          if (!(await takeCapacity(order.bakeDayId, order.rings, order.holes, savepoint, { ignoreCutoff: true }))) throw new NotRetaken('no pieces');
          if (!(await takeWindowSlot(order.bakeDayId, order.pickupWindowId, savepoint))) throw new NotRetaken('window full');
          return true;
        })
        .catch((err) => {
          if (err instanceof NotRetaken) return false;
          throw err;
        });
      if (retaken) {
        await markPaid(order, paymentIntentId, true, transaction, now);
        return { orderId: order.id, outcome: 'paid late, pieces re-taken' };
      }
      return refundLate(order, paymentIntentId, transaction);
    }
    case 'cancelled':
      return refundLate(order, paymentIntentId, transaction);
    default:
      // already paid, collected, refunded …: nothing more to do
      if (!order.paymentIntentId && paymentIntentId) await order.update({ paymentIntentId }, { transaction });
      return { orderId: order.id, outcome: `already ${order.status}` };
  }
}

async function refundLate(order: Order, paymentIntentId: string | null, transaction: Transaction) {
  await order.update({ paymentIntentId, status: 'refunded', holdsCapacity: false }, { transaction });
  const due = order.totalCents - order.refundedCents;
  if (due > 0) await refundPayment(order, due, 'requested_by_customer', `late:${order.id}`, null, transaction, 'paid after the hold lapsed; sold out');
  await queueLateRefundApology(order.id, transaction);
  return { orderId: order.id, outcome: 'paid late, refunded' };
}

async function sessionExpired(session: Stripe.Checkout.Session, transaction: Transaction, now: Date) {
  const orderId = orderIdOf(session);
  const order = await lockOrder(orderId, transaction);
  if (!order) return { orderId: null, outcome: 'unknown order' };
  if (order.checkoutSessionId && order.checkoutSessionId !== session.id) return { orderId: order.id, outcome: 'older session' };
  const released = await releaseOrder(order.id, ['held'], 'expired', transaction);
  if (released) await offerFreedCapacity(order.bakeDayId, transaction, now);
  return { orderId: order.id, outcome: released ? 'hold expired' : `already ${order.status}` };
}

/**
 * A refund seen at the payments service (ours, or one made on its
 * dashboard). A refund may arrive before the payment's own completion event.
 */
async function chargeRefunded(charge: Stripe.Charge, transaction: Transaction, now: Date) {
  const intentId = intentIdOf(charge.payment_intent as string | { id: string } | null);
  let order = intentId ? await Order.findOne({ where: { paymentIntentId: intentId }, transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!order && intentId) {
    const intent = await context().payments.paymentIntents.retrieve(intentId).catch(() => null);
    const id = intent?.metadata?.orderId ?? charge.metadata?.orderId ?? null;
    order = await lockOrder(id, transaction);
    if (order) await order.update({ paymentIntentId: intentId }, { transaction });
  }
  if (!order) return { orderId: null, outcome: 'unknown payment' };
  const refunded = Math.max(order.refundedCents, Math.min(charge.amount_refunded, order.totalCents));
  await order.update({ refundedCents: refunded }, { transaction });
  if (refunded >= order.totalCents) {
    if (order.status === 'held' || order.status === 'paid') {
      const released = await releaseOrder(order.id, [order.status], 'refunded', transaction);
      if (released) await offerFreedCapacity(order.bakeDayId, transaction, now);
    } else if (order.status === 'expired') {
      await order.update({ status: 'refunded' }, { transaction });
    }
  }
  return { orderId: order.id, outcome: `refunded ${refunded}` };
}

