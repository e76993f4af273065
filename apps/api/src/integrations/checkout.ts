import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { boxLabel, type BakeDayView, type Me } from '@fryline/schemas';
import { Order, Refund } from '../db/models/index.js';
import { context } from './context.js';
import type { CheckedOrder } from '../services/orders/order-rules.js';
import { shopSettings } from '../services/shop/settings.js';

/**
 * Opens hosted checkout for a held order. The idempotency key ties the
 * session to this order and this hold, so a retried request can't open a
 * second session. The session itself must live at least 30 minutes (the
 * payments service's minimum); the shorter hold is enforced by expiring the
 * session when the hold lapses.
 */
export async function openCheckout(order: Order, user: Me, checked: CheckedOrder, day: BakeDayView, now: Date): Promise<Stripe.Checkout.Session> {
  const { config, payments } = context();
  const { currency } = await shopSettings();
  const lineItems: Stripe.Checkout.SessionCreateParams.LineItem[] = checked.boxes.map((box, i) => ({
    quantity: 1,
    price_data: {
      currency,
      unit_amount: checked.price.boxesCents[i]!,
      product_data: { name: `${boxLabel(box.size)}: ${box.lines.map((l) => `${l.quantity} ${l.name}`).join(', ')}`.slice(0, 250) },
    },
  }));
  if (day.tax.mode === 'added' && checked.price.taxCents > 0) {
    lineItems.push({ quantity: 1, price_data: { currency, unit_amount: checked.price.taxCents, product_data: { name: 'Sales tax' } } });
  }
  return payments.checkout.sessions.create(
    {
      mode: 'payment',
      line_items: lineItems,
      success_url: `${config.publicUrl}/orders/${order.id}?paid=1`,
      cancel_url: `${config.publicUrl}/orders/${order.id}?payment=cancelled`,
      expires_at: Math.floor(now.getTime() / 1000) + 31 * 60,
      client_reference_id: order.id,
      customer_email: user.email,
      metadata: { orderId: order.id, bakeDayId: order.bakeDayId },
      payment_intent_data: { metadata: { orderId: order.id } },
    },
    { idempotencyKey: `checkout:${order.id}:${order.holdExpiresAt?.toISOString()}` },
  );
}

/** Expires an open checkout session; one that is already over is left as it is. Returns its final status. */
export async function expireCheckout(sessionId: string): Promise<'expired' | 'complete' | 'open'> {
  const { payments } = context();
  try {
    const session = await payments.checkout.sessions.expire(sessionId);
    return (session.status ?? 'expired') as 'expired' | 'complete' | 'open';
  } catch (err) {
    const session = await payments.checkout.sessions.retrieve(sessionId).catch(() => null);
    if (!session) throw err;
    return (session.status ?? 'open') as 'expired' | 'complete' | 'open';
  }
}

/**
 * Refunds part or all of an order's payment through the payments API and
 * records it. `key` makes the call idempotent end to end.
 */
export async function refundPayment(
  order: Order,
  amountCents: number,
  reason: 'requested_by_customer' | 'duplicate' | 'fraudulent',
  key: string,
  requestedBy: string | null,
  transaction: Transaction,
  note: string = reason,
): Promise<Refund> {
  if (!order.paymentIntentId) throw new Error(`order ${order.id} has no payment to refund`);
  const refund = await context().payments.refunds.create(
    { payment_intent: order.paymentIntentId, amount: amountCents, reason, metadata: { orderId: order.id } },
    { idempotencyKey: `refund:${key}` },
  );
  await Order.increment({ refundedCents: amountCents }, { where: { id: order.id }, transaction });
  const [row] = await Refund.findOrCreate({
    where: { providerRefundId: refund.id },
    defaults: { orderId: order.id, providerRefundId: refund.id, requestKey: key, amountCents, reason: note, requestedBy },
    transaction,
  });
  return row;
}
