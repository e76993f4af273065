import { Op } from 'sequelize';
import { Order, ShopSettings } from '@fryline/api/db';
import type { createPaymentsClient } from '@fryline/api/integrations/payments';

type Payments = ReturnType<typeof createPaymentsClient>;

/**
 * Gives the demo's paid orders a real payment at the payments stand-in (a
 * checkout session paid with the published success test card, and the refund
 * for those the demo shows refunded), so the owner can refund them like any
 * other order. Only orders without a payment are touched, and every call
 * carries an idempotency key made from the order, so running it again (or
 * after a crash half way) does nothing twice.
 */
export async function seedDemoPayments(payments: Payments, fakeUrl: string, shopUrl: string): Promise<number> {
  const orders = await Order.findAll({
    where: { paymentIntentId: null, status: { [Op.in]: ['paid', 'collected', 'no_show', 'refunded', 'cancelled'] } },
    order: [['createdAt', 'ASC']],
  });
  const currency = (await ShopSettings.findByPk(1))?.currency ?? 'usd';
  for (const order of orders) {
    const session = await payments.checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [{ quantity: 1, price_data: { currency, unit_amount: order.totalCents, product_data: { name: 'Demo order' } } }],
        success_url: `${shopUrl}/orders/${order.id}?paid=1`,
        cancel_url: `${shopUrl}/orders/${order.id}?payment=cancelled`,
        client_reference_id: order.id,
        metadata: { orderId: order.id, bakeDayId: order.bakeDayId },
        payment_intent_data: { metadata: { orderId: order.id } },
      },
      { idempotencyKey: `demo-checkout:${order.id}` },
    );
    if (session.status === 'open') {
      // 4242 4242 4242 4242: the published test card that always succeeds
      const paid = await fetch(`${fakeUrl}/__admin/sessions/${session.id}/pay`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ cardNumber: '4242424242424242' }),
      });
      if (!paid.ok && paid.status !== 409) throw new Error(`the payments stand-in refused the demo payment (${paid.status})`);
    }
    const done = await payments.checkout.sessions.retrieve(session.id);
    const intentId = typeof done.payment_intent === 'string' ? done.payment_intent : done.payment_intent?.id;
    if (!intentId) throw new Error(`demo session ${session.id} has no payment`);
    if (order.refundedCents > 0) {
      await payments.refunds.create(
        { payment_intent: intentId, amount: order.refundedCents, reason: 'requested_by_customer', metadata: { orderId: order.id } },
        { idempotencyKey: `demo-refund:${order.id}` },
      );
    }
    await order.update({ checkoutSessionId: session.id, paymentIntentId: intentId });
  }
  return orders.length;
}
