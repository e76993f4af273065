import type Stripe from 'stripe';
import { QueryTypes } from 'sequelize';
import { database } from '../db/sequelize.js';
import { context } from '../integrations/context.js';
import { handlePaymentEvent } from '../services/payments/payment-events.js';
import { orderIdOfSession } from '../services/payments/payment-checks.js';

const CURSOR = 'payments.events';
const LOOK_BACK_SECONDS = 2 * 24 * 3600;
/** Events are listed from a little before the last one seen: the service may record events slightly out of order. */
const OVERLAP_SECONDS = 120;

/**
 * Catches up with the payments service after lost webhooks or downtime, as
 * the service recommends: (1) recent completed checkout sessions whose order
 * we have not seen paid are applied as their completion event would have
 * been; (2) every event since the last run is applied through the webhook's
 * own handler, which records each event id once, so nothing is applied twice.
 * Several API processes may run it at once: both paths are idempotent.
 */
export async function reconcilePayments(now: Date): Promise<{ sessions: number; events: number }> {
  const { payments } = context();
  const nowSeconds = Math.floor(now.getTime() / 1000);

  let sessions = 0;
  const completed: Stripe.Checkout.Session[] = [];
  for await (const session of payments.checkout.sessions.list({ created: { gte: nowSeconds - LOOK_BACK_SECONDS }, status: 'complete', limit: 100 })) {
    if (session.payment_status === 'paid' && orderIdOfSession(session)) completed.push(session);
  }
  const ids = [...new Set(completed.map((s) => orderIdOfSession(s)!).filter((id) => /^[0-9a-f-]{36}$/i.test(id)))];
  const unpaid = ids.length
    ? new Set(
        (
          await database().query<{ id: string }>(`SELECT id FROM orders WHERE id IN (:ids) AND payment_intent_id IS NULL AND status IN ('held', 'expired', 'cancelled')`, {
            replacements: { ids },
            type: QueryTypes.SELECT,
          })
        ).map((r) => r.id),
      )
    : new Set<string>();
  for (const session of completed) {
    if (!unpaid.has(orderIdOfSession(session)!)) continue;
    const event = { id: `reconcile:${session.id}`, object: 'event', type: 'checkout.session.completed', created: nowSeconds, data: { object: session } } as unknown as Stripe.Event;
    if ((await handlePaymentEvent(event, now)) === 'applied') sessions += 1;
  }

  const [cursorRow] = await database().query<{ value: string }>(`SELECT value FROM job_cursors WHERE name = :name`, { replacements: { name: CURSOR }, type: QueryTypes.SELECT });
  const from = Math.max(nowSeconds - LOOK_BACK_SECONDS, Number(cursorRow?.value ?? 0) - OVERLAP_SECONDS);
  let events = 0;
  let newest = Number(cursorRow?.value ?? 0);
  for await (const event of payments.events.list({ created: { gte: from }, limit: 100 })) {
    if ((await handlePaymentEvent(event, now)) === 'applied') events += 1;
    newest = Math.max(newest, event.created);
  }
  if (newest > 0) {
    await database().query(
      `INSERT INTO job_cursors (name, value) VALUES (:name, :value)
       ON CONFLICT (name) DO UPDATE SET value = GREATEST(job_cursors.value::bigint, EXCLUDED.value::bigint)::text, updated_at = now()`,
      { replacements: { name: CURSOR, value: String(newest) } },
    );
  }
  return { sessions, events };
}
