import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { database } from '../../db/sequelize.js';
import { eventRecorded, recordEvent, recordOutcome } from '../../db/queries/payment-events.js';
import { Order } from '../../db/models/index.js';
import { context } from '../../integrations/context.js';
import { releaseOrder, takeCapacity, takeWindowSlot } from '../../db/queries/capacity.js';
import { recountSurplusForOrder } from '../../db/queries/surplus.js';
import { newPickupCode } from '../orders/pickup-codes.js';
import { queueConfirmation, queueLateRefundApology } from '../mail/order-mails.js';
import { afterCommitting, recordRefundIntent, refundableCents, runAfterCommit, sendAfterCommit } from './refund-intents.js';
import { flagMismatch, intentIdOf, orderIdOfSession, refundFlagged, retrieveSession, sessionProblem } from './payment-checks.js';
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
  // a checkout session is judged as the payments service has it now, never by the event's copy
  const isSession = event.type.startsWith('checkout.session.');
  if (isSession && (await eventRecorded(event.id))) return 'duplicate';
  const session = isSession ? await retrieveSession((event.data.object as Stripe.Checkout.Session).id) : null;
  let committed: Transaction | null = null;
  const result = await database().transaction(async (transaction) => {
    committed = transaction;
    if (!(await recordEvent(event.id, event.type, transaction))) return 'duplicate' as const;
    let orderId: string | null = null;
    let outcome = 'ignored';
    switch (event.type) {
      case 'checkout.session.completed':
      case 'checkout.session.async_payment_succeeded':
        ({ orderId, outcome } = await sessionPaid(session!, transaction, now));
        break;
      case 'checkout.session.expired':
        ({ orderId, outcome } = await sessionExpired(session!, transaction, now));
        break;
      case 'charge.refunded':
        ({ orderId, outcome } = await chargeRefunded(event.data.object as Stripe.Charge, transaction, now));
        break;
      default:
        break;
    }
    await recordOutcome(event.id, orderId, outcome, transaction);
    return 'applied' as const;
  });
  // refunds the event called for, once its effect is committed
  if (result === 'applied') await runAfterCommit(committed);
  return result;
}

/**
 * A session found complete by someone else than its webhook (the sweeper, a
 * cancellation, the reconciler): applied as its completion event would be,
 * once per session however many find it.
 */
export async function applyCompletedSession(sessionId: string, now: Date): Promise<'applied' | 'duplicate'> {
  const event = { id: `reconcile:${sessionId}`, object: 'event', type: 'checkout.session.completed', created: Math.floor(now.getTime() / 1000), data: { object: { id: sessionId } } };
  return handlePaymentEvent(event as unknown as Stripe.Event, now);
}


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
  await recountSurplusForOrder(order.id, order.bakeDayId, transaction);
  await recordProcessingFee(order.id, paymentIntentId, transaction);
  await queueConfirmation(order.id, transaction);
  await audit({ actorId: null, action: 'order.paid', subjectType: 'order', subjectId: order.id }, transaction);
}

async function sessionPaid(session: Stripe.Checkout.Session, transaction: Transaction, now: Date) {
  const order = await lockOrder(orderIdOfSession(session), transaction);
  if (session.payment_status !== 'paid') return { orderId: order?.id ?? null, outcome: 'not paid yet' };
  const problem = order ? sessionProblem(session, order) : `session ${session.id} names no order of ours`;
  if (problem) {
    // never marks the order paid: flagged for the owner, the money refunded in full
    const flagId = await flagMismatch(session, order, problem, transaction);
    if (flagId) afterCommitting(transaction, () => refundFlagged(flagId));
    return { orderId: order?.id ?? null, outcome: `flagged: ${problem}`.slice(0, 200) };
  }
  if (!order) return { orderId: null, outcome: 'unknown order' };
  const paymentIntentId = intentIdOf(session.payment_intent as string | { id: string } | null);
  if (!order.checkoutSessionId) await order.update({ checkoutSessionId: session.id }, { transaction });
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
      return refundLate(order, paymentIntentId, transaction, now);
    }
    case 'cancelled':
      return refundLate(order, paymentIntentId, transaction, now);
    default:
      // already paid, collected, refunded …: nothing more to do
      if (!order.paymentIntentId && paymentIntentId) await order.update({ paymentIntentId }, { transaction });
      return { orderId: order.id, outcome: `already ${order.status}` };
  }
}

async function refundLate(order: Order, paymentIntentId: string | null, transaction: Transaction, now: Date) {
  await order.update({ paymentIntentId, status: 'refunded', holdsCapacity: false }, { transaction });
  const due = await refundableCents(order, transaction);
  if (due > 0) {
    const intent = await recordRefundIntent(order, due, 'paid after the hold lapsed or the order was cancelled', { kind: 'late', requestedBy: null }, transaction);
    sendAfterCommit(intent.id, transaction, now);
  }
  await queueLateRefundApology(order.id, transaction);
  return { orderId: order.id, outcome: 'paid late, refunded' };
}

async function sessionExpired(session: Stripe.Checkout.Session, transaction: Transaction, now: Date) {
  if (session.status !== 'expired') return { orderId: null, outcome: `session is ${session.status}` };
  const orderId = orderIdOfSession(session);
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

