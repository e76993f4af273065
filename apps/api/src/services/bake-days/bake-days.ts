import { Op } from 'sequelize';
import { DateTime } from 'luxon';
import { boxLabel, boxSizes, type BakeDayStatus, type BakeDayView, type Allergen } from '@fryline/schemas';
import { BakeDay, BakeDayBox, MenuItem, PickupWindow } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';
import { shopSettings } from '../shop/settings.js';

/** What a customer sees: not yet open, open, closed (past the cut-off), or done (the day is over). */
export function viewStatus(day: Pick<BakeDay, 'status' | 'ordersOpenAt' | 'cutoffAt' | 'date' | 'timeZone'>, now: Date): BakeDayStatus {
  if (day.status === 'done') return 'done';
  const today = DateTime.fromJSDate(now, { zone: day.timeZone }).toISODate()!;
  if (day.date < today) return 'done';
  if (now < day.ordersOpenAt) return 'upcoming';
  if (now < day.cutoffAt && day.status === 'published') return 'open';
  return 'closed';
}

/** Everything a bake day's view needs: its windows, boxes and menu. */
export const bakeDayInclude = [
  { model: PickupWindow, as: 'pickupWindows' },
  { model: BakeDayBox, as: 'boxes' },
  { model: MenuItem, as: 'menuItems', through: { attributes: [] } },
];

export async function toView(day: BakeDay, now: Date): Promise<BakeDayView> {
  const settings = await shopSettings();
  return {
    id: day.id,
    date: day.date,
    place: day.place,
    address: day.address,
    timeZone: day.timeZone,
    status: viewStatus(day, now),
    ordersOpenAt: day.ordersOpenAt.toISOString(),
    cutoffAt: day.cutoffAt.toISOString(),
    remaining: { rings: day.ringsRemaining, holes: day.holesRemaining },
    capacity: { rings: day.ringCapacity, holes: day.holeCapacity },
    pickupWindows: [...(day.pickupWindows ?? [])]
      .filter((w) => !w.removedAt)
      .sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime())
      .map((w) => ({ id: w.id, startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(), ordersLeft: w.ordersRemaining })),
    boxes: [...(day.boxes ?? [])]
      .sort((a, b) => boxSizes.indexOf(a.size) - boxSizes.indexOf(b.size))
      .map((b) => ({ size: b.size, pieces: b.pieces, priceCents: b.priceCents, label: boxLabel(b.size) })),
    menu: [...(day.menuItems ?? [])]
      .filter((m) => m.active)
      .sort((a, b) => a.sortOrder - b.sortOrder || a.name.localeCompare(b.name))
      .map((m) => ({
        id: m.id,
        name: m.name,
        flavour: m.flavour,
        glaze: m.glaze,
        description: m.description,
        kind: m.kind,
        surchargeCents: m.surchargeCents,
        allergens: m.allergens as Allergen[],
      })),
    tax: settings.tax,
  };
}

/** Published bake days from yesterday on (the view status says which are over), soonest first. */
export async function listUpcoming(now: Date): Promise<BakeDayView[]> {
  const from = DateTime.fromJSDate(now).minus({ days: 1 }).toISODate()!;
  const days = await BakeDay.findAll({
    where: { status: { [Op.in]: ['published', 'done'] }, date: { [Op.gte]: from } },
    include: bakeDayInclude,
    order: [['date', 'ASC']],
  });
  const views = await Promise.all(days.map((d) => toView(d, now)));
  return views.filter((v) => v.status !== 'done');
}

/** For the staff: bake days of the last `days` days that are over, newest first. */
export async function listPast(now: Date, days = 60): Promise<BakeDayView[]> {
  const from = DateTime.fromJSDate(now).minus({ days }).toISODate()!;
  const rows = await BakeDay.findAll({ where: { date: { [Op.gte]: from } }, include: bakeDayInclude, order: [['date', 'DESC']] });
  const views = await Promise.all(rows.map((d) => toView(d, now)));
  return views.filter((v) => v.status === 'done');
}

/** For the owner: drafts not yet shown to customers, soonest first. */
export async function listDrafts(now: Date): Promise<BakeDayView[]> {
  const rows = await BakeDay.findAll({ where: { status: 'draft' }, include: bakeDayInclude, order: [['date', 'ASC']] });
  return Promise.all(rows.map((d) => toView(d, now)));
}

/** One bake day with its windows, boxes and menu, or null. */
export function findBakeDay(id: string) {
  return BakeDay.findByPk(id, { include: bakeDayInclude });
}

export async function getBakeDay(id: string, now: Date): Promise<BakeDayView> {
  const day = await findBakeDay(id);
  if (!day || day.status === 'draft') throw notFound('Bake day');
  return toView(day, now);
}
