import crypto from 'node:crypto';
import { DateTime } from 'luxon';
import { Op, type Transaction } from 'sequelize';
import type { BakeDayEditResult, EditBakeDayInput, Me } from '@fryline/schemas';
import { transactionWithRetry } from '../../db/retry.js';
import { BakeDay, BakeDayBox, BakeDayMenuItem, MenuItem, PickupWindow } from '../../db/models/index.js';
import { paidOrders, windowsWithBookings, type WindowRow } from '../../db/queries/bake-day-edit.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { equipmentCapacity } from '../production/production.js';
import { offerFreedCapacity } from '../waitlist/waitlist.js';
import { setCapacityKeepingSold } from './capacity.js';
import { queueChangeNotices, type OrderChange } from './change-mail.js';
import { editView } from './view.js';

export { editView } from './view.js';

const invalidField = (field: string, message: string) => new AppError('invalid', `${field}: ${message}`, 400, { fields: { [field]: message } });

async function lockDay(bakeDayId: string, transaction: Transaction): Promise<BakeDay> {
  const day = await BakeDay.findByPk(bakeDayId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!day) throw notFound('Bake day');
  if (day.status === 'cancelled') throw new AppError('called_off', 'This bake day is called off and can no longer change', 409);
  if (day.status === 'done') throw new AppError('already_done', 'This bake day is marked done and can no longer change', 409);
  return day;
}

interface Changes {
  words: string[];
  /** Per paid order: what changed for its customer. */
  orders: Map<string, OrderChange>;
}

function noteFor(changes: Changes, orderId: string, windowId: string, line: string) {
  const entry = changes.orders.get(orderId) ?? { windowId, lines: [] };
  entry.lines.push(line);
  changes.orders.set(orderId, entry);
}

/**
 * Pickup windows: the list sent is what the day keeps. A window with an id
 * moves or gets a new cap (never below the orders already in it); one
 * without is added; one left out is deleted, or, if orders point at it, taken
 * off the shop and its paid customers asked to pick another.
 */
async function applyWindows(day: BakeDay, input: NonNullable<EditBakeDayInput['windows']>, changes: Changes, transaction: Transaction, now: Date) {
  const current = await windowsWithBookings(day.id, transaction);
  const byId = new Map(current.map((w) => [w.id, w]));
  const at = (hhmm: string) => DateTime.fromISO(`${day.date}T${hhmm}`, { zone: day.timeZone }).toJSDate();
  const label = (w: { starts_at: Date; ends_at: Date }) => {
    const f = (d: Date) => DateTime.fromJSDate(d, { zone: day.timeZone }).toFormat('h:mm a');
    return `${f(w.starts_at)}–${f(w.ends_at)}`;
  };
  const kept = new Set<string>();
  for (const [i, w] of input.entries()) {
    const startsAt = at(w.start);
    const endsAt = at(w.end);
    if (!w.id) {
      await PickupWindow.create({ bakeDayId: day.id, startsAt, endsAt, maxOrders: w.maxOrders, ordersRemaining: w.maxOrders }, { transaction });
      changes.words.push(`Added the pickup window ${label({ starts_at: startsAt, ends_at: endsAt })}`);
      continue;
    }
    const old = byId.get(w.id);
    if (!old) throw invalidField(`windows.${i}.id`, 'Not a pickup window of this bake day');
    kept.add(old.id);
    if (w.maxOrders !== null && w.maxOrders < old.booked) {
      throw new AppError('window_below_booked', `The window ${label(old)} already has ${old.booked} orders; its cap can't go below that (you asked for ${w.maxOrders}).`, 409, {
        booked: old.booked,
        requested: w.maxOrders,
        fields: { [`windows.${i}.maxOrders`]: `At least ${old.booked}: that many orders are in it` },
      });
    }
    const moved = old.starts_at.getTime() !== startsAt.getTime() || old.ends_at.getTime() !== endsAt.getTime();
    const recapped = old.max_orders !== w.maxOrders;
    if (!moved && !recapped && !old.removed_at) continue;
    await PickupWindow.update(
      { startsAt, endsAt, maxOrders: w.maxOrders, ordersRemaining: w.maxOrders === null ? null : w.maxOrders - old.booked, removedAt: null },
      { where: { id: old.id }, transaction },
    );
    const moved_ = { starts_at: startsAt, ends_at: endsAt };
    if (old.removed_at) changes.words.push(`Put the pickup window ${label(moved_)} back`);
    if (recapped) changes.words.push(`Pickup window ${label(moved_)}: ${w.maxOrders === null ? 'no cap' : `at most ${w.maxOrders} orders`}`);
    if (moved) {
      changes.words.push(`Moved the pickup window ${label(old)} to ${label(moved_)}`);
      for (const order of await paidOrders(day.id, transaction, [old.id])) {
        noteFor(changes, order.id, old.id, `Your pickup window moved from ${label(old)} to ${label(moved_)}.`);
      }
    }
  }
  const gone = current.filter((w: WindowRow) => !kept.has(w.id) && !w.removed_at);
  if (current.filter((w) => kept.has(w.id)).length + input.filter((w) => !w.id).length === 0) {
    throw invalidField('windows', 'Keep at least one pickup window');
  }
  for (const w of gone) {
    if (w.referenced === 0) {
      await PickupWindow.destroy({ where: { id: w.id }, transaction });
    } else {
      await PickupWindow.update({ removedAt: now }, { where: { id: w.id }, transaction });
      for (const order of await paidOrders(day.id, transaction, [w.id])) {
        noteFor(changes, order.id, w.id, `Your pickup window ${label(w)} was taken off the day. Please choose another window, or cancel for a full refund.`);
      }
    }
    changes.words.push(`Took the pickup window ${label(w)} off the day`);
  }
  const all = await PickupWindow.findAll({ where: { bakeDayId: day.id, removedAt: null }, order: [['startsAt', 'ASC']], transaction });
  for (let i = 1; i < all.length; i += 1) {
    if (all[i]!.startsAt < all[i - 1]!.endsAt) throw invalidField('windows', 'Pickup windows must not overlap');
  }
}

