import { QueryTypes } from 'sequelize';
import type { PaymentFlagView } from '@fryline/schemas';
import { database } from '../sequelize.js';

interface FlagRow {
  id: string;
  order_id: string | null;
  checkout_session_id: string;
  problem: string;
  amount_cents: number;
  currency: string;
  refund_status: PaymentFlagView['refundStatus'];
  created_at: Date;
  customer_name: string | null;
  customer_email: string | null;
  bake_day_id: string | null;
  bake_day_date: string | null;
  order_status: string | null;
  total_cents: number | null;
}

/** Payments that did not match their order, newest first, with the order's customer and bake day, for the owner. */
export async function listPaymentFlags(limit = 200): Promise<PaymentFlagView[]> {
  const rows = await database().query<FlagRow>(
    `SELECT f.id, f.order_id, f.checkout_session_id, f.problem, f.amount_cents, f.currency, f.refund_status, f.created_at,
            COALESCE(NULLIF(u.name, ''), u.email) AS customer_name, u.email AS customer_email,
            o.bake_day_id, d.date::text AS bake_day_date, o.status AS order_status, o.total_cents
       FROM payment_flags f
       LEFT JOIN orders o ON o.id = f.order_id
       LEFT JOIN users u ON u.id = o.user_id
       LEFT JOIN bake_days d ON d.id = o.bake_day_id
      ORDER BY f.created_at DESC LIMIT :limit`,
    { replacements: { limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id,
    orderId: r.order_id,
    checkoutSessionId: r.checkout_session_id,
    problem: r.problem,
    amountCents: r.amount_cents,
    currency: r.currency,
    refundStatus: r.refund_status,
    createdAt: r.created_at.toISOString(),
    order:
      r.order_id && r.bake_day_id
        ? { customerName: r.customer_name ?? '', customerEmail: r.customer_email ?? '', bakeDayId: r.bake_day_id, bakeDayDate: r.bake_day_date ?? '', status: r.order_status ?? '', totalCents: r.total_cents ?? 0 }
        : null,
  }));
}
