import { Op } from 'sequelize';
import { database } from '../db/sequelize.js';
import { Order } from '../db/models/index.js';
import { releaseOrder } from '../db/queries/capacity.js';
import { expireCheckout } from '../integrations/checkout.js';
import { lapseOffers, offerFreedCapacity } from '../services/waitlist/waitlist.js';

/**
 * Expires unpaid holds whose time is up. The checkout session is expired
 * first, so it can no longer be paid; if it turns out to be paid already, the
 * order is left for the payment event. The release itself is guarded by the
 * order's status, so racing the expiry webhook returns capacity once.
 */
export async function sweepHolds(now: Date): Promise<{ expired: number; lapsedOffers: number }> {
  const due = await Order.findAll({ where: { status: 'held', holdExpiresAt: { [Op.lte]: now } }, limit: 100, order: [['holdExpiresAt', 'ASC']] });
  let expired = 0;
  for (const order of due) {
    if (order.checkoutSessionId) {
      const status = await expireCheckout(order.checkoutSessionId).catch(() => 'open' as const);
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
