import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';
import { recountSurplusForOrder } from './surplus.js';

// Capacity moves only through single conditional statements: the check and
// the change happen in one UPDATE, backed by CHECK (remaining >= 0) in the
// schema. Nothing is read and then written.

/**
 * Takes rings and holes from a bake day if they are all there and orders are
 * open at `now` (the caller's clock, passed in: never the database's); false
 * otherwise. A late payment re-takes its pieces whatever the time.
 */
export async function takeCapacity(bakeDayId: string, rings: number, holes: number, transaction: Transaction, when: { now: Date } | { ignoreCutoff: true }): Promise<boolean> {
  const now = 'now' in when ? when.now : null;
  const rows = await database().query(
    `UPDATE bake_days
        SET rings_remaining = rings_remaining - :rings,
            holes_remaining = holes_remaining - :holes,
            updated_at = now()
      WHERE id = :bakeDayId
        AND rings_remaining >= :rings
        AND holes_remaining >= :holes
        AND status = 'published'
        ${now ? 'AND orders_open_at <= :now AND cutoff_at > :now' : ''}
      RETURNING id`,
    { replacements: { bakeDayId, rings, holes, now }, type: QueryTypes.SELECT, transaction },
  );
  return rows.length === 1;
}

export async function giveBackCapacity(bakeDayId: string, rings: number, holes: number, transaction: Transaction): Promise<void> {
  await database().query(
    `UPDATE bake_days
        SET rings_remaining = rings_remaining + :rings,
            holes_remaining = holes_remaining + :holes,
            updated_at = now()
      WHERE id = :bakeDayId`,
    { replacements: { bakeDayId, rings, holes }, transaction },
  );
}

/** Takes one order slot in a pickup window (windows without a cap always have room). */
export async function takeWindowSlot(bakeDayId: string, windowId: string, transaction: Transaction): Promise<boolean> {
  const rows = await database().query(
    `UPDATE pickup_windows
        SET orders_remaining = orders_remaining - 1, updated_at = now()
      WHERE id = :windowId AND bake_day_id = :bakeDayId
        AND (orders_remaining IS NULL OR orders_remaining >= 1)
        AND removed_at IS NULL
      RETURNING id`,
    { replacements: { windowId, bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.length === 1;
}

export async function giveBackWindowSlot(windowId: string, transaction: Transaction): Promise<void> {
  await database().query(
    `UPDATE pickup_windows SET orders_remaining = orders_remaining + 1, updated_at = now()
      WHERE id = :windowId AND orders_remaining IS NOT NULL`,
    { replacements: { windowId }, transaction },
  );
}

interface ReleasedOrder {
  id: string;
  bake_day_id: string;
  pickup_window_id: string;
  rings: number;
  holes: number;
}

/**
 * Moves an order out of `from` into `to` and, if it was counted against
 * capacity, gives its pieces and window slot back. The status change is the
 * guard: whichever of sweeper, webhook or cancellation gets here first does
 * the release; the others find nothing to change. A paid order's pieces go
 * back to the counter's surplus once it has one (they were made for it).
 * Returns the order's row when this call did the release.
 */
export async function releaseOrder(
  orderId: string,
  from: string[],
  to: string,
  transaction: Transaction,
  extra: { cancelledAt?: Date } = {},
): Promise<ReleasedOrder | null> {
  const rows = await database().query<ReleasedOrder & { holds_capacity: boolean; was: string }>(
    `WITH prev AS (
       SELECT id, holds_capacity, status FROM orders WHERE id = :orderId AND status IN (:from) FOR UPDATE
     )
     UPDATE orders o
        SET status = :to, holds_capacity = false, hold_expires_at = NULL, updated_at = now(),
            cancelled_at = COALESCE(CAST(:cancelledAt AS timestamptz), o.cancelled_at)
       FROM prev
      WHERE o.id = prev.id
      RETURNING o.id, o.bake_day_id, o.pickup_window_id, o.rings, o.holes, prev.holds_capacity, prev.status AS was`,
    { replacements: { orderId, from, to, cancelledAt: extra.cancelledAt ?? null }, type: QueryTypes.SELECT, transaction },
  );
  const row = rows[0];
  if (!row) return null;
  if (row.holds_capacity) {
    await giveBackCapacity(row.bake_day_id, row.rings, row.holes, transaction);
    await giveBackWindowSlot(row.pickup_window_id, transaction);
  }
  if (row.was === 'paid') await recountSurplusForOrder(row.id, row.bake_day_id, transaction);
  return row;
}

/**
 * Sets a bake day's capacity and moves what is left by the same difference,
 * in one statement that refuses to go below what is already sold or held.
 * False when the day is not there or the new capacity is too low.
 */
export async function setDayCapacity(bakeDayId: string, rings: number, holes: number, transaction?: Transaction): Promise<boolean> {
  const rows = await database().query(
    `UPDATE bake_days
        SET ring_capacity = :rings, rings_remaining = rings_remaining + (:rings - ring_capacity),
            hole_capacity = :holes, holes_remaining = holes_remaining + (:holes - hole_capacity),
            updated_at = now()
      WHERE id = :id
        AND rings_remaining + (:rings - ring_capacity) >= 0
        AND holes_remaining + (:holes - hole_capacity) >= 0
      RETURNING id`,
    { replacements: { id: bakeDayId, rings, holes }, type: QueryTypes.SELECT, transaction },
  );
  return rows.length === 1;
}
