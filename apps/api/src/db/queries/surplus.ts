import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// Surplus counters per (bake day, menu item), like capacity: taken only by
// one conditional UPDATE each, backed by CHECK (left_count >= 0).

/**
 * Counts an item's pieces out of the walk-up surplus: paid pre-orders
 * (waiting or no-show) and every order that was handed over, whatever
 * happened to it afterwards (a refund does not bring a box back).
 */
const PIECES_GONE = "(o.status IN ('paid', 'collected', 'no_show') OR o.collected_at IS NOT NULL)";

export interface SurplusRow {
  menu_item_id: string;
  name: string;
  kind: 'ring' | 'hole';
  made: number;
  left_count: number;
  sold: number;
  pre_ordered: number;
}

/** Pre-orders whose pieces are gone from the surplus (see PIECES_GONE) per menu item of a bake day. */
export async function paidPreOrders(bakeDayId: string, transaction?: Transaction): Promise<Map<string, number>> {
  const rows = await database().query<{ menu_item_id: string; quantity: number }>(
    `SELECT l.menu_item_id, SUM(l.quantity)::int AS quantity
       FROM orders o JOIN order_boxes b ON b.order_id = o.id JOIN order_lines l ON l.order_box_id = b.id
      WHERE o.bake_day_id = :bakeDayId AND ${PIECES_GONE}
      GROUP BY l.menu_item_id`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
  return new Map(rows.map((r) => [r.menu_item_id, r.quantity]));
}

/**
 * Counts again what is left of the items in one order, after the order was
 * paid, refunded or cancelled, if the counter has made them: left = made −
 * pre-ordered − sold, never below zero (what walk-ups already took stays
 * sold) and never above what was made. Counting again rather than adding the
 * order's pieces keeps it exact when orders were paid after the counter first
 * read the surplus. The rows are locked first, so the count (a new snapshot
 * in READ COMMITTED) sees any walk-up sale that held them.
 */
export async function recountSurplusForOrder(orderId: string, bakeDayId: string, transaction: Transaction): Promise<void> {
  const replacements = { orderId, bakeDayId };
  const items = `SELECT DISTINCT l.menu_item_id FROM order_boxes b JOIN order_lines l ON l.order_box_id = b.id WHERE b.order_id = :orderId`;
  const locked = await database().query<{ menu_item_id: string }>(
    `SELECT s.menu_item_id FROM bake_day_surplus s WHERE s.bake_day_id = :bakeDayId AND s.menu_item_id IN (${items}) FOR UPDATE`,
    { replacements, type: QueryTypes.SELECT, transaction },
  );
  if (locked.length === 0) return;
  await database().query(
    `UPDATE bake_day_surplus s
        SET left_count = LEAST(s.made, GREATEST(0, s.made
              - COALESCE((SELECT SUM(l.quantity) FROM orders o JOIN order_boxes b ON b.order_id = o.id JOIN order_lines l ON l.order_box_id = b.id
                           WHERE o.bake_day_id = s.bake_day_id AND l.menu_item_id = s.menu_item_id AND ${PIECES_GONE}), 0)
              - COALESCE((SELECT SUM(i.quantity) FROM walk_up_sale_items i JOIN walk_up_sales w ON w.id = i.sale_id
                           WHERE w.bake_day_id = s.bake_day_id AND i.menu_item_id = s.menu_item_id), 0))),
            updated_at = now()
      WHERE s.bake_day_id = :bakeDayId AND s.menu_item_id IN (${items})`,
    { replacements, transaction },
  );
}

/** Pieces of no-show orders per menu item (the plan counts only held, paid and collected ones). */
export async function noShowPieces(bakeDayId: string, transaction?: Transaction): Promise<Map<string, number>> {
  const rows = await database().query<{ menu_item_id: string; quantity: number }>(
    `SELECT l.menu_item_id, SUM(l.quantity)::int AS quantity
       FROM orders o JOIN order_boxes b ON b.order_id = o.id JOIN order_lines l ON l.order_box_id = b.id
      WHERE o.bake_day_id = :bakeDayId AND o.status = 'no_show'
      GROUP BY l.menu_item_id`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
  return new Map(rows.map((r) => [r.menu_item_id, r.quantity]));
}

export async function surplusRowCount(bakeDayId: string): Promise<number> {
  const [row] = await database().query<{ n: number }>('SELECT count(*)::int AS n FROM bake_day_surplus WHERE bake_day_id = :bakeDayId', {
    replacements: { bakeDayId },
    type: QueryTypes.SELECT,
  });
  return row?.n ?? 0;
}

/** Writes the day's counters once; a second writer racing this one changes nothing. */
export async function insertSurplus(bakeDayId: string, rows: Array<{ menuItemId: string; made: number; left: number }>): Promise<void> {
  if (rows.length === 0) return;
  const values = rows.map((_, i) => `(:bakeDayId, :m${i}, :made${i}, :left${i})`).join(', ');
  const replacements: Record<string, unknown> = { bakeDayId };
  rows.forEach((r, i) => {
    replacements[`m${i}`] = r.menuItemId;
    replacements[`made${i}`] = r.made;
    replacements[`left${i}`] = r.left;
  });
  await database().query(
    `INSERT INTO bake_day_surplus (bake_day_id, menu_item_id, made, left_count) VALUES ${values}
     ON CONFLICT (bake_day_id, menu_item_id) DO NOTHING`,
    { replacements },
  );
}

export async function surplusRows(bakeDayId: string, transaction?: Transaction): Promise<SurplusRow[]> {
  return database().query<SurplusRow>(
    `SELECT s.menu_item_id, m.name, m.kind, s.made, s.left_count,
            COALESCE((SELECT SUM(i.quantity) FROM walk_up_sale_items i JOIN walk_up_sales w ON w.id = i.sale_id
                       WHERE w.bake_day_id = s.bake_day_id AND i.menu_item_id = s.menu_item_id), 0)::int AS sold,
            COALESCE((SELECT SUM(l.quantity) FROM orders o JOIN order_boxes b ON b.order_id = o.id JOIN order_lines l ON l.order_box_id = b.id
                       WHERE o.bake_day_id = s.bake_day_id AND l.menu_item_id = s.menu_item_id
                         AND ${PIECES_GONE}), 0)::int AS pre_ordered
       FROM bake_day_surplus s JOIN menu_items m ON m.id = s.menu_item_id
      WHERE s.bake_day_id = :bakeDayId
      ORDER BY m.kind DESC, m.sort_order, m.name`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
}

/** Takes `quantity` of one item if that many are left; the number left after, or null when there weren't enough. */
export async function takeSurplus(bakeDayId: string, menuItemId: string, quantity: number, transaction: Transaction): Promise<number | null> {
  const rows = await database().query<{ left_count: number }>(
    `UPDATE bake_day_surplus SET left_count = left_count - :quantity, updated_at = now()
      WHERE bake_day_id = :bakeDayId AND menu_item_id = :menuItemId AND left_count >= :quantity
      RETURNING left_count`,
    { replacements: { bakeDayId, menuItemId, quantity }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0]?.left_count ?? null;
}

export async function insertWalkUpSale(
  sale: { bakeDayId: string; method: 'cash' | 'card'; amountCents: number; soldBy: string; idempotencyKey: string | null; soldAt: Date; items: Array<{ menuItemId: string; quantity: number }> },
  transaction: Transaction,
): Promise<{ id: string; sold_at: Date }> {
  const { items, ...head } = sale;
  const [row] = await database().query<{ id: string; sold_at: Date }>(
    `INSERT INTO walk_up_sales (bake_day_id, method, amount_cents, sold_by, idempotency_key, sold_at)
     VALUES (:bakeDayId, :method, :amountCents, :soldBy, :idempotencyKey, :soldAt) RETURNING id, sold_at`,
    { replacements: head, type: QueryTypes.SELECT, transaction },
  );
  for (const item of items) {
    await database().query('INSERT INTO walk_up_sale_items (sale_id, menu_item_id, quantity) VALUES (:saleId, :menuItemId, :quantity)', {
      replacements: { saleId: row!.id, ...item },
      transaction,
    });
  }
  return row!;
}

export interface WalkUpTotalsRow {
  method: 'cash' | 'card';
  sales: number;
  amount_cents: number;
  rings: number;
  holes: number;
}

export async function walkUpTotals(bakeDayId: string): Promise<WalkUpTotalsRow[]> {
  return database().query<WalkUpTotalsRow>(
    `SELECT w.method, count(*)::int AS sales, SUM(w.amount_cents)::int AS amount_cents,
            COALESCE(SUM(p.rings), 0)::int AS rings, COALESCE(SUM(p.holes), 0)::int AS holes
       FROM walk_up_sales w
       LEFT JOIN LATERAL (
         SELECT SUM(i.quantity) FILTER (WHERE m.kind = 'ring') AS rings, SUM(i.quantity) FILTER (WHERE m.kind = 'hole') AS holes
           FROM walk_up_sale_items i JOIN menu_items m ON m.id = i.menu_item_id WHERE i.sale_id = w.id
       ) p ON true
      WHERE w.bake_day_id = :bakeDayId
      GROUP BY w.method`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT },
  );
}

/** How many of one item are left, or null when the item has no counter on this bake day. */
export async function surplusLeft(bakeDayId: string, menuItemId: string, transaction?: Transaction): Promise<number | null> {
  const rows = await database().query<{ left_count: number }>(
    'SELECT left_count FROM bake_day_surplus WHERE bake_day_id = :bakeDayId AND menu_item_id = :menuItemId',
    { replacements: { bakeDayId, menuItemId }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0]?.left_count ?? null;
}
