import type Stripe from 'stripe';
import type { Transaction } from 'sequelize';
import { Order } from '../../db/models/index.js';
import { context } from '../../integrations/context.js';

/**
 * Stores the processing fee the payments service took on an order's charge,
 * read from the charge's balance transaction, for the weekly sales. Called
 * when the payment lands. A failed lookup never holds up the payment: the
 * fee stays 0 and the error is logged.
 */
export async function recordProcessingFee(orderId: string, paymentIntentId: string | null, transaction: Transaction): Promise<void> {
  if (!paymentIntentId) return;
  try {
    const intent = await context().payments.paymentIntents.retrieve(paymentIntentId, { expand: ['latest_charge.balance_transaction'] });
    const charge = intent.latest_charge as Stripe.Charge | string | null;
    const txn = typeof charge === 'object' && charge ? (charge.balance_transaction as Stripe.BalanceTransaction | string | null) : null;
    if (!txn || typeof txn === 'string') return;
    await Order.update({ feeCents: txn.fee }, { where: { id: orderId }, transaction });
  } catch (err) {
    console.error(`[payments] fee for order ${orderId} could not be read:`, (err as Error).message);
  }
}
