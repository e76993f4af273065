import { formatCents, type Me, type RefundView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { Order, Refund } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { refundPayment } from '../../integrations/checkout.js';
import { releaseOrder } from '../../db/queries/capacity.js';
import { queueRefundNotice } from '../mail/order-mails.js';
import { offerFreedCapacity } from '../waitlist/waitlist.js';
import { audit } from '../audit/audit.js';

/**
 * The owner refunds part or all of a paid order, at any time. The client's
 * request key makes a double-click refund once; the order row lock makes two
 * different refunds queue up, so the total can never be exceeded.
 */
export async function refundOrder(owner: Me, orderId: string, amountCents: number, reason: string, requestKey: string, now: Date): Promise<RefundView> {
  const refund = await database().transaction(async (transaction) => {
    const order = await Order.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!order) throw notFound('Order');
    const earlier = await Refund.findOne({ where: { requestKey }, transaction });
    if (earlier) {
      if (earlier.orderId !== orderId || earlier.amountCents !== amountCents) {
        throw new AppError('idempotency_mismatch', 'This request key was already used for a different refund', 409);
      }
      return earlier;
    }
    if (!order.paymentIntentId || !['paid', 'collected', 'no_show', 'cancelled', 'refunded'].includes(order.status)) {
      throw new AppError('not_refundable', 'This order has no payment to refund', 409);
    }
    const left = order.totalCents - order.refundedCents;
    if (amountCents > left) {
      throw new AppError('over_refund', `At most ${formatCents(left)} can still be refunded on this order`, 400, {
        fields: { amountCents: `At most ${formatCents(left)} can still be refunded` },
      });
    }
    const row = await refundPayment(order, amountCents, 'requested_by_customer', requestKey, owner.id, transaction, reason);
    if (amountCents === left && order.status === 'paid') {
      const released = await releaseOrder(order.id, ['paid'], 'refunded', transaction);
      if (released) await offerFreedCapacity(order.bakeDayId, transaction, now);
    }
    await queueRefundNotice(order.id, row.id, amountCents, transaction);
    await audit({ actorId: owner.id, action: 'order.refunded', subjectType: 'order', subjectId: order.id, details: { amountCents, reason } }, transaction);
    return row;
  });
  const order = await Order.findByPk(orderId);
  return {
    id: refund.id,
    orderId,
    amountCents: refund.amountCents,
    reason: refund.reason,
    createdAt: refund.createdAt.toISOString(),
    order: { status: order!.status, totalCents: order!.totalCents, refundedCents: order!.refundedCents },
  };
}
