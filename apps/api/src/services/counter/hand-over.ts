import type { Transaction } from 'sequelize';
import { DateTime } from 'luxon';
import type { MarkRestNoShowResult, Me, PickupRow } from '@fryline/schemas';
import { counterOrder, markCollected, markNoShow, reverseNoShow, undoCollected, type CounterOrderRow } from '../../db/queries/counter-orders.js';
import { BakeDay } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { once } from './idempotency.js';
import { pickupRow } from './pickups.js';

// Hand-over, its undo, no-shows and their reversal. Each change is one
// conditional UPDATE (db/queries/counter-orders.ts); when it finds nothing to
// change, the order is read again to say why in words.

export type CounterAction = 'collect' | 'uncollect' | 'no-show' | 'reverse-no-show';

interface ActionRequest {
  user: Me;
  now: Date;
  orderId: string;
  bakeDayId: string | null;
  key: string | null;
}

const clock = (at: Date, zone: string) => DateTime.fromJSDate(new Date(at), { zone }).toFormat('h:mm a');
const day = (o: CounterOrderRow) => DateTime.fromISO(o.day_date).toFormat('cccc d LLLL');

/** The reason a change found nothing to change, as the counter person should read it. */
function refusal(o: CounterOrderRow, action: CounterAction, bakeDayId: string | null): AppError {
  if (bakeDayId !== null && o.bake_day_id !== bakeDayId) {
    return new AppError('wrong_bake_day', `This order is for ${day(o)} at ${o.day_place}, not this bake day`, 409, { bakeDayId: o.bake_day_id, date: o.day_date });
  }
  switch (o.status) {
    case 'held':
    case 'expired':
      return new AppError('not_paid', 'This order was never paid: don’t hand it over. The customer can buy from what is left.', 409);
    case 'cancelled':
      return new AppError('cancelled', 'This order was cancelled and its money refunded: don’t hand it over.', 409);
    case 'refunded':
      return new AppError('refunded', 'This order was refunded: don’t hand it over.', 409);
    default:
      break;
  }
  if (o.status === 'collected' && (action === 'collect' || action === 'no-show' || action === 'reverse-no-show')) {
    return new AppError(
      'already_collected',
      `Already handed over at ${clock(o.collected_at!, o.time_zone)}${o.collected_by ? ` by ${o.collected_by}` : ''}`,
      409,
      { collectedAt: new Date(o.collected_at!).toISOString(), collectedBy: o.collected_by, collectedById: o.collected_by_id },
    );
  }
  if (action === 'uncollect') {
    if (o.status === 'collected') {
      return new AppError('undo_too_late', `A hand-over can be undone for ${o.undo_seconds} seconds; this one was at ${clock(o.collected_at!, o.time_zone)}`, 409, {
        collectedAt: new Date(o.collected_at!).toISOString(),
      });
    }
    return new AppError('not_collected', 'This order has not been handed over, so there is nothing to undo', 409);
  }
  if (action === 'no-show') {
    if (o.status === 'no_show') return new AppError('already_no_show', 'This order is already marked as a no-show', 409);
    return new AppError(
      'too_early',
      `Too early for a no-show: the window ends at ${clock(o.ends_at, o.time_zone)} and the customer has ${o.grace_minutes} minutes more, until ${clock(o.no_show_from, o.time_zone)}`,
      409,
      { noShowFrom: new Date(o.no_show_from).toISOString() },
    );
  }
  if (action === 'reverse-no-show') return new AppError('not_no_show', 'This order is not marked as a no-show', 409);
  return new AppError('not_collectable', 'This order can’t be handed over', 409);
}

async function explain(orderId: string, action: CounterAction, bakeDayId: string | null, now: Date, transaction: Transaction): Promise<AppError> {
  const order = await counterOrder({ id: orderId }, now, transaction);
  return order ? refusal(order, action, bakeDayId) : notFound('Order');
}

const auditNames: Record<CounterAction, string> = {
  collect: 'order.collected',
  uncollect: 'order.collect_undone',
  'no-show': 'order.no_show',
  'reverse-no-show': 'order.no_show_reversed',
};

const changes: Record<CounterAction, (r: ActionRequest, t: Transaction) => Promise<{ id: string; was: string } | null>> = {
  collect: (r, t) => markCollected(r.orderId, r.user.id, r.bakeDayId, r.now, t),
  uncollect: (r, t) => undoCollected(r.orderId, r.bakeDayId, r.now, t),
  'no-show': async (r, t) => (await markNoShow({ orderId: r.orderId, bakeDayId: r.bakeDayId }, r.user.id, r.now, t))[0] ?? null,
  'reverse-no-show': (r, t) => reverseNoShow(r.orderId, r.bakeDayId, t),
};

/** One counter change on one order; answers the order as the pickup list shows it. */
export async function changeOrder(action: CounterAction, request: ActionRequest): Promise<PickupRow> {
  return once({ key: request.key, userId: request.user.id, action: `${action}:${request.orderId}` }, async (transaction): Promise<PickupRow> => {
    const changed = await changes[action](request, transaction);
    if (!changed) throw await explain(request.orderId, action, request.bakeDayId, request.now, transaction);
    await audit(
      { actorId: request.user.id, action: auditNames[action], subjectType: 'order', subjectId: changed.id, details: { from: changed.was, ...(request.key ? { idempotencyKey: request.key } : {}) } },
      transaction,
    );
    return pickupRow(changed.id, request.now, transaction);
  });
}

/** End of the day: every paid order whose window and grace are over becomes a no-show, in one go. */
export async function markRestNoShow(user: Me, bakeDayId: string, windowId: string | null, key: string | null, now: Date): Promise<MarkRestNoShowResult> {
  if (!(await BakeDay.findByPk(bakeDayId, { attributes: ['id'] }))) throw notFound('Bake day');
  return once({ key, userId: user.id, action: `no-shows:${bakeDayId}:${windowId ?? 'all'}` }, async (transaction): Promise<MarkRestNoShowResult> => {
    const marked = await markNoShow({ bakeDayId, windowId }, user.id, now, transaction);
    for (const m of marked) {
      await audit({ actorId: user.id, action: 'order.no_show', subjectType: 'order', subjectId: m.id, details: { from: m.was, all: true } }, transaction);
    }
    return { marked: marked.length, orderIds: marked.map((m) => m.id) };
  });
}
