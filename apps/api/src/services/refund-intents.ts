import { QueryTypes, type Transaction } from 'sequelize';
import { formatCents } from '@fryline/schemas';
import { database } from '../db/sequelize.js';
import { Order, Refund } from '../db/models/index.js';
import { AppError } from '../lib/app-error.js';
import { context } from './context.js';
import { describePaymentsError, isDefinitiveRefusal, paymentsError } from './payments-errors.js';

// Refunds exactly once: a refund is first written as an intent ('pending',
// with the amount, the reason and the key the payments service will see),
// in the transaction that holds the order's row lock; only then is the
// service called, and the answer confirms the intent. The key is made from
// the order and the refunded total the refund brings it to, so a retry of
// the same intent (a crash, a timeout, the owner trying again) is the same
// request to the service, and two different refunds never share a key.

/** Cents of the order's refunds that are recorded but not yet confirmed. */
export async function pendingRefundCents(orderId: string, transaction: Transaction): Promise<number> {
  const [row] = await database().query<{ cents: number }>(
    `SELECT COALESCE(SUM(amount_cents), 0)::int AS cents FROM refunds WHERE order_id = :orderId AND status = 'pending'`,
    { replacements: { orderId }, type: QueryTypes.SELECT, transaction },
  );
  return row?.cents ?? 0;
}

/** What can still be refunded on an order whose row the caller has locked. */
export async function refundableCents(order: Order, transaction: Transaction): Promise<number> {
  return order.totalCents - order.refundedCents - (await pendingRefundCents(order.id, transaction));
}

/**
 * Records a refund intent. The caller holds the order's row lock (so the
 * amount left can't change underneath) and has checked the order may be
 * refunded. Throws over_refund when the amount is more than is left.
 */
export async function recordRefundIntent(
  order: Order,
  amountCents: number,
  note: string,
  requestedBy: string | null,
  requestKey: string | null,
  transaction: Transaction,
): Promise<Refund> {
  const left = await refundableCents(order, transaction);
  if (amountCents > left) {
    throw new AppError('over_refund', `At most ${formatCents(Math.max(0, left))} can still be refunded on this order`, 400, {
      fields: { amountCents: `At most ${formatCents(Math.max(0, left))} can still be refunded` },
    });
  }
  const newTotal = order.totalCents - left + amountCents;
  // a key is spent by an intent the service refused for good; the next one at that total gets a suffix
  const spent = await Refund.count({ where: { orderId: order.id, refundedTotalCents: newTotal }, transaction });
  const providerKey = `refund:${order.id}:${newTotal}${spent ? `:${spent + 1}` : ''}`;
  return Refund.create(
    { orderId: order.id, amountCents, reason: note, requestedBy, requestKey, status: 'pending', providerKey, refundedTotalCents: newTotal, providerRefundId: null },
    { transaction },
  );
}

/**
 * Sends a recorded intent to the payments service (always with its own key)
 * and confirms it. A refusal for good marks it failed; any other failure
 * leaves it pending for the retry job. Either way the caller gets 502
 * payments_error, and the service's message is logged.
 */
export async function sendRefundIntent(refundId: string): Promise<Refund> {
  const intent = await Refund.findByPk(refundId);
  if (!intent) throw new Error(`refund intent ${refundId} not found`);
  if (intent.status !== 'pending') return intent;
  const order = await Order.findByPk(intent.orderId);
  if (!order?.paymentIntentId) throw new Error(`order ${intent.orderId} has no payment to refund`);
  let providerRefundId: string;
  try {
    const refund = await context().payments.refunds.create(
      { payment_intent: order.paymentIntentId, amount: intent.amountCents, reason: 'requested_by_customer', metadata: { orderId: order.id, refundId: intent.id } },
      { idempotencyKey: intent.providerKey! },
    );
    providerRefundId = refund.id;
  } catch (err) {
    const definitive = isDefinitiveRefusal(err);
    const described = describePaymentsError(err);
    console.error(`[payments] refund ${intent.id} of order ${order.id} (${intent.amountCents} cents) ${definitive ? 'refused' : 'not confirmed, will retry'}: ${described}`);
    await intent.update({ status: definitive ? 'failed' : 'pending', lastError: described.slice(0, 500) });
    throw paymentsError(
      definitive
        ? 'The card payments service refused this refund. Nothing was refunded.'
        : 'The card payments service did not answer. The refund is recorded and will be sent again automatically; nothing is refunded twice.',
    );
  }
  return confirmRefund(intent.id, providerRefundId);
}

/** Marks an intent done and the order's refunded total up to what has been confirmed. */
export async function confirmRefund(refundId: string, providerRefundId: string): Promise<Refund> {
  return database().transaction(async (transaction) => {
    const intent = await Refund.findByPk(refundId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!intent) throw new Error(`refund intent ${refundId} not found`);
    await Order.findByPk(intent.orderId, { transaction, lock: transaction.LOCK.UPDATE });
    if (intent.status !== 'succeeded') {
      await intent.update({ status: 'succeeded', providerRefundId, confirmedAt: new Date(), lastError: null }, { transaction });
    }
    await database().query(
      `UPDATE orders SET refunded_cents = GREATEST(refunded_cents,
              (SELECT COALESCE(SUM(amount_cents), 0) FROM refunds WHERE order_id = :orderId AND status = 'succeeded')),
              updated_at = now()
        WHERE id = :orderId`,
      { replacements: { orderId: intent.orderId }, transaction },
    );
    return intent;
  });
}

/** Sends intents still pending after `olderThanMs` (the job); returns how many were confirmed. */
export async function retryPendingRefunds(olderThanMs = 30_000, limit = 50): Promise<number> {
  const due = await Refund.findAll({
    where: { status: 'pending' },
    order: [['createdAt', 'ASC']],
    limit,
  });
  let done = 0;
  for (const intent of due) {
    if (Date.now() - intent.createdAt.getTime() < olderThanMs) continue;
    try {
      await sendRefundIntent(intent.id);
      done += 1;
    } catch {
      // logged by sendRefundIntent; tried again next round
    }
  }
  return done;
}
