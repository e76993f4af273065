import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// The counter's reads and its conditional status changes on orders. Every
// change is one statement whose WHERE is the rule (status, undo window,
// window end plus grace), so two devices racing get one winner and the
// loser changes nothing. Time is the caller's `now`, passed in as a
// parameter, never the database's clock.

/** The owner's counter settings, with the defaults the schema gives when the shop row is missing. */
const SETTINGS = `settings AS (
  SELECT COALESCE((SELECT no_show_grace_minutes FROM shop_settings WHERE id = 1), 30) AS grace_minutes,
         COALESCE((SELECT hand_over_undo_seconds FROM shop_settings WHERE id = 1), 15) AS undo_seconds
)`;

export interface CounterOrderRow {
  id: string;
  status: 'held' | 'paid' | 'collected' | 'no_show' | 'cancelled' | 'refunded' | 'expired';
  pickup_code: string | null;
  bake_day_id: string;
  pickup_window_id: string;
  rings: number;
  holes: number;
  name: string;
  starts_at: Date;
  ends_at: Date;
  no_show_from: Date;
  collected_at: Date | null;
  collected_by_id: string | null;
  collected_by: string | null;
  undo_until: Date | null;
  no_show_at: Date | null;
  no_show_by: string | null;
  day_date: string;
  day_place: string;
  time_zone: string;
  undo_seconds: number;
  grace_minutes: number;
}

const ORDER_COLUMNS = `
  o.id, o.status, o.pickup_code, o.bake_day_id, o.pickup_window_id, o.rings, o.holes,
  COALESCE(NULLIF(u.name, ''), u.email) AS name,
  w.starts_at, w.ends_at,
  w.ends_at + make_interval(mins => s.grace_minutes) AS no_show_from,
  o.collected_at, o.collected_by AS collected_by_id, COALESCE(NULLIF(cb.name, ''), cb.email) AS collected_by,
  CASE WHEN o.status = 'collected' AND o.collected_at + make_interval(secs => s.undo_seconds) > CAST(:now AS timestamptz)
       THEN o.collected_at + make_interval(secs => s.undo_seconds) END AS undo_until,
  o.no_show_at, COALESCE(NULLIF(nb.name, ''), nb.email) AS no_show_by,
  d.date AS day_date, d.place AS day_place, d.time_zone, s.undo_seconds, s.grace_minutes`;

const ORDER_JOINS = `
  FROM orders o
  JOIN users u ON u.id = o.user_id
  JOIN pickup_windows w ON w.id = o.pickup_window_id
  JOIN bake_days d ON d.id = o.bake_day_id
  LEFT JOIN users cb ON cb.id = o.collected_by
  LEFT JOIN users nb ON nb.id = o.no_show_by
  CROSS JOIN settings s`;

/** Orders the counter sees for a bake day: paid ones in any state, and paid-then-refunded or cancelled ones so a customer can be told why. */
export async function pickupOrders(bakeDayId: string, now: Date, transaction?: Transaction): Promise<CounterOrderRow[]> {
  return database().query<CounterOrderRow>(
    `WITH ${SETTINGS}
     SELECT ${ORDER_COLUMNS} ${ORDER_JOINS}
      WHERE o.bake_day_id = :bakeDayId
        AND (o.status IN ('paid', 'collected', 'no_show') OR (o.paid_at IS NOT NULL AND o.status IN ('refunded', 'cancelled')))
      ORDER BY w.starts_at, lower(COALESCE(NULLIF(u.name, ''), u.email)), o.id`,
    { replacements: { bakeDayId, now }, type: QueryTypes.SELECT, transaction },
  );
}

