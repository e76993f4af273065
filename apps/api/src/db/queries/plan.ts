import { QueryTypes } from 'sequelize';
import { database } from '../sequelize.js';

// The aggregates behind a bake day's production sheet. Every order that may
// still be made counts: held (its hold may still be paid), paid and collected.

export interface OrderedLine {
  menu_item_id: string;
  name: string;
  kind: 'ring' | 'hole';
  glaze_recipe_id: string | null;
  /** The menu item's flavour: it may name a flavoured dough. */
  flavour: string;
  quantity: number;
}

/** Pieces ordered per menu item for a bake day. */
export function orderedLines(bakeDayId: string): Promise<OrderedLine[]> {
  return database().query<OrderedLine>(
    `SELECT l.menu_item_id, m.name, l.kind, m.glaze_recipe_id, m.flavour, SUM(l.quantity)::int AS quantity
       FROM orders o
       JOIN order_boxes b ON b.order_id = o.id
       JOIN order_lines l ON l.order_box_id = b.id
       JOIN menu_items m ON m.id = l.menu_item_id
      WHERE o.bake_day_id = :id AND o.status IN ('held', 'paid', 'collected')
      GROUP BY l.menu_item_id, m.name, l.kind, m.glaze_recipe_id, m.flavour
      ORDER BY m.name`,
    { replacements: { id: bakeDayId }, type: QueryTypes.SELECT },
  );
}

/** How many of a bake day's counted orders are in each status. */
export function orderCountsByStatus(bakeDayId: string): Promise<Array<{ status: string; n: number }>> {
  return database().query<{ status: string; n: number }>(
    `SELECT status, count(*)::int AS n FROM orders WHERE bake_day_id = :id AND status IN ('held', 'paid', 'collected') GROUP BY status`,
    { replacements: { id: bakeDayId }, type: QueryTypes.SELECT },
  );
}

/** Boxes to pack for a bake day's counted orders. */
export async function boxesToPack(bakeDayId: string): Promise<number> {
  const [row] = await database().query<{ n: number }>(
    `SELECT count(*)::int AS n
       FROM orders o JOIN order_boxes b ON b.order_id = o.id
      WHERE o.bake_day_id = :id AND o.status IN ('held', 'paid', 'collected')`,
    { replacements: { id: bakeDayId }, type: QueryTypes.SELECT },
  );
  return row?.n ?? 0;
}
