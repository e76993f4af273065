import type { Transaction } from 'sequelize';
import { BakeDay, Order, PickupWindow, User } from '../../db/models/index.js';
import { extendChangeGrace } from '../../db/queries/bake-day-edit.js';
import { enqueueMail } from '../mail/outbox.js';
import { mailShopOf, paragraphMail } from '../mail/templates.js';
import { windowText } from '../mail/order-mails.js';
import { shopSettings } from '../shop/settings.js';
import { context } from '../../integrations/context.js';

export interface OrderChange {
  /** The window the order was in when the change was made. */
  windowId: string;
  lines: string[];
}

/**
 * One e-mail per paid order touched by a change, queued in the change's
 * transaction: what changed, where and when to collect now, and a link to
 * move to another window or cancel with a full refund (allowed until the
 * order's pickup, even past the cut-off). Returns how many were queued.
 */
export async function queueChangeNotices(changeId: string, orders: Map<string, OrderChange>, transaction: Transaction): Promise<number> {
  if (orders.size === 0) return 0;
  const settings = await shopSettings(transaction);
  const { shopName } = settings;
  const { publicUrl } = context().config;
  let queued = 0;
  for (const [orderId, change] of orders) {
    const order = await Order.findByPk(orderId, {
      include: [{ model: User, as: 'user' }, { model: BakeDay, as: 'bakeDay' }, { model: PickupWindow, as: 'pickupWindow' }],
      transaction,
    });
    if (!order) continue;
    const day = order.bakeDay!;
    const window = order.pickupWindow!;
    await extendChangeGrace(order.id, window.startsAt, transaction);
    const url = `${publicUrl}/orders/${order.id}?changed=1`;
    const mail = await paragraphMail(`We changed your pickup — ${shopName}`, [
      `Hello ${order.user!.name || 'there'},`,
      `We had to change the bake day you ordered for:`,
      ...change.lines.map((l) => `• ${l}`),
      window.removedAt
        ? `Your order is still safe. Pick a new window here: ${url}`
        : `Your pickup now: ${day.place}${day.address ? `, ${day.address}` : ''}\n${windowText(day, window)}\nYour pickup code stays ${order.pickupCode}.`,
      `If this no longer suits you, move to another pickup window or cancel for a full refund (no questions asked) here: ${url}`,
      'Sorry for the trouble.',
    ], mailShopOf(settings));
    await enqueueMail({ kind: 'bake-day-change', to: order.user!.email, ...mail, dedupeKey: `bake-day-change:${changeId}:${order.id}` }, transaction);
    queued += 1;
  }
  return queued;
}
