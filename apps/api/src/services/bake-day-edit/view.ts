import { DateTime } from 'luxon';
import type { Transaction } from 'sequelize';
import type { BakeDayEditView, BoxSize } from '@fryline/schemas';
import { BakeDay, BakeDayBox, BakeDayMenuItem, Order } from '../../db/models/index.js';
import { windowsWithBookings } from '../../db/queries/bake-day-edit.js';
import { notFound } from '../../lib/app-error.js';
import { viewStatus } from '../bake-days/bake-days.js';
import { jobForSubject } from '../../jobs/job-store.js';

const boxOrder: BoxSize[] = ['dozen', 'half-dozen', 'holes'];

/** Everything the owner's edit page needs for one bake day, drafts and called-off days included. */
export async function editView(bakeDayId: string, now: Date, transaction?: Transaction): Promise<BakeDayEditView> {
  const day = await BakeDay.findByPk(bakeDayId, { transaction });
  if (!day) throw notFound('Bake day');
  const [windows, boxes, menu, paid, job] = await Promise.all([
    windowsWithBookings(day.id),
    BakeDayBox.findAll({ where: { bakeDayId: day.id }, transaction }),
    BakeDayMenuItem.findAll({ where: { bakeDayId: day.id }, transaction }),
    Order.count({ where: { bakeDayId: day.id, status: 'paid' }, transaction }),
    jobForSubject('call-off', day.id, transaction),
  ]);
  const local = (d: Date) => DateTime.fromJSDate(d, { zone: day.timeZone }).toFormat('HH:mm');
  return {
    id: day.id,
    date: day.date,
    place: day.place,
    address: day.address,
    timeZone: day.timeZone,
    state: day.status,
    status: viewStatus(day, now),
    ordersOpenAt: day.ordersOpenAt.toISOString(),
    cutoffAt: day.cutoffAt.toISOString(),
    capacity: { rings: day.ringCapacity, holes: day.holeCapacity },
    sold: { rings: day.ringCapacity - day.ringsRemaining, holes: day.holeCapacity - day.holesRemaining },
    windows: windows.map((w) => ({
      id: w.id,
      start: local(w.starts_at),
      end: local(w.ends_at),
      startsAt: w.starts_at.toISOString(),
      endsAt: w.ends_at.toISOString(),
      maxOrders: w.max_orders,
      booked: w.booked,
      removed: w.removed_at !== null,
    })),
    menuItemIds: menu.map((m) => m.menuItemId),
    boxes: boxes
      .sort((a, b) => boxOrder.indexOf(a.size) - boxOrder.indexOf(b.size))
      .map((b) => ({ size: b.size, pieces: b.pieces, priceCents: b.priceCents })),
    paidOrders: paid,
    callOff: job,
    calledOffReason: day.calledOffReason ?? null,
  };
}
