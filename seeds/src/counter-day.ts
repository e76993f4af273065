import { DateTime } from 'luxon';
import { BakeDay, BakeDayBox, BakeDayMenuItem, database, MenuItem, Order, OrderBox, OrderLine, PickupWindow, User } from '@fryline/api/db';
import { newPickupCode } from '@fryline/api/services/orders/pickup-codes';
import { DEMO_TIME_ZONE, demoBoxes } from './demo.js';

// A bake day happening now, for the counter: one window already over (its
// grace too), one under way and one still to come, with paid pre-orders in
// each. Used by the tests and the demo; needs seedDemo's menu and people.

export interface CounterDayOrder {
  /** 0: over, 1: under way, 2: to come. */
  window: 0 | 1 | 2;
  name: string;
  email?: string;
  boxes: Array<{ size: 'dozen' | 'half-dozen' | 'holes'; items: Array<{ menuItem: string; quantity: number }> }>;
}

export const counterDayOrders: CounterDayOrder[] = [
  { window: 0, name: 'Wren Abernathy', boxes: [{ size: 'dozen', items: [{ menuItem: 'Vanilla Bean Glaze', quantity: 6 }, { menuItem: 'Brown Butter Maple', quantity: 6 }] }] },
  { window: 0, name: 'Hollis Penrose', boxes: [{ size: 'half-dozen', items: [{ menuItem: 'Cardamom Sugar', quantity: 6 }] }] },
  { window: 1, name: 'Ada Quillfeather', boxes: [{ size: 'dozen', items: [{ menuItem: 'Dark Chocolate Dip', quantity: 12 }] }, { size: 'holes', items: [{ menuItem: 'Cinnamon Sugar Holes', quantity: 12 }] }] },
  { window: 1, name: 'Bram Ellery', boxes: [{ size: 'half-dozen', items: [{ menuItem: 'Vanilla Bean Glaze', quantity: 3 }, { menuItem: 'Lemon Poppy Glaze', quantity: 3 }] }] },
  { window: 1, name: 'Cleo Marchetti', boxes: [{ size: 'half-dozen', items: [{ menuItem: 'Honey Sesame', quantity: 6 }] }] },
  { window: 2, name: 'Dorian Fitch', boxes: [{ size: 'dozen', items: [{ menuItem: 'Vanilla Bean Glaze', quantity: 12 }] }] },
];

export interface SeededCounterDay {
  day: BakeDay;
  windows: PickupWindow[];
  orders: Array<{ id: string; code: string; name: string; email: string; windowIndex: number; rings: number; holes: number }>;
}

