import type Stripe from 'stripe';
import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../../db/sequelize.js';
import type { Order } from '../../db/models/index.js';
import { logger } from '../../lib/logger.js';
import { context } from '../../integrations/context.js';
import { audit } from '../audit/audit.js';
import { describePaymentsError } from './errors.js';
import { formatCents } from '@fryline/schemas';

// The payments company's own advice for fulfilment: don't trust the event's
// copy of the checkout session; retrieve it, and check that it is the
// order's session, for the order's amount and currency, and paid. A session
// that fails any check never marks the order paid: the money is refunded in
// full at once and the case is flagged for the owner.

export const intentIdOf = (value: string | { id: string } | null | undefined) => (typeof value === 'string' ? value : value?.id ?? null);
export const orderIdOfSession = (session: Pick<Stripe.Checkout.Session, 'metadata' | 'client_reference_id'>) => session.metadata?.orderId ?? session.client_reference_id ?? null;

/** The session as the payments service has it now (not as an event or a caller describes it). */
export function retrieveSession(id: string): Promise<Stripe.Checkout.Session> {
  return context().payments.checkout.sessions.retrieve(id);
}

/**
 * What is wrong with a completed session as the payment for `order`, or null
 * when it is the order's own, for its amount and currency, and paid. A
 * session id the order never recorded (a crash between opening checkout and
 * saving its id) is accepted only when the session names the order as its
 * client reference as well as in its metadata.
 */
export function sessionProblem(session: Stripe.Checkout.Session, order: Order): string | null {
  const { currency } = order;
  if (session.payment_status !== 'paid') return null; // not a payment (yet); nothing to accept or refund
  if (order.checkoutSessionId ? session.id !== order.checkoutSessionId : session.client_reference_id !== order.id) {
    return `session ${session.id} is not the order's checkout session (${order.checkoutSessionId ?? 'none recorded'})`;
  }
  if (session.amount_total !== order.totalCents) {
    return `paid ${formatCents(session.amount_total ?? 0, session.currency ?? currency)} but the order's total is ${formatCents(order.totalCents, currency)}`;
  }
  if ((session.currency ?? '').toLowerCase() !== currency.toLowerCase()) return `paid in ${session.currency} but the order is priced in ${currency}`;
  return null;
}

interface FlagRow {
  id: string;
  payment_intent_id: string | null;
  amount_cents: number;
  refund_status: string;
  checkout_session_id: string;
}

/**
 * Flags a session that doesn't match its order (once per session, inside
 * the event's transaction) and records the full refund as pending. Returns
 * the flag's id when this call made it; the refund is sent after commit.
 */
export async function flagMismatch(session: Stripe.Checkout.Session, order: Order | null, problem: string, transaction: Transaction): Promise<string | null> {
  const intentId = intentIdOf(session.payment_intent as string | { id: string } | null);
  const rows = await database().query<{ id: string }>(
    `INSERT INTO payment_flags (order_id, checkout_session_id, payment_intent_id, problem, amount_cents, currency, refund_status)
     VALUES (:orderId, :sessionId, :intentId, :problem, :amount, :currency, :refundStatus)
     ON CONFLICT (checkout_session_id) DO NOTHING RETURNING id`,
    {
      replacements: {
        orderId: order?.id ?? null,
        sessionId: session.id,
        intentId,
        problem,
        amount: session.amount_total ?? 0,
        currency: session.currency ?? '',
        refundStatus: intentId && (session.amount_total ?? 0) > 0 ? 'pending' : 'none',
      },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const flagId = rows[0]?.id ?? null;
  if (flagId) {
    logger.error({ checkoutSessionId: session.id, orderId: order?.id ?? null, problem }, 'checkout session does not match its order: flagged, refunding it in full');
    await audit(
      { actorId: null, action: 'payment.flagged', subjectType: 'order', subjectId: order?.id ?? null, details: { sessionId: session.id, problem, amountCents: session.amount_total } },
      transaction,
    );
  }
  return flagId;
}

/** Refunds a flagged session's payment in full (its own key, so retries refund once). */
export async function refundFlagged(flagId: string): Promise<void> {
  const [flag] = await database().query<FlagRow>(
    `SELECT id, payment_intent_id, amount_cents, refund_status, checkout_session_id FROM payment_flags WHERE id = :flagId`,
    { replacements: { flagId }, type: QueryTypes.SELECT },
  );
  if (!flag || flag.refund_status !== 'pending' || !flag.payment_intent_id) return;
  try {
    const refund = await context().payments.refunds.create(
      { payment_intent: flag.payment_intent_id, reason: 'requested_by_customer', metadata: { flaggedSession: flag.checkout_session_id } },
      { idempotencyKey: `flagged:${flag.checkout_session_id}` },
    );
    await database().query(`UPDATE payment_flags SET refund_status = 'succeeded', provider_refund_id = :refundId, last_error = NULL, updated_at = now() WHERE id = :flagId`, {
      replacements: { flagId, refundId: refund.id },
    });
  } catch (err) {
    const described = describePaymentsError(err);
    logger.error({ checkoutSessionId: flag.checkout_session_id, payments: described }, 'refund of a flagged session not made yet; it will be retried');
    await database().query(`UPDATE payment_flags SET last_error = :error, updated_at = now() WHERE id = :flagId`, { replacements: { flagId, error: described.slice(0, 500) } });
  }
}

/** Flags whose refund is still to be made (the retry job). */
export async function retryFlaggedRefunds(limit = 50): Promise<number> {
  const rows = await database().query<{ id: string }>(`SELECT id FROM payment_flags WHERE refund_status = 'pending' ORDER BY created_at LIMIT :limit`, {
    replacements: { limit },
    type: QueryTypes.SELECT,
  });
  for (const row of rows) await refundFlagged(row.id);
  return rows.length;
}
