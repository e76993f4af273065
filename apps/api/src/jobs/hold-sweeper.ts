import { Op } from 'sequelize';
import { database } from '../db/sequelize.js';
import { Order } from '../db/models/index.js';
import { releaseOrder } from '../db/queries/capacity.js';
import { expireCheckout } from '../integrations/checkout.js';
import { lapseOffers, offerFreedCapacity } from '../services/waitlist/waitlist.js';
import { applyCompletedSession } from '../services/payments/payment-events.js';
import { describePaymentsError } from '../services/payments/errors.js';
import { logger } from '../lib/logger.js';

/** How long a checkout session lives at the payments service (see openCheckout), plus a minute's slack. */
const SESSION_LIFETIME_MS = 32 * 60_000;

/**
 * Expires unpaid holds whose time is up. The checkout session is expired
 * first, so it can no longer be paid; if it turns out to be complete, the
 * payment is recorded now (its webhook may never come). If the payments
 * service can't be reached, the hold still goes once its session has
 * outlived its own expiry (nobody can pay it after that; a payment that did
 * get through is handled as a late one). The release itself is guarded by
 * the order's status, so racing the expiry webhook returns capacity once.
 */
export async function sweepHolds(now: Date): Promise<{ expired: number; lapsedOffers: number }> {
  const due = await Order.findAll({ where: { status: 'held', holdExpiresAt: { [Op.lte]: now } }, limit: 100, order: [['holdExpiresAt', 'ASC']] });
  let expired = 0;
  for (const order of due) {
    if (order.checkoutSessionId) {
      let status: 'expired' | 'complete' | 'open';
      try {
        status = await expireCheckout(order.checkoutSessionId);
      } catch (err) {
        if (now.getTime() - order.createdAt.getTime() < SESSION_LIFETIME_MS) continue;
        logger.warn({ orderId: order.id, payments: describePaymentsError(err) }, 'payments service unreachable; the session is past its own expiry, releasing the hold');
        status = 'expired';
      }
      if (status === 'complete') {
        await applyCompletedSession(order.checkoutSessionId, now).catch((err) => logger.error({ orderId: order.id, payments: describePaymentsError(err) }, 'could not record a completed checkout'));
        continue;
      }
      if (status !== 'expired') continue;
    }
    await database().transaction(async (transaction) => {
      const released = await releaseOrder(order.id, ['held'], 'expired', transaction);
      if (released) {
        expired += 1;
        await offerFreedCapacity(order.bakeDayId, transaction, now);
      }
    });
  }
  const lapsedOffers = await lapseOffers(now);
  return { expired, lapsedOffers };
}
