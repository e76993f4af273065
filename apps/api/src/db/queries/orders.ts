import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// The order route's writes, as few round trips as the rules allow. A hold
// is one statement: the customer's share is checked, the bake day's pieces
// and the window's slot are taken and the order goes in with its boxes,
// lines and audit entry, all or nothing, with no BEGIN/COMMIT of its own
// (a statement is its own transaction; inside a caller's transaction it is
// part of that one). The bake day's row stays locked only from that
// statement to its commit.

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

/** Why a hold was refused without an error: the customer's share, a window that is not (or no longer) the day's, or the pieces (sold out or closed at `now`). */
export type HoldResult =
  | { id: string; currency: string; alreadyPieces: number }
  | { id: null; refused: 'limit' | 'window' | 'pieces'; alreadyPieces: number; remaining: { rings: number; holes: number } };

/** The window's CHECK (orders_remaining >= 0) is the guard on its slots: a full window fails the statement with this constraint. */
export const WINDOW_FULL_CONSTRAINT = 'pickup_windows_orders_remaining_check';

/**
 * Holds an order in one statement, or refuses it whole. The pieces are taken
 * only if the customer stays within their share (`maxPieces`, counted over
 * their held, paid, collected and no-show orders of the day), the window is
 * one of the day's own, the day is published and open at `now`, and all the
 * rings and holes are there; the window's slot is then taken unconditionally,
 * so a full window breaks its CHECK constraint and the whole statement (the
 * pieces included) is undone: the caller sees a CHECK violation on
 * WINDOW_FULL_CONSTRAINT. A second hold for the same customer and day breaks
 * the unique index `orders_one_hold`. Refusals answer the pieces the customer
 * already has and what the day had left.
 */
export async function holdOrder(o: NewOrderRow & { now: Date }, transaction?: Transaction): Promise<HoldResult> {
  const boxes = o.boxes.map((b, position) => ({ position, size: b.size, pieces: b.pieces, price_cents: b.priceCents }));
  const lines = o.boxes.flatMap((b, position) =>
    b.lines.map((l) => ({ position, menu_item_id: l.menuItemId, name: l.name, kind: l.kind, quantity: l.quantity, surcharge_cents: l.surchargeCents, allergens: l.allergens })),
  );
  const [row] = await database().query<{ id: string | null; currency: string | null; already: number; within_share: boolean; window_open: boolean; rings_remaining: number; holes_remaining: number }>(
    `WITH mine AS (
       SELECT COALESCE(SUM(rings + holes), 0)::int AS pieces FROM orders
        WHERE user_id = :userId AND bake_day_id = :bakeDayId AND status IN ${COUNTED}
     ), cap AS (
       UPDATE bake_days
          SET rings_remaining = rings_remaining - :rings, holes_remaining = holes_remaining - :holes, updated_at = now()
        WHERE id = :bakeDayId AND rings_remaining >= :rings AND holes_remaining >= :holes
          AND status = 'published' AND orders_open_at <= :now AND cutoff_at > :now
          AND (SELECT pieces FROM mine) + :rings + :holes <= :maxPieces
          AND EXISTS (SELECT 1 FROM pickup_windows w WHERE w.id = :pickupWindowId AND w.bake_day_id = :bakeDayId AND w.removed_at IS NULL)
        RETURNING id
     ), win AS (
       UPDATE pickup_windows SET orders_remaining = orders_remaining - 1, updated_at = now()
        WHERE id = :pickupWindowId AND EXISTS (SELECT 1 FROM cap)
        RETURNING id
     ), o AS (
       INSERT INTO orders (user_id, bake_day_id, pickup_window_id, status, rings, holes, subtotal_cents, tax_cents, total_cents, hold_expires_at)
       SELECT :userId, cap.id, :pickupWindowId, 'held', :rings, :holes, :subtotalCents, :taxCents, :totalCents, :holdExpiresAt
         FROM cap
       RETURNING id, currency
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
     SELECT (SELECT id FROM o) AS id, (SELECT currency FROM o) AS currency, mine.pieces AS already, mine.pieces + :rings + :holes <= :maxPieces AS within_share,
            EXISTS (SELECT 1 FROM pickup_windows w WHERE w.id = :pickupWindowId AND w.bake_day_id = :bakeDayId AND w.removed_at IS NULL) AS window_open,
            d.rings_remaining, d.holes_remaining
       FROM mine LEFT JOIN bake_days d ON d.id = :bakeDayId`,
    {
      replacements: { ...o, boxes: JSON.stringify(boxes), lines: JSON.stringify(lines) },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const already = row?.already ?? 0;
  if (row?.id) return { id: row.id, currency: row.currency!, alreadyPieces: already };
  const refused = row?.within_share === false ? 'limit' : row?.window_open === false ? 'window' : 'pieces';
  return { id: null, refused, alreadyPieces: already, remaining: { rings: row?.rings_remaining ?? 0, holes: row?.holes_remaining ?? 0 } };
}

/**
 * Records the checkout session of a held order, in one statement that does
 * not wait for the disk (`synchronous_commit` off for its own transaction
 * only): were it lost in a crash, the payment is still recognised as the
 * order's (the session names the order as its client reference).
 */
export async function saveCheckoutSession(orderId: string, sessionId: string): Promise<void> {
  await database().query(
    `UPDATE orders SET checkout_session_id = :sessionId, updated_at = now()
       FROM (SELECT set_config('synchronous_commit', 'off', true)) AS async_commit
      WHERE id = :orderId`,
    { replacements: { orderId, sessionId } },
  );
}
