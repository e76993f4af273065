import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// The order route's writes, as few statements as the rules allow. The order,
// its boxes, lines and audit entry go in first (one statement, no lock on
// anything shared); the bake day's capacity and the window's slot are taken
// last (one statement), so the bake day's row stays locked only from that
// statement to the commit.

export interface NewOrderRow {
  userId: string;
  bakeDayId: string;
  pickupWindowId: string;
  rings: number;
  holes: number;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  holdExpiresAt: Date;
  boxes: Array<{ size: string; pieces: number; priceCents: number; lines: Array<{ menuItemId: string; name: string; kind: string; quantity: number; surchargeCents: number; allergens: string[] }> }>;
  /** The customer's share of one bake day, rings and holes together. */
  maxPieces: number;
}

/** The order statuses that count against a customer's share of a bake day. */
const COUNTED = `('held', 'paid', 'collected', 'no_show')`;

/** Pieces (rings and holes) a customer holds or has bought for a bake day. */
export async function piecesOrderedBy(userId: string, bakeDayId: string): Promise<number> {
  const [row] = await database().query<{ pieces: number }>(
    `SELECT COALESCE(SUM(rings + holes), 0)::int AS pieces FROM orders WHERE user_id = :userId AND bake_day_id = :bakeDayId AND status IN ${COUNTED}`,
    { replacements: { userId, bakeDayId }, type: QueryTypes.SELECT },
  );
  return row?.pieces ?? 0;
}

/**
 * Inserts a held order with its boxes, lines and audit entry, unless it
 * would take the customer past their share of the day. Returns the new id,
 * or null with the pieces the customer already has. One hold per customer
 * and day is the unique index `orders_one_hold` (a second one raises a
 * unique violation).
 */
export async function insertHeldOrder(o: NewOrderRow, transaction: Transaction): Promise<{ id: string | null; alreadyPieces: number }> {
  const boxes = o.boxes.map((b, position) => ({ position, size: b.size, pieces: b.pieces, price_cents: b.priceCents }));
  const lines = o.boxes.flatMap((b, position) =>
    b.lines.map((l) => ({ position, menu_item_id: l.menuItemId, name: l.name, kind: l.kind, quantity: l.quantity, surcharge_cents: l.surchargeCents, allergens: l.allergens })),
  );
  const [row] = await database().query<{ id: string | null; already: number }>(
    `WITH mine AS (
       SELECT COALESCE(SUM(rings + holes), 0)::int AS pieces FROM orders
        WHERE user_id = :userId AND bake_day_id = :bakeDayId AND status IN ${COUNTED}
     ), o AS (
       INSERT INTO orders (user_id, bake_day_id, pickup_window_id, status, rings, holes, subtotal_cents, tax_cents, total_cents, hold_expires_at)
       SELECT :userId, :bakeDayId, :pickupWindowId, 'held', :rings, :holes, :subtotalCents, :taxCents, :totalCents, :holdExpiresAt
         FROM mine WHERE mine.pieces + :rings + :holes <= :maxPieces
       RETURNING id
     ), b AS (
       INSERT INTO order_boxes (order_id, position, size, pieces, price_cents)
       SELECT o.id, x.position, x.size, x.pieces, x.price_cents
         FROM o, jsonb_to_recordset(CAST(:boxes AS jsonb)) AS x(position int, size text, pieces int, price_cents int)
       RETURNING id, position
     ), l AS (
       INSERT INTO order_lines (order_box_id, menu_item_id, name, kind, quantity, surcharge_cents, allergens)
       SELECT b.id, x.menu_item_id, x.name, x.kind, x.quantity, x.surcharge_cents, x.allergens
         FROM b JOIN jsonb_to_recordset(CAST(:lines AS jsonb))
              AS x(position int, menu_item_id uuid, name text, kind text, quantity int, surcharge_cents int, allergens text[]) ON x.position = b.position
     ), a AS (
       INSERT INTO audit_log (actor_id, action, subject_type, subject_id, details)
       SELECT :userId, 'order.held', 'order', o.id::text, jsonb_build_object('rings', :rings, 'holes', :holes) FROM o
     )
     SELECT (SELECT id FROM o) AS id, (SELECT pieces FROM mine) AS already`,
    {
      replacements: { ...o, boxes: JSON.stringify(boxes), lines: JSON.stringify(lines) },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return { id: row?.id ?? null, alreadyPieces: row?.already ?? 0 };
}

/**
 * Takes the order's pieces from the bake day (if they are all there and
 * orders are open at `now`) and one slot of its window, in one statement.
 * The window is touched only when the pieces were there; the caller rolls
 * back when either answer is false.
 */
export async function takeOrderCapacity(
  t: { bakeDayId: string; pickupWindowId: string; rings: number; holes: number; now: Date },
  transaction: Transaction,
): Promise<{ pieces: boolean; window: boolean }> {
  const [row] = await database().query<{ cap: number; win: number }>(
    `WITH cap AS (
       UPDATE bake_days
          SET rings_remaining = rings_remaining - :rings, holes_remaining = holes_remaining - :holes, updated_at = now()
        WHERE id = :bakeDayId AND rings_remaining >= :rings AND holes_remaining >= :holes
          AND status = 'published' AND orders_open_at <= :now AND cutoff_at > :now
        RETURNING id
     ), win AS (
       UPDATE pickup_windows SET orders_remaining = orders_remaining - 1, updated_at = now()
        WHERE id = :pickupWindowId AND bake_day_id = :bakeDayId AND (orders_remaining IS NULL OR orders_remaining >= 1)
          AND EXISTS (SELECT 1 FROM cap)
        RETURNING id
     )
     SELECT (SELECT count(*) FROM cap)::int AS cap, (SELECT count(*) FROM win)::int AS win`,
    { replacements: t, type: QueryTypes.SELECT, transaction },
  );
  return { pieces: row?.cap === 1, window: row?.win === 1 };
}

/** Records the checkout session of a held order without waiting for the disk (see createOrder). */
export async function saveCheckoutSession(orderId: string, sessionId: string): Promise<void> {
  await database().transaction(async (transaction) => {
    await database().query(`SET LOCAL synchronous_commit = off`, { transaction });
    await database().query(`UPDATE orders SET checkout_session_id = :sessionId, updated_at = now() WHERE id = :orderId`, {
      replacements: { orderId, sessionId },
      transaction,
    });
  });
}