export async function seedCounterDay(nowDate: Date = new Date(), orders: CounterDayOrder[] = counterDayOrders): Promise<SeededCounterDay> {
  const now = DateTime.fromJSDate(nowDate).setZone(DEMO_TIME_ZONE).startOf('minute');
  return database().transaction(async (transaction) => {
    const menu = await MenuItem.findAll({ where: { active: true }, order: [['sortOrder', 'ASC']], transaction });
    if (menu.length === 0) throw new Error('seedCounterDay needs the demo menu: run seedDemo first');
    const menuItem = (name: string) => {
      const m = menu.find((x) => x.name === name);
      if (!m) throw new Error(`no menu item named ${name}`);
      return m;
    };
    const day = await BakeDay.create(
      {
        date: now.toISODate()!,
        place: 'Larkspur Landing market, stall 14',
        address: '200 Millrace Road, Cobble Ridge',
        timeZone: DEMO_TIME_ZONE,
        status: 'published',
        ordersOpenAt: now.minus({ days: 4 }).toJSDate(),
        cutoffAt: now.minus({ hours: 16 }).toJSDate(),
        ringCapacity: 120,
        holeCapacity: 96,
        ringsRemaining: 120,
        holesRemaining: 96,
      },
      { transaction },
    );
    // over (grace too) · under way · to come
    const spans = [[-150, -90], [-30, 30], [30, 90]] as const;
    const windows: PickupWindow[] = [];
    for (const [i, [from, to]] of spans.entries()) {
      const maxOrders = Math.max(25, orders.filter((o) => o.window === i).length);
      windows.push(
        await PickupWindow.create({ bakeDayId: day.id, startsAt: now.plus({ minutes: from }).toJSDate(), endsAt: now.plus({ minutes: to }).toJSDate(), maxOrders, ordersRemaining: maxOrders }, { transaction }),
      );
    }
    await BakeDayBox.bulkCreate(demoBoxes.map((b) => ({ ...b, bakeDayId: day.id })), { transaction });
    await BakeDayMenuItem.bulkCreate(menu.map((m) => ({ bakeDayId: day.id, menuItemId: m.id })), { transaction });

    const seeded: SeededCounterDay['orders'] = [];
    let ringsTaken = 0;
    let holesTaken = 0;
    for (const [i, spec] of orders.entries()) {
      const email = spec.email ?? `${spec.name.toLowerCase().replace(/[^a-z]+/g, '.')}@example.test`;
      const [user] = await User.findOrCreate({ where: { email }, defaults: { email, name: spec.name, role: 'customer', emailVerified: true }, transaction });
      let rings = 0;
      let holes = 0;
      let subtotal = 0;
      for (const box of spec.boxes) {
        const pieces = box.items.reduce((n, it) => n + it.quantity, 0);
        if (box.size === 'holes') holes += pieces;
        else rings += pieces;
        subtotal += demoBoxes.find((b) => b.size === box.size)!.priceCents;
        for (const item of box.items) subtotal += (menuItem(item.menuItem).surchargeCents ?? 0) * item.quantity;
      }
      const window = windows[spec.window]!;
      const paidAt = now.minus({ days: 2, minutes: i }).toJSDate();
      const order = await Order.create(
        {
          userId: user.id,
          bakeDayId: day.id,
          pickupWindowId: window.id,
          status: 'paid',
          rings,
          holes,
          holdsCapacity: true,
          subtotalCents: subtotal,
          taxCents: 0,
          totalCents: subtotal,
          feeCents: Math.round(subtotal * 0.029) + 30,
          pickupCode: newPickupCode(),
          paidAt,
          createdAt: paidAt,
        },
        { transaction },
      );
      for (const [position, box] of spec.boxes.entries()) {
        const pieces = box.items.reduce((n, it) => n + it.quantity, 0);
        const row = await OrderBox.create({ orderId: order.id, position, size: box.size, pieces, priceCents: demoBoxes.find((b) => b.size === box.size)!.priceCents }, { transaction });
        for (const item of box.items) {
          const m = menuItem(item.menuItem);
          await OrderLine.create({ orderBoxId: row.id, menuItemId: m.id, name: m.name, kind: m.kind, quantity: item.quantity, surchargeCents: m.surchargeCents, allergens: m.allergens }, { transaction });
        }
      }
      await window.decrement('ordersRemaining', { by: 1, transaction });
      ringsTaken += rings;
      holesTaken += holes;
      seeded.push({ id: order.id, code: order.pickupCode!, name: spec.name, email, windowIndex: spec.window, rings, holes });
    }
    // a day busier than the demo's capacity (a benchmark) gets the capacity it sold
    const ringCapacity = Math.max(120, ringsTaken);
    const holeCapacity = Math.max(96, holesTaken);
    await day.update({ ringCapacity, holeCapacity, ringsRemaining: ringCapacity - ringsTaken, holesRemaining: holeCapacity - holesTaken }, { transaction });
    return { day, windows, orders: seeded };
  });
}

/** Removes a day made by seedCounterDay with everything recorded against it, so later tests see the demo as it was. */
export async function removeCounterDay(bakeDayId: string): Promise<void> {
  await database().transaction(async (transaction) => {
    const q = (sql: string) => database().query(sql, { replacements: { bakeDayId }, transaction });
    await q('DELETE FROM walk_up_sales WHERE bake_day_id = :bakeDayId');
    await q('DELETE FROM bake_day_surplus WHERE bake_day_id = :bakeDayId');
    await q('DELETE FROM refunds WHERE order_id IN (SELECT id FROM orders WHERE bake_day_id = :bakeDayId)');
    await q('DELETE FROM orders WHERE bake_day_id = :bakeDayId');
    await q('DELETE FROM bake_days WHERE id = :bakeDayId');
  });
}
