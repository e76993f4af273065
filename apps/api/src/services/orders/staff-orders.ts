import { Op } from 'sequelize';
import { orderBill, type PricedOrder, type StaffOrderView } from '@fryline/schemas';
import { BakeDay, Order, OrderBox, OrderLine, PickupWindow, User } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';

/** An order row with its boxes and lines, as orderBill reads it. */
export function billOf(order: Order): PricedOrder {
  return {
    boxes: [...(order.boxes ?? [])]
      .sort((a, b) => a.position - b.position)
      .map((box) => ({ size: box.size, priceCents: box.priceCents, items: (box.lines ?? []).map((l) => ({ name: l.name, quantity: l.quantity, surchargeCents: l.surchargeCents })) })),
    subtotalCents: order.subtotalCents,
    taxCents: order.taxCents,
    totalCents: order.totalCents,
  };
}

/** Every order of a bake day that was ever paid or is on hold, for the staff, by pickup window then name. */
export async function listBakeDayOrders(bakeDayId: string): Promise<StaffOrderView[]> {
  if (!(await BakeDay.findByPk(bakeDayId))) throw notFound('Bake day');
  const orders = await Order.findAll({
    where: { bakeDayId, [Op.or]: [{ status: { [Op.in]: ['held', 'paid', 'collected', 'no_show', 'refunded'] } }, { paidAt: { [Op.ne]: null } }] },
    include: [
      { model: User, as: 'user' },
      { model: PickupWindow, as: 'pickupWindow' },
      { model: OrderBox, as: 'boxes', include: [{ model: OrderLine, as: 'lines' }] },
    ],
  });
  return orders
    .map((o) => ({
      id: o.id,
      status: o.status,
      customer: { name: o.user!.name, email: o.user!.email },
      pickupCode: o.status === 'held' ? null : o.pickupCode ?? null,
      pickupWindow: { id: o.pickupWindow!.id, startsAt: o.pickupWindow!.startsAt.toISOString(), endsAt: o.pickupWindow!.endsAt.toISOString() },
      totalCents: o.totalCents,
      refundedCents: o.refundedCents,
      currency: o.currency,
      paidAt: o.paidAt?.toISOString() ?? null,
      rings: o.rings,
      holes: o.holes,
      boxes: [...(o.boxes ?? [])]
        .sort((a, b) => a.position - b.position)
        .map((b) => ({ size: b.size, items: (b.lines ?? []).map((l) => ({ name: l.name, quantity: l.quantity })) })),
      priceLines: orderBill(billOf(o), o.currency).lines,
    }))
    .sort((a, b) => a.pickupWindow.startsAt.localeCompare(b.pickupWindow.startsAt) || a.customer.name.localeCompare(b.customer.name));
}
