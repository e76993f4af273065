import { QueryTypes } from 'sequelize';
import { database } from '../sequelize.js';

// The aggregates behind the weekly sales. Money is counted when it moves:
// a pre-order in the week it was paid, a refund in the week it was made, a
// walk-up sale when it was rung up, a no-show when it was marked. Bake days
// (for sell-through) belong to the week of their date. Every range is
// [from, to): an instant is in exactly one week.

export interface Range {
  from: Date;
  to: Date;
  /** Monday and Sunday, local dates, for bake days. */
  startDate: string;
  endDate: string;
}

const select = <T extends object>(sql: string, replacements: Record<string, unknown>) =>
  database().query<T>(sql, { replacements, type: QueryTypes.SELECT });

/** Orders still standing: not cancelled and not refunded in full. */
const KEPT = `o.status NOT IN ('cancelled', 'refunded', 'held', 'expired')`;
const PAID_IN_RANGE = `o.source = 'online' AND o.paid_at >= :from AND o.paid_at < :to`;

export async function preorderMoney(range: Range) {
  const [row] = await select<{ gross: number; fees: number; orders: number; pieces: number; kept_cents: number }>(
    `SELECT COALESCE(sum(o.total_cents), 0)::int AS gross,
            COALESCE(sum(o.fee_cents), 0)::int AS fees,
            count(*) FILTER (WHERE ${KEPT})::int AS orders,
            COALESCE(sum(o.rings + o.holes) FILTER (WHERE ${KEPT}), 0)::int AS pieces,
            COALESCE(sum(o.total_cents) FILTER (WHERE ${KEPT}), 0)::int AS kept_cents
       FROM orders o WHERE ${PAID_IN_RANGE}`,
    range as unknown as Record<string, unknown>,
  );
  return row!;
}

export async function refundsMade(range: Range): Promise<number> {
  const [row] = await select<{ cents: number }>(
    `SELECT COALESCE(sum(amount_cents), 0)::int AS cents FROM refunds WHERE created_at >= :from AND created_at < :to`,
    range as unknown as Record<string, unknown>,
  );
  return row!.cents;
}

export interface ItemRow {
  bake_day_id: string;
  menu_item_id: string;
  name: string;
  kind: 'ring' | 'hole';
  flavour: string;
  glaze: string;
  glaze_recipe_id: string | null;
  orders: number;
  preorder_pieces: number;
  walk_up_pieces: number;
}

/** Pieces sold by bake day and menu item: standing pre-orders paid in the range, and walk-ups rung up in it. */
export async function piecesByItem(range: Range): Promise<ItemRow[]> {
  return select<ItemRow>(
    `WITH pre AS (
       SELECT o.bake_day_id, l.menu_item_id, count(DISTINCT o.id)::int AS orders, sum(l.quantity)::int AS pieces
         FROM orders o JOIN order_boxes b ON b.order_id = o.id JOIN order_lines l ON l.order_box_id = b.id
        WHERE ${PAID_IN_RANGE} AND ${KEPT}
        GROUP BY o.bake_day_id, l.menu_item_id
     ), walk AS (
       SELECT s.bake_day_id, i.menu_item_id, sum(i.quantity)::int AS pieces
         FROM walk_up_sales s JOIN walk_up_sale_items i ON i.sale_id = s.id
        WHERE s.sold_at >= :from AND s.sold_at < :to
        GROUP BY s.bake_day_id, i.menu_item_id
     )
     SELECT COALESCE(pre.bake_day_id, walk.bake_day_id) AS bake_day_id, m.id AS menu_item_id, m.name, m.kind, m.flavour, m.glaze, m.glaze_recipe_id,
            COALESCE(pre.orders, 0) AS orders, COALESCE(pre.pieces, 0) AS preorder_pieces, COALESCE(walk.pieces, 0) AS walk_up_pieces
       FROM pre FULL JOIN walk ON walk.bake_day_id = pre.bake_day_id AND walk.menu_item_id = pre.menu_item_id
       JOIN menu_items m ON m.id = COALESCE(pre.menu_item_id, walk.menu_item_id)
      ORDER BY m.kind DESC, m.name`,
    range as unknown as Record<string, unknown>,
  );
}

export async function walkUpSales(range: Range) {
  return select<{ method: 'cash' | 'card'; sales: number; cents: number; pieces: number }>(
    `SELECT s.method, count(*)::int AS sales, sum(s.amount_cents)::int AS cents,
            COALESCE(sum((SELECT sum(i.quantity) FROM walk_up_sale_items i WHERE i.sale_id = s.id)), 0)::int AS pieces
       FROM walk_up_sales s
      WHERE s.sold_at >= :from AND s.sold_at < :to
      GROUP BY s.method ORDER BY s.method`,
    range as unknown as Record<string, unknown>,
  );
}

/** Orders marked no-show in the range (those marked before the counter recorded when: at their window's end). */
export async function noShows(range: Range) {
  const [row] = await select<{ count: number; pieces: number }>(
    `SELECT count(*)::int AS count, COALESCE(sum(o.rings + o.holes), 0)::int AS pieces
       FROM orders o JOIN pickup_windows w ON w.id = o.pickup_window_id
      WHERE o.status = 'no_show' AND COALESCE(o.no_show_at, w.ends_at) >= :from AND COALESCE(o.no_show_at, w.ends_at) < :to`,
    range as unknown as Record<string, unknown>,
  );
  return row!;
}

/** Each bake day dated in the week: its capacity and what it sold, in advance and over the counter. */
export async function sellThrough(range: Range) {
  return select<{ id: string; date: string; place: string; status: string; capacity: number; preorder_pieces: number; walk_up_pieces: number }>(
    `SELECT d.id, to_char(d.date, 'YYYY-MM-DD') AS date, d.place, d.status, (d.ring_capacity + d.hole_capacity)::int AS capacity,
            COALESCE((SELECT sum(o.rings + o.holes) FROM orders o
                       WHERE o.bake_day_id = d.id AND o.status IN ('paid', 'collected', 'no_show')), 0)::int AS preorder_pieces,
            COALESCE((SELECT sum(i.quantity) FROM walk_up_sales s JOIN walk_up_sale_items i ON i.sale_id = s.id
                       WHERE s.bake_day_id = d.id), 0)::int AS walk_up_pieces
       FROM bake_days d
      WHERE d.date BETWEEN CAST(:startDate AS date) AND CAST(:endDate AS date) AND d.status IN ('published', 'done', 'cancelled')
      ORDER BY d.date, d.place`,
    range as unknown as Record<string, unknown>,
  );
}

/** The business's time zone: the shop settings' when they have one, else the latest bake day's, else UTC. */
export async function businessTimeZone(): Promise<string> {
  const [row] = await select<{ zone: string | null }>(
    `SELECT COALESCE(
       (SELECT to_jsonb(s) ->> 'time_zone' FROM shop_settings s WHERE id = 1),
       (SELECT time_zone FROM bake_days ORDER BY date DESC LIMIT 1),
       'UTC') AS zone`,
    {},
  );
  return row?.zone ?? 'UTC';
}
