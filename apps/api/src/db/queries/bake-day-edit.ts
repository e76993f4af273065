import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// The conditional statements behind changing an announced bake day. Each
// check and its change are one statement, or run under the row locks taken
// first, so an order arriving meanwhile can't slip past them.

/** Pieces sold or on hold: capacity less what remains. */
export async function soldPieces(bakeDayId: string, transaction?: Transaction): Promise<{ rings: number; holes: number }> {
  const [row] = await database().query<{ rings: number; holes: number }>(
    `SELECT ring_capacity - rings_remaining AS rings, hole_capacity - holes_remaining AS holes FROM bake_days WHERE id = :bakeDayId`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
  return row ?? { rings: 0, holes: 0 };
}

export interface WindowRow {
  id: string;
  starts_at: Date;
  ends_at: Date;
  max_orders: number | null;
  orders_remaining: number | null;
  removed_at: Date | null;
  /** Orders counted against the window (on hold or paid). */
  booked: number;
  /** Orders of any state that point at it (a window with any can't be deleted). */
  referenced: number;
}

/**
 * A bake day's windows with their bookings. With a transaction the window
 * rows are locked first, so a booking in flight finishes before the count
 * (READ COMMITTED: the count is a new snapshot taken after the lock).
 */
export async function windowsWithBookings(bakeDayId: string, transaction?: Transaction): Promise<WindowRow[]> {
  if (transaction) {
    await database().query(`SELECT id FROM pickup_windows WHERE bake_day_id = :bakeDayId FOR UPDATE`, {
      replacements: { bakeDayId },
      type: QueryTypes.SELECT,
      transaction,
    });
  }
  return database().query<WindowRow>(
    `SELECT w.id, w.starts_at, w.ends_at, w.max_orders, w.orders_remaining, w.removed_at,
            count(o.id) FILTER (WHERE o.holds_capacity)::int AS booked,
            count(o.id)::int AS referenced
       FROM pickup_windows w
       LEFT JOIN orders o ON o.pickup_window_id = w.id
      WHERE w.bake_day_id = :bakeDayId
      GROUP BY w.id
      ORDER BY w.starts_at`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
}

/** Paid orders of a bake day, optionally only those in some windows. */
export async function paidOrders(bakeDayId: string, transaction: Transaction, windowIds?: string[]): Promise<Array<{ id: string; pickup_window_id: string }>> {
  if (windowIds && windowIds.length === 0) return [];
  return database().query(
    `SELECT id, pickup_window_id FROM orders
      WHERE bake_day_id = :bakeDayId AND status = 'paid' ${windowIds ? 'AND pickup_window_id IN (:windowIds)' : ''}
      ORDER BY created_at`,
    { replacements: { bakeDayId, windowIds: windowIds ?? [] }, type: QueryTypes.SELECT, transaction },
  );
}

/** Lets an order be moved or cancelled with a full refund until `until`, even past the cut-off. */
export async function extendChangeGrace(orderId: string, until: Date, transaction: Transaction) {
  await database().query(
    `UPDATE orders SET change_grace_until = GREATEST(COALESCE(change_grace_until, CAST(:until AS timestamptz)), CAST(:until AS timestamptz)), updated_at = now() WHERE id = :orderId`,
    { replacements: { orderId, until }, transaction },
  );
}
