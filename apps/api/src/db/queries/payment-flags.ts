import { QueryTypes } from 'sequelize';
import type { PaymentFlagView } from '@fryline/schemas';
import { database } from '../sequelize.js';

/** Payments that did not match their order, newest first, for the owner. */
export async function listPaymentFlags(limit = 200): Promise<PaymentFlagView[]> {
  const rows = await database().query<{
    id: string; order_id: string | null; checkout_session_id: string; problem: string; amount_cents: number; currency: string; refund_status: PaymentFlagView['refundStatus']; created_at: Date;
  }>(`SELECT id, order_id, checkout_session_id, problem, amount_cents, currency, refund_status, created_at FROM payment_flags ORDER BY created_at DESC LIMIT :limit`, {
    replacements: { limit },
    type: QueryTypes.SELECT,
  });
  return rows.map((r) => ({
    id: r.id,
    orderId: r.order_id,
    checkoutSessionId: r.checkout_session_id,
    problem: r.problem,
    amountCents: r.amount_cents,
    currency: r.currency,
    refundStatus: r.refund_status,
    createdAt: r.created_at.toISOString(),
  }));
}