async function applyMenu(day: BakeDay, input: EditBakeDayInput, changes: Changes, transaction: Transaction) {
  const menuIds = input.menuItemIds ?? (await BakeDayMenuItem.findAll({ where: { bakeDayId: day.id }, transaction })).map((m) => m.menuItemId);
  const boxes = input.boxes ?? (await BakeDayBox.findAll({ where: { bakeDayId: day.id }, transaction })).map((b) => ({ size: b.size, pieces: b.pieces, priceCents: b.priceCents }));
  if (input.menuItemIds) {
    const items = await MenuItem.findAll({ where: { id: { [Op.in]: menuIds } }, transaction });
    const current = new Set((await BakeDayMenuItem.findAll({ where: { bakeDayId: day.id }, transaction })).map((m) => m.menuItemId));
    const unknown = items.length !== new Set(menuIds).size;
    const archived = items.some((m) => !m.active && !current.has(m.id));
    if (unknown || archived) throw invalidField('menuItemIds', 'One of these items is not on the menu any more');
    await BakeDayMenuItem.destroy({ where: { bakeDayId: day.id }, transaction });
    await BakeDayMenuItem.bulkCreate([...new Set(menuIds)].map((menuItemId) => ({ bakeDayId: day.id, menuItemId })), { transaction });
    const added = items.filter((m) => !current.has(m.id)).map((m) => m.name);
    const removed = [...current].filter((id) => !menuIds.includes(id)).length;
    if (added.length || removed) changes.words.push(`Menu: ${[added.length ? `added ${added.join(', ')}` : '', removed ? `took off ${removed} item${removed === 1 ? '' : 's'}` : ''].filter(Boolean).join('; ')}`);
  }
  const kinds = new Set((await MenuItem.findAll({ where: { id: { [Op.in]: menuIds } }, transaction })).map((m) => m.kind));
  for (const box of boxes) {
    const kind = box.size === 'holes' ? 'hole' : 'ring';
    if (!kinds.has(kind)) throw invalidField(input.boxes ? 'boxes' : 'menuItemIds', `No ${kind} on this day's menu to fill ${box.size} boxes`);
  }
  if (input.boxes) {
    await BakeDayBox.destroy({ where: { bakeDayId: day.id }, transaction });
    await BakeDayBox.bulkCreate(input.boxes.map((b) => ({ ...b, bakeDayId: day.id })), { transaction });
    changes.words.push('Box sizes and prices updated (orders already paid keep their price)');
  }
}

/**
 * The owner changes an announced (or draft) bake day. Everything happens in
 * one transaction under the day's row lock, so an order arriving meanwhile
 * waits; anything refused leaves the day as it was. Paid customers whose
 * window moved or went, or whose place changed, get one e-mail each with
 * what changed and a link to move or cancel with a full refund.
 */
