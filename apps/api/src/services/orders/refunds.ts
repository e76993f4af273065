import type { Me, RefundView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { Order, Refund } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { recordRefundIntent, sendRefundIntent } from '../payments/refund-intents.js';

/**
 * The owner refunds part or all of a paid order, at any time. The refund is
 * recorded as an intent under the order's row lock before the payments
 * service is called (so two refunds queue up and the total can never be
 * exceeded), then sent with a key made from the order and the new refunded
 * total, then confirmed. The client's request key makes a double-click
 * refund once; asking again for an amount still being confirmed (a reopened
 * dialog after a failure) finishes that refund instead of making a second.
 */
export async function refundOrder(owner: Me, orderId: string, amountCents: number, reason: string, requestKey: string, now: Date): Promise<RefundView> {
  const earlier = await Refund.findOne({ where: { requestKey } });
  if (earlier) {
    if (earlier.orderId !== orderId || earlier.amountCents !== amountCents) {
      throw new AppError('idempotency_mismatch', 'This request key was already used for a different refund', 409);
    }
    return view(await sendRefundIntent(earlier.id, now));
  }
  const unconfirmed = await Refund.findOne({ where: { orderId, status: 'pending', amountCents, kind: 'owner' }, order: [['createdAt', 'ASC']] });
  if (unconfirmed) return view(await sendRefundIntent(unconfirmed.id, now));

  const intent = await database().transaction(async (transaction) => {
    const order = await Order.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!order) throw notFound('Order');
    // a double click: the first request recorded it while this one waited for the lock
    const twin = await Refund.findOne({ where: { requestKey }, transaction });
    if (twin) {
      if (twin.orderId !== orderId || twin.amountCents !== amountCents) throw new AppError('idempotency_mismatch', 'This request key was already used for a different refund', 409);
      return twin;
    }
    if (!order.paymentIntentId || !['paid', 'collected', 'no_show', 'cancelled', 'refunded'].includes(order.status)) {
      throw new AppError('not_refundable', 'This order has no payment to refund', 409);
    }
    const row = await recordRefundIntent(order, amountCents, reason, { kind: 'owner', requestedBy: owner.id, requestKey }, transaction);
    await audit({ actorId: owner.id, action: 'order.refund_requested', subjectType: 'order', subjectId: order.id, details: { amountCents, reason } }, transaction);
    return row;
  });
  return view(await sendRefundIntent(intent.id, now));
}

async function view(refund: Refund): Promise<RefundView> {
  const order = await Order.findByPk(refund.orderId);
  return {
    id: refund.id,
    orderId: refund.orderId,
    amountCents: refund.amountCents,
    reason: refund.reason,
    createdAt: refund.createdAt.toISOString(),
    order: { status: order!.status, totalCents: order!.totalCents, refundedCents: order!.refundedCents },
  };
}
