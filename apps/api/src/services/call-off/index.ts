import { QueryTypes, type Transaction } from 'sequelize';
import { DateTime } from 'luxon';
import { formatCents, type JobView, type Me } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { BakeDay, Order, Refund, User } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { createJob, getJob, jobForSubject, type JobItemRow, type JobRow } from '../../jobs/job-store.js';
import { releaseOrder } from '../../db/queries/capacity.js';
import { expireCheckout } from '../../integrations/checkout.js';
import { context } from '../../integrations/context.js';
import { enqueueMail } from '../mail/outbox.js';
import { mailShopOf, paragraphMail } from '../mail/templates.js';
import { shopSettings } from '../shop/settings.js';
import { audit } from '../audit/audit.js';

export const CALL_OFF_NOTE = 'bake day called off';

/**
 * The owner calls a bake day off (weather, illness). At once, in one
 * transaction: the day stops selling, its waitlist closes, and a job is
 * queued with one item per order on hold or paid and one per person to tell
 * (customers and people on the waitlist, each once). The job runner refunds
 * and writes to them. Calling off twice returns the same job.
 */
export async function callOffBakeDay(owner: Me, bakeDayId: string, reason: string, now: Date): Promise<JobView> {
  const jobId = await database().transaction(async (transaction) => {
    const day = await BakeDay.findByPk(bakeDayId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!day) throw notFound('Bake day');
    const existing = await jobForSubject('call-off', day.id, transaction);
    if (existing) return existing.id;
    if (day.status === 'done') throw new AppError('already_done', 'This bake day is over and marked done; refund single orders instead', 409);
    if (day.status === 'cancelled') throw new AppError('called_off', 'This bake day is already called off', 409);
    await day.update({ status: 'cancelled', calledOffAt: now, calledOffReason: reason }, { transaction });
    const orders = await database().query<{ id: string; user_id: string }>(
      `SELECT id, user_id FROM orders WHERE bake_day_id = :id AND status IN ('held', 'paid') ORDER BY created_at`,
      { replacements: { id: day.id }, type: QueryTypes.SELECT, transaction },
    );
    const waiting = await database().query<{ user_id: string }>(
      `UPDATE waitlist_entries SET status = 'lapsed', updated_at = now()
        WHERE bake_day_id = :id AND status IN ('waiting', 'offered') RETURNING user_id`,
      { replacements: { id: day.id }, type: QueryTypes.SELECT, transaction },
    );
    const people = [...new Set([...orders.map((o) => o.user_id), ...waiting.map((w) => w.user_id)])];
    const id = await createJob(
      {
        kind: 'call-off',
        subjectId: day.id,
        payload: { reason },
        createdBy: owner.id,
        items: [...orders.map((o) => ({ kind: 'order' as const, refId: o.id })), ...people.map((p) => ({ kind: 'person' as const, refId: p }))],
      },
      transaction,
    );
    await audit(
      { actorId: owner.id, action: 'bake_day.called_off', subjectType: 'bake_day', subjectId: day.id, details: { reason, orders: orders.length, people: people.length, jobId: id } },
      transaction,
    );
    return id;
  });
  return (await getJob(jobId))!;
}

/**
 * Refunds what is left of a paid order, once, whatever happened before: the
 * payments call carries a key made from the order, so a retry after a crash
 * gets the first refund back instead of a second one. If the refund's own
 * webhook got here first (the crash came after the refund was made but
 * before it was recorded), the order already reads fully refunded: the same
 * call with the same amount is answered from the first one and recorded.
 */