export async function editBakeDay(owner: Me, bakeDayId: string, input: EditBakeDayInput, now: Date): Promise<BakeDayEditResult> {
  const changeId = crypto.randomUUID();
  let told = 0;
  let changes: Changes = { words: [], orders: new Map() };
  await transactionWithRetry(async (transaction) => {
    changes = { words: [], orders: new Map() }; // afresh on a retried try
    const day = await lockDay(bakeDayId, transaction);
    const placeChanged = (input.place !== undefined && input.place !== day.place) || (input.address !== undefined && input.address !== day.address);
    if (placeChanged) {
      const from = [day.place, day.address].filter(Boolean).join(', ');
      const to = [input.place ?? day.place, input.address ?? day.address].filter(Boolean).join(', ');
      changes.words.push(`Place: ${from} → ${to}`);
      for (const order of await paidOrders(day.id, transaction)) noteFor(changes, order.id, order.pickup_window_id, `The place changed from ${from} to ${to}.`);
      await day.update({ place: input.place ?? day.place, address: input.address ?? day.address }, { transaction });
    }
    if (input.windows) await applyWindows(day, input.windows, changes, transaction, now);

    const rings = input.ringCapacity ?? day.ringCapacity;
    const holes = input.holeCapacity ?? day.holeCapacity;
    if (rings !== day.ringCapacity || holes !== day.holeCapacity) {
      if (rings > day.ringCapacity && !input.acceptAboveEquipment) {
        const derived = await equipmentCapacity();
        if (rings > derived.pieces) {
          throw new AppError('above_equipment', `Your equipment makes about ${derived.pieces} rings a day. Confirm to offer ${rings}.`, 409, { derived });
        }
      }
      await setCapacityKeepingSold(day.id, rings, holes, transaction);
      changes.words.push(`Capacity: ${day.ringCapacity} → ${rings} rings, ${day.holeCapacity} → ${holes} holes`);
    }

    const openAt = input.ordersOpenAt ? new Date(input.ordersOpenAt) : day.ordersOpenAt;
    const cutoffAt = input.cutoffAt ? new Date(input.cutoffAt) : day.cutoffAt;
    if (openAt.getTime() !== day.ordersOpenAt.getTime() || cutoffAt.getTime() !== day.cutoffAt.getTime()) {
      const first = await PickupWindow.min('startsAt', { where: { bakeDayId: day.id, removedAt: null }, transaction });
      if (cutoffAt <= openAt) throw invalidField('cutoffAt', 'Orders must close after they open');
      if (first && cutoffAt > (first as Date)) throw invalidField('cutoffAt', 'Orders must close before the first pickup');
      const f = (d: Date) => DateTime.fromJSDate(d, { zone: day.timeZone }).toFormat('ccc d LLL, h:mm a');
      if (openAt.getTime() !== day.ordersOpenAt.getTime()) changes.words.push(`Orders open ${f(openAt)}`);
      if (cutoffAt.getTime() !== day.cutoffAt.getTime()) changes.words.push(`Orders close ${f(cutoffAt)}`);
      await day.update({ ordersOpenAt: openAt, cutoffAt }, { transaction });
    }

    if (input.menuItemIds || input.boxes) await applyMenu(day, input, changes, transaction);
    if (changes.words.length === 0) return;

    await audit({ actorId: owner.id, action: 'bake_day.changed', subjectType: 'bake_day', subjectId: day.id, details: { changes: changes.words, changeId } }, transaction);
    told = await queueChangeNotices(changeId, changes.orders, transaction);
    if (rings > day.ringCapacity || holes > day.holeCapacity) await offerFreedCapacity(day.id, transaction, now);
  });
  return { day: await editView(bakeDayId, now), changes: changes.words, customersTold: told };
}

type Action = 'open-now' | 'close-now' | 'mark-done';

/** Open orders now, close them now, or mark the day done (over: no more orders or changes). */
export async function bakeDayAction(owner: Me, bakeDayId: string, action: Action, now: Date): Promise<BakeDayEditResult> {
  const words: string[] = [];
  await transactionWithRetry(async (transaction) => {
    words.length = 0; // afresh on a retried try
    const day = await lockDay(bakeDayId, transaction);
    if (action === 'open-now') {
      if (day.status === 'draft') throw new AppError('draft', 'Publish this draft first', 409);
      if (now >= day.cutoffAt) throw new AppError('too_late', 'Its cut-off has passed; set a later cut-off first', 409);
      if (day.ordersOpenAt <= now) throw new AppError('already_open', 'Orders are already open', 409);
      await day.update({ ordersOpenAt: now }, { transaction });
      words.push('Opened orders early');
    } else if (action === 'close-now') {
      if (day.cutoffAt <= now) throw new AppError('already_closed', 'Orders are already closed', 409);
      await day.update({ cutoffAt: now, ordersOpenAt: day.ordersOpenAt < now ? day.ordersOpenAt : new Date(now.getTime() - 1000) }, { transaction });
      words.push('Closed orders early');
    } else {
      await day.update({ status: 'done', cutoffAt: day.cutoffAt < now ? day.cutoffAt : now, ordersOpenAt: day.ordersOpenAt < now ? day.ordersOpenAt : new Date(now.getTime() - 1000) }, { transaction });
      words.push('Marked done');
    }
    await audit({ actorId: owner.id, action: `bake_day.${action}`, subjectType: 'bake_day', subjectId: day.id }, transaction);
  });
  return { day: await editView(bakeDayId, now), changes: words, customersTold: 0 };
}
