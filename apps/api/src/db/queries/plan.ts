import { QueryTypes } from 'sequelize';
import { database } from '../sequelize.js';

// The aggregates behind a bake day's production sheet. Every order that may
// still be made counts: held (its hold may still be paid), paid and collected.

export interface OrderedLine {
  menu_item_id: string;
  name: string;
  kind: 'ring' | 'hole';
  glaze_recipe_id: string | null;
  quantity: number;
}

/** Pieces ordered per menu item for a bake day. */
export function orderedLines(bakeDayId: string): Promise<OrderedLine[]> {
  return database().query<OrderedLine>(
    `SELECT l.menu_item_id, m.name, l.kind, m.glaze_recipe_id, SUM(l.quantity)::int AS quantity
       FROM orders o
       JOIN order_boxes b ON b.order_id = o.id
       JOIN order_lines l ON l.order_box_id = b.id
       JOIN menu_items m ON m.id = l.menu_item_id
      WHERE o.bake_day_id = :id AND o.status IN ('held', 'paid', 'collected')
      GROUP BY l.menu_item_id, m.name, l.kind, m.glaze_recipe_id
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
