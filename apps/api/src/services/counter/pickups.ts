import type { Transaction } from 'sequelize';
import type { OrderByCode, PickupBox, PickupRow } from '@fryline/schemas';
import { normalisePickupCode } from '@fryline/schemas';
import { boxLines, counterOrder, pickupOrders, type BoxLineRow, type CounterOrderRow } from '../../db/queries/counter-orders.js';
import { BakeDay } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';

function boxesByOrder(lines: BoxLineRow[]): Map<string, PickupBox[]> {
  const out = new Map<string, PickupBox[]>();
  const byBox = new Map<string, PickupBox>();
  for (const line of lines) {
    const key = `${line.order_id}:${line.position}`;
    let box = byBox.get(key);
    if (!box) {
      box = { size: line.size, pieces: line.pieces, items: [] };
      byBox.set(key, box);
      out.set(line.order_id, [...(out.get(line.order_id) ?? []), box]);
    }
    if (line.menu_item_id && line.name && line.quantity) box.items.push({ menuItemId: line.menu_item_id, name: line.name, quantity: line.quantity });
  }
  return out;
}

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

export function toPickupRow(o: CounterOrderRow, boxes: PickupBox[], now: Date): PickupRow {
  return {
    orderId: o.id,
    name: o.name,
    pickupCode: o.pickup_code,
    windowId: o.pickup_window_id,
    status: o.status,
    boxes,
    rings: o.rings,
    holes: o.holes,
    window: { startsAt: iso(o.starts_at)!, endsAt: iso(o.ends_at)! },
    noShowFrom: iso(o.no_show_from)!,
    late: o.status === 'paid' && now > new Date(o.ends_at),
    collectedAt: iso(o.collected_at),
    collectedBy: o.collected_by,
    undoUntil: iso(o.undo_until),
    noShowAt: iso(o.no_show_at),
    noShowBy: o.no_show_by,
  };
}

/** The bake day's pickup list, by window then name. */
export async function listPickups(bakeDayId: string, now: Date): Promise<PickupRow[]> {
  if (!(await BakeDay.findByPk(bakeDayId, { attributes: ['id'] }))) throw notFound('Bake day');
  const orders = await pickupOrders(bakeDayId, now);
  const boxes = boxesByOrder(await boxLines(orders.map((o) => o.id)));
  return orders.map((o) => toPickupRow(o, boxes.get(o.id) ?? [], now));
}

/** One order as the counter's list shows it, read inside the change that touched it. */
export async function pickupRow(orderId: string, now: Date, transaction?: Transaction): Promise<PickupRow> {
  const order = await counterOrder({ id: orderId }, now, transaction);
  if (!order) throw notFound('Order');
  const boxes = boxesByOrder(await boxLines([order.id], transaction));
  return toPickupRow(order, boxes.get(order.id) ?? [], now);
}

/** The order a pickup code names, typed any case, with spaces or dashes, or with look-alike characters. */
export async function findByCode(code: string, now: Date): Promise<OrderByCode> {
  const normalised = normalisePickupCode(code);
  const order = normalised ? await counterOrder({ pickupCode: normalised }, now) : null;
  if (!order || !order.pickup_code) throw notFound('Order with that pickup code');
  const boxes = boxesByOrder(await boxLines([order.id])).get(order.id) ?? [];
  return {
    id: order.id,
    status: order.status,
    pickupCode: order.pickup_code,
    bakeDayId: order.bake_day_id,
    windowId: order.pickup_window_id,
    name: order.name,
    boxes,
    rings: order.rings,
    holes: order.holes,
    bakeDay: { date: order.day_date, place: order.day_place, timeZone: order.time_zone },
    window: { startsAt: iso(order.starts_at)!, endsAt: iso(order.ends_at)! },
    collectedAt: iso(order.collected_at),
    collectedBy: order.collected_by,
  };
}