export async function counterOrder(where: { id: string } | { pickupCode: string }, now: Date, transaction?: Transaction): Promise<CounterOrderRow | null> {
  const rows = await database().query<CounterOrderRow>(
    `WITH ${SETTINGS} SELECT ${ORDER_COLUMNS} ${ORDER_JOINS} WHERE ${'id' in where ? 'o.id = :value' : 'o.pickup_code = :value'}`,
    { replacements: { value: 'id' in where ? where.id : where.pickupCode, now }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0] ?? null;
}

export interface BoxLineRow {
  order_id: string;
  position: number;
  size: 'dozen' | 'half-dozen' | 'holes';
  pieces: number;
  menu_item_id: string | null;
  name: string | null;
  quantity: number | null;
}

export async function boxLines(orderIds: string[], transaction?: Transaction): Promise<BoxLineRow[]> {
  if (orderIds.length === 0) return [];
  return database().query<BoxLineRow>(
    `SELECT b.order_id, b.position, b.size, b.pieces, l.menu_item_id, l.name, l.quantity
       FROM order_boxes b LEFT JOIN order_lines l ON l.order_box_id = b.id
      WHERE b.order_id IN (:orderIds)
      ORDER BY b.order_id, b.position, l.name`,
    { replacements: { orderIds }, type: QueryTypes.SELECT, transaction },
  );
}

/** Whether one conditional change found its order, and the state it left. */
interface Changed {
  id: string;
  was: string;
}

async function change(sql: string, replacements: Record<string, unknown>, transaction: Transaction): Promise<Changed[]> {
  return database().query<Changed>(sql, { replacements, type: QueryTypes.SELECT, transaction });
}

const DAY_GUARD = `(CAST(:bakeDayId AS uuid) IS NULL OR o.bake_day_id = CAST(:bakeDayId AS uuid))`;

/** Paid (or marked no-show) → collected. */
export async function markCollected(orderId: string, userId: string, bakeDayId: string | null, now: Date, transaction: Transaction): Promise<Changed | null> {
  const rows = await change(
    `WITH prev AS (
       SELECT o.id, o.status FROM orders o
        WHERE o.id = :orderId AND o.status IN ('paid', 'no_show') AND ${DAY_GUARD}
        FOR UPDATE
     )
     UPDATE orders o
        SET status = 'collected', collected_at = :now, collected_by = :userId, no_show_at = NULL, no_show_by = NULL, updated_at = now()
       FROM prev WHERE o.id = prev.id
     RETURNING o.id, prev.status AS was`,
    { orderId, userId, bakeDayId, now },
    transaction,
  );
  return rows[0] ?? null;
}

/** Collected → paid again, only within the undo time after the hand-over. */
export async function undoCollected(orderId: string, bakeDayId: string | null, now: Date, transaction: Transaction): Promise<Changed | null> {
  const rows = await change(
    `WITH ${SETTINGS}, prev AS (
       SELECT o.id, o.status FROM orders o CROSS JOIN settings s
        WHERE o.id = :orderId AND o.status = 'collected' AND ${DAY_GUARD}
          AND o.collected_at + make_interval(secs => s.undo_seconds) > CAST(:now AS timestamptz)
        FOR UPDATE OF o
     )
     UPDATE orders o
        SET status = 'paid', collected_at = NULL, collected_by = NULL, updated_at = now()
       FROM prev WHERE o.id = prev.id
     RETURNING o.id, prev.status AS was`,
    { orderId, bakeDayId, now },
    transaction,
  );
  return rows[0] ?? null;
}

/**
 * Paid → no-show, for one order or (orderId null) every paid order of a bake
 * day, but only once its window has closed and the grace has passed.
 */
export async function markNoShow(
  target: { orderId: string; bakeDayId: string | null } | { bakeDayId: string; windowId: string | null },
  userId: string,
  now: Date,
  transaction: Transaction,
): Promise<Changed[]> {
  const one = 'orderId' in target;
  return change(
    `WITH ${SETTINGS}, prev AS (
       SELECT o.id, o.status FROM orders o
         JOIN pickup_windows w ON w.id = o.pickup_window_id
         CROSS JOIN settings s
        WHERE o.status = 'paid' AND CAST(:now AS timestamptz) >= w.ends_at + make_interval(mins => s.grace_minutes)
          AND ${one ? `o.id = :orderId AND ${DAY_GUARD}` : 'o.bake_day_id = :bakeDayId AND (CAST(:windowId AS uuid) IS NULL OR o.pickup_window_id = CAST(:windowId AS uuid))'}
        ORDER BY o.id
        FOR UPDATE OF o
     )
     UPDATE orders o
        SET status = 'no_show', no_show_at = :now, no_show_by = :userId, updated_at = now()
       FROM prev WHERE o.id = prev.id
     RETURNING o.id, prev.status AS was`,
    one ? { orderId: target.orderId, bakeDayId: target.bakeDayId, userId, now } : { bakeDayId: target.bakeDayId, windowId: target.windowId, userId, now },
    transaction,
  );
}

/** No-show → paid again (the customer turned up after all). */
export async function reverseNoShow(orderId: string, bakeDayId: string | null, transaction: Transaction): Promise<Changed | null> {
  const rows = await change(
    `WITH prev AS (
       SELECT o.id, o.status FROM orders o WHERE o.id = :orderId AND o.status = 'no_show' AND ${DAY_GUARD} FOR UPDATE
     )
     UPDATE orders o SET status = 'paid', no_show_at = NULL, no_show_by = NULL, updated_at = now()
       FROM prev WHERE o.id = prev.id
     RETURNING o.id, prev.status AS was`,
    { orderId, bakeDayId },
    transaction,
  );
  return rows[0] ?? null;
}

export interface StatusTotalsRow {
  status: CounterOrderRow['status'];
  orders: number;
  rings: number;
  holes: number;
}

/** Orders and pieces per status for a bake day (paid ones and those refunded or cancelled after paying). */
export async function statusTotals(bakeDayId: string): Promise<StatusTotalsRow[]> {
  return database().query<StatusTotalsRow>(
    `SELECT status, count(*)::int AS orders, SUM(rings)::int AS rings, SUM(holes)::int AS holes
       FROM orders
      WHERE bake_day_id = :bakeDayId AND (status IN ('paid', 'collected', 'no_show') OR (paid_at IS NOT NULL AND status IN ('refunded', 'cancelled')))
      GROUP BY status`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT },
  );
}
