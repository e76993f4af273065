import type Stripe from 'stripe';
import { boxLabel, type BakeDayView, type Me } from '@fryline/schemas';
import type { Order } from '../db/models/index.js';
import { context } from './context.js';
import type { CheckedOrder } from '../services/orders/order-rules.js';

/**
 * Opens hosted checkout for a held order. The idempotency key ties the
 * session to this order and this hold, so a retried request can't open a
 * second session. It charges in the order's own currency. The session itself must live at least 30 minutes (the
 * payments service's minimum); the shorter hold is enforced by expiring the
 * session when the hold lapses.
 */
export async function openCheckout(order: Pick<Order, 'id' | 'bakeDayId' | 'holdExpiresAt' | 'currency'>, user: Me, checked: CheckedOrder, day: BakeDayView, now: Date): Promise<Stripe.Checkout.Session> {
  const { config, payments } = context();
  const { currency } = order;
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
    // already complete or expired is an answer; still open means the expiry didn't happen
    const session = await payments.checkout.sessions.retrieve(sessionId).catch(() => null);
    if (!session || session.status === 'open') throw err;
    return session.status as 'expired' | 'complete';
  }
}
