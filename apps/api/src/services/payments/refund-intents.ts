import { QueryTypes, type Transaction } from 'sequelize';
import { formatCents } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { Order, Refund } from '../../db/models/index.js';
import { releaseOrder } from '../../db/queries/capacity.js';
import { AppError } from '../../lib/app-error.js';
import { logger } from '../../lib/logger.js';
import { context } from '../../integrations/context.js';
import { describePaymentsError, isDefinitiveRefusal, paymentsError } from './errors.js';
import { offerFreedCapacity } from '../waitlist/waitlist.js';
import { queueRefundNotice } from '../mail/order-mails.js';
import { audit } from '../audit/audit.js';

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
  who: { kind: 'owner' | 'cancel' | 'late'; requestedBy: string | null; requestKey?: string | null },
  transaction: Transaction,
): Promise<Refund> {
  const left = await refundableCents(order, transaction);
  if (amountCents > left) {
    const most = formatCents(Math.max(0, left), order.currency);
    throw new AppError('over_refund', `At most ${most} can still be refunded on this order`, 400, {
      fields: { amountCents: `At most ${most} can still be refunded` },
    });
  }
  const newTotal = order.totalCents - left + amountCents;
  // a key is spent by an intent the service refused for good; the next one at that total gets a suffix
  const spent = await Refund.count({ where: { orderId: order.id, refundedTotalCents: newTotal }, transaction });
  const providerKey = `refund:${order.id}:${newTotal}${spent ? `:${spent + 1}` : ''}`;
  return Refund.create(
    {
      orderId: order.id,
      amountCents,
      reason: note,
      kind: who.kind,
      requestedBy: who.requestedBy,
      requestKey: who.requestKey ?? null,
      status: 'pending',
      providerKey,
      refundedTotalCents: newTotal,
      providerRefundId: null,
    },
    { transaction },
  );
}

/**
 * Sends a recorded intent to the payments service (always with its own key)
 * and confirms it. A refusal for good marks it failed; any other failure
 * leaves it pending for the retry job. Either way the caller gets 502
 * payments_error, and the service's message is logged.
 */
export async function sendRefundIntent(refundId: string, now: Date): Promise<Refund> {
  const intent = await Refund.findByPk(refundId);
  if (!intent) throw new Error(`refund intent ${refundId} not found`);
  if (intent.status === 'failed') throw paymentsError('The card payments service refused this refund. Nothing was refunded.');
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
    logger.error({ refundId: intent.id, orderId: order.id, amountCents: intent.amountCents, payments: described }, definitive ? 'refund refused by the payments service' : 'refund not confirmed by the payments service; it will be retried');
    await intent.update({ status: definitive ? 'failed' : 'pending', lastError: described.slice(0, 500) });
    throw paymentsError(
      definitive
        ? 'The card payments service refused this refund. Nothing was refunded.'
        : 'The card payments service did not answer. The refund is recorded and will be sent again automatically; nothing is refunded twice.',
    );
  }
  return confirmRefund(intent.id, providerRefundId, now);
}

/**
 * Marks an intent done and brings the order's refunded total up to what has
 * been confirmed. The first confirmation of an owner's refund also tells the
 * customer and, when nothing is left to refund on a paid order, gives its
 * pieces back (whoever confirms it: the request, or the retry job).
 */
export async function confirmRefund(refundId: string, providerRefundId: string, now: Date): Promise<Refund> {
  return database().transaction(async (transaction) => {
    const intent = await Refund.findByPk(refundId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!intent) throw new Error(`refund intent ${refundId} not found`);
    const order = await Order.findByPk(intent.orderId, { transaction, lock: transaction.LOCK.UPDATE });
    if (intent.status === 'succeeded') return intent;
    await intent.update({ status: 'succeeded', providerRefundId, confirmedAt: now, lastError: null }, { transaction });
    const [row] = await database().query<{ refunded_cents: number; total_cents: number; status: string }>(
      `UPDATE orders SET refunded_cents = GREATEST(refunded_cents,
              (SELECT COALESCE(SUM(amount_cents), 0) FROM refunds WHERE order_id = :orderId AND status = 'succeeded')),
              updated_at = now()
        WHERE id = :orderId RETURNING refunded_cents, total_cents, status`,
      { replacements: { orderId: intent.orderId }, type: QueryTypes.SELECT, transaction },
    );
    if (intent.kind === 'owner' && order && row) {
      if (row.refunded_cents >= row.total_cents && row.status === 'paid') {
        const released = await releaseOrder(order.id, ['paid'], 'refunded', transaction);
        if (released) await offerFreedCapacity(order.bakeDayId, transaction, now);
      }
      await queueRefundNotice(order.id, intent.id, intent.amountCents, transaction);
      await audit({ actorId: intent.requestedBy, action: 'order.refunded', subjectType: 'order', subjectId: order.id, details: { amountCents: intent.amountCents, reason: intent.reason } }, transaction);
    }
    return intent;
  });
}

const afterCommit = new WeakMap<Transaction, Array<() => Promise<unknown>>>();

/** Work for the payments service once `transaction` has committed: run by runAfterCommit (a failure is left to the retry jobs). */
export function afterCommitting(transaction: Transaction, work: () => Promise<unknown>): void {
  const list = afterCommit.get(transaction) ?? [];
  list.push(work);
  afterCommit.set(transaction, list);
}

/** Sends an intent once its transaction has committed. */
export function sendAfterCommit(refundId: string, transaction: Transaction, now: Date): void {
  afterCommitting(transaction, () => sendRefundIntent(refundId, now));
}

/** Runs what afterCommitting queued for a committed transaction; failures are logged where they happen and retried by the jobs. */
export async function runAfterCommit(transaction: Transaction | null): Promise<void> {
  if (!transaction) return;
  const list = afterCommit.get(transaction) ?? [];
  afterCommit.delete(transaction);
  for (const work of list) await work().catch(() => {});
}

/** Sends intents still pending after `olderThanMs` (the job); returns how many were confirmed. */
export async function retryPendingRefunds(now: Date, olderThanMs = 30_000, limit = 50): Promise<number> {
  const due = await Refund.findAll({
    where: { status: 'pending' },
    order: [['createdAt', 'ASC']],
    limit,
  });
  let done = 0;
  for (const intent of due) {
    if (now.getTime() - intent.createdAt.getTime() < olderThanMs) continue;
    try {
      await sendRefundIntent(intent.id, now);
      done += 1;
    } catch {
      // logged by sendRefundIntent; tried again next round
    }
  }
  return done;
}
