import { DateTime } from 'luxon';
import { Op } from 'sequelize';
import { boxTakes, type BakeDayView, type CreateBakeDayInput, type Me } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { BakeDay, BakeDayBox, BakeDayMenuItem, MenuItem, PickupWindow } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { findBakeDay, toView } from './bake-days.js';
import { currentPlanningBasis, cutoffFromSchedule, equipmentCapacity } from '../production/production.js';

const invalidField = (field: string, message: string) => new AppError('invalid', `${field}: ${message}`, 400, { fields: { [field]: message } });

/**
 * The owner announces a bake day: pickup windows as local clock times in the
 * day's own time zone, the menu and box prices, capacity (checked against
 * the equipment) and when pre-orders open and close. Without a cut-off, it is
 * worked back from the production schedule.
 */
export async function createBakeDay(owner: Me, input: CreateBakeDayInput, now: Date): Promise<BakeDayView> {
  if (!DateTime.now().setZone(input.timeZone).isValid) throw invalidField('timeZone', 'Not a time zone name (like America/Denver)');
  const today = DateTime.fromJSDate(now, { zone: input.timeZone }).toISODate()!;
  if (input.date < today) throw invalidField('date', 'This date has passed');
  const at = (hhmm: string) => DateTime.fromISO(`${input.date}T${hhmm}`, { zone: input.timeZone });
  const windows = [...input.windows].sort((a, b) => a.start.localeCompare(b.start)).map((w) => ({ ...w, startsAt: at(w.start), endsAt: at(w.end) }));
  const firstPickup = windows[0]!.startsAt;

  const items = await MenuItem.findAll({ where: { id: { [Op.in]: input.menuItemIds }, active: true } });
  if (items.length !== new Set(input.menuItemIds).size) throw invalidField('menuItemIds', 'One of these items is not on the menu any more');
  for (const box of input.boxes) {
    const kind = boxTakes(box.size);
    if (!items.some((m) => m.kind === kind)) throw invalidField('boxes', `No ${kind} on this day's menu to fill ${box.size} boxes`);
  }

  const derived = await equipmentCapacity();
  if (input.ringCapacity > derived.pieces && !input.acceptAboveEquipment) {
    throw new AppError('above_equipment', `Your equipment makes about ${derived.pieces} rings a day. Confirm to offer ${input.ringCapacity}.`, 409, { derived });
  }

  const ordersOpenAt = input.ordersOpenAt ? new Date(input.ordersOpenAt) : now;
  let cutoffAt: Date;
  if (input.cutoffAt) cutoffAt = new Date(input.cutoffAt);
  else {
    const { settings, formula } = await currentPlanningBasis();
    cutoffAt = cutoffFromSchedule(settings, formula, firstPickup.toISO()!, input.timeZone, input.ringCapacity, now);
  }
  if (cutoffAt > firstPickup.toJSDate()) throw invalidField('cutoffAt', 'Orders must close before the first pickup');
  if (cutoffAt <= ordersOpenAt) throw invalidField('cutoffAt', 'Orders must close after they open');
  if (cutoffAt <= now) throw invalidField('cutoffAt', 'That cut-off has already passed: the dough would have to be started already');

  const id = await database().transaction(async (transaction) => {
    const day = await BakeDay.create(
      {
        date: input.date,
        place: input.place,
        address: input.address,
        timeZone: input.timeZone,
        status: input.publish ? 'published' : 'draft',
        ordersOpenAt,
        cutoffAt,
        ringCapacity: input.ringCapacity,
        holeCapacity: input.holeCapacity,
        ringsRemaining: input.ringCapacity,
        holesRemaining: input.holeCapacity,
      },
      { transaction },
    );
    await PickupWindow.bulkCreate(
      windows.map((w) => ({ bakeDayId: day.id, startsAt: w.startsAt.toJSDate(), endsAt: w.endsAt.toJSDate(), maxOrders: w.maxOrders, ordersRemaining: w.maxOrders })),
      { transaction },
    );
    await BakeDayBox.bulkCreate(input.boxes.map((b) => ({ ...b, bakeDayId: day.id })), { transaction });
    await BakeDayMenuItem.bulkCreate([...new Set(input.menuItemIds)].map((menuItemId) => ({ bakeDayId: day.id, menuItemId })), { transaction });
    await audit({ actorId: owner.id, action: 'bake_day.created', subjectType: 'bake_day', subjectId: day.id, details: { date: input.date, publish: input.publish } }, transaction);
    return day.id;
  });
  const day = await findBakeDay(id);
  return toView(day!, now);
}

/** Shows a draft bake day to customers; its cut-off must still be ahead. */
export async function publishBakeDay(owner: Me, bakeDayId: string, now: Date): Promise<BakeDayView> {
  const day = await findBakeDay(bakeDayId);
  if (!day) throw notFound('Bake day');
  if (day.status === 'published') return toView(day, now);
  if (day.status !== 'draft') throw new AppError('not_draft', `This bake day is ${day.status}`, 409);
  if (day.cutoffAt <= now) throw new AppError('too_late', 'Its cut-off has passed; announce it again with a later date or cut-off', 409);
  await database().transaction(async (transaction) => {
    await day.update({ status: 'published' }, { transaction });
    await audit({ actorId: owner.id, action: 'bake_day.published', subjectType: 'bake_day', subjectId: day.id }, transaction);
  });
  return toView(day, now);
}