async function refundInFull(job: JobRow, order: Order, transaction: Transaction): Promise<void> {
  const key = `call-off:${order.id}`;
  if (await Refund.findOne({ where: { requestKey: key }, transaction })) return;
  const recorded = ((await Refund.sum('amountCents', { where: { orderId: order.id }, transaction })) as number | null) ?? 0;
  const alreadyBack = order.refundedCents < order.totalCents ? order.refundedCents : recorded;
  const due = order.totalCents - alreadyBack;
  if (due <= 0 || !order.paymentIntentId) return;
  let refund;
  try {
    refund = await context().payments.refunds.create(
      { payment_intent: order.paymentIntentId, amount: due, reason: 'requested_by_customer', metadata: { orderId: order.id } },
      { idempotencyKey: `refund:${key}` },
    );
  } catch (err) {
    // fully refunded some other way (e.g. on the payments dashboard): nothing is due
    if (order.refundedCents >= order.totalCents && (err as { type?: string }).type === 'StripeInvalidRequestError') return;
    throw err;
  }
  await Refund.findOrCreate({
    where: { providerRefundId: refund.id },
    defaults: { orderId: order.id, providerRefundId: refund.id, requestKey: key, amountCents: due, reason: CALL_OFF_NOTE, requestedBy: job.created_by },
    transaction,
  });
  await database().query(`UPDATE orders SET refunded_cents = LEAST(total_cents, GREATEST(refunded_cents, :back)), updated_at = now() WHERE id = :id`, {
    replacements: { id: order.id, back: alreadyBack + due },
    transaction,
  });
  await audit(
    { actorId: job.created_by, action: 'order.refunded', subjectType: 'order', subjectId: order.id, details: { amountCents: due, reason: CALL_OFF_NOTE, jobId: job.id } },
    transaction,
  );
}

/** One order of a called-off day: a hold is released; a paid order is refunded in full, once. */
async function settleOrder(job: JobRow, orderId: string, transaction: Transaction, now: Date) {
  const order = await Order.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!order) return;
  if (order.status === 'held') {
    if (order.checkoutSessionId) await expireCheckout(order.checkoutSessionId);
    await releaseOrder(order.id, ['held'], 'cancelled', transaction, { cancelledAt: now });
    return;
  }
  if (order.status !== 'paid' && order.status !== 'refunded') return; // cancelled, or already handed over
  await refundInFull(job, order, transaction);
  await releaseOrder(order.id, ['paid'], 'refunded', transaction, { cancelledAt: now });
}

/** One e-mail per person: what was refunded to them, or that their place on the waitlist is gone. */
async function tellPerson(job: JobRow, userId: string, transaction: Transaction) {
  const [user, day, settings] = await Promise.all([
    User.findByPk(userId, { transaction }),
    BakeDay.findByPk(job.subject_id, { transaction }),
    shopSettings(transaction),
  ]);
  if (!user || !day) return;
  const [money] = await database().query<{ orders: number; refunded: number; currency: string | null }>(
    `SELECT count(DISTINCT o.id)::int AS orders, COALESCE(sum(r.amount_cents), 0)::int AS refunded, min(o.currency) AS currency
       FROM orders o LEFT JOIN refunds r ON r.order_id = o.id AND r.reason = :note
      WHERE o.bake_day_id = :dayId AND o.user_id = :userId AND o.paid_at IS NOT NULL`,
    { replacements: { dayId: day.id, userId, note: CALL_OFF_NOTE }, type: QueryTypes.SELECT, transaction },
  );
  const date = DateTime.fromISO(day.date, { zone: day.timeZone }).toFormat('cccc d LLLL');
  const reason = String((job.payload as { reason?: string }).reason ?? '');
  const what =
    money && money.refunded > 0
      ? `We have refunded ${formatCents(money.refunded, money.currency ?? settings.currency)} to your card in full. Refunds usually take a few days to show.`
      : money && money.orders > 0
        ? 'Your order was already settled, so nothing more is due.'
        : 'You were on the waitlist or had a box on hold: nothing was charged, and there is nothing you need to do.';
  const mail = await paragraphMail(`${date} is called off — ${settings.shopName}`, [
    `Hello ${user.name || 'there'},`,
    `We're sorry: we have had to call off the bake day on ${date} at ${day.place}.`,
    ...(reason ? [`Why: ${reason}`] : []),
    what,
    'We hope to see you at the next one.',
  ], mailShopOf(settings));
  await enqueueMail({ kind: 'call-off', to: user.email, ...mail, dedupeKey: `call-off:${day.id}:${user.id}` }, transaction);
}

export const callOffHandler = {
  async runItem(job: JobRow, item: JobItemRow, transaction: Transaction, now: Date) {
    if (item.kind === 'order') await settleOrder(job, item.ref_id, transaction, now);
    else await tellPerson(job, item.ref_id, transaction);
  },
  async finish(job: JobRow, transaction: Transaction) {
    await audit({ actorId: job.created_by, action: 'bake_day.call_off_finished', subjectType: 'bake_day', subjectId: job.subject_id, details: { jobId: job.id, items: job.total } }, transaction);
  },
};
