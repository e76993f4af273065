import { madeByMenuItem } from '@fryline/production';
import type { Surplus, SurplusItem } from '@fryline/schemas';
import { insertSurplus, noShowPieces, paidPreOrders, surplusRowCount, surplusRows } from '../../db/queries/surplus.js';
import { BakeDay, BakeDayMenuItem } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';
import { getProductionSettings, planForBakeDay } from '../production/production.js';

// Surplus per menu item = what the production plan made − paid pre-orders −
// walk-ups sold. The counters are written the first time the counter asks
// (the plan's figures and the paid pre-orders as they are then); from then
// on walk-up sales take from them by one conditional UPDATE, and whenever an
// order is paid, refunded or cancelled its items are counted again
// (recountSurplusForOrder), so a refund gives back only what is really left.

/** What the plan made of each menu item of the day, from the production sheet. */
async function madeForDay(bakeDayId: string, now: Date) {
  const [{ plan, meta }, settings, noShows] = await Promise.all([planForBakeDay(bakeDayId, now), getProductionSettings(), noShowPieces(bakeDayId)]);
  const made = madeByMenuItem({
    menu: meta.menu.map((m) => ({ id: m.id, kind: m.kind as 'ring' | 'hole', glazeRecipeId: m.glazeRecipeId ?? null })),
    // the plan counts held, paid and handed-over orders; no-shows were made too
    ordered: [...plan.pieces.byMenuItem, ...[...noShows].map(([menuItemId, quantity]) => ({ menuItemId, quantity }))],
    extra: { rings: plan.pieces.rings.spare + plan.cuts.surplus.rings, holes: plan.pieces.holes.spare + plan.cuts.surplus.holes },
    spareGlazeId: settings.spare.glazeId ?? null,
  });
  return made;
}

/** Makes the day's surplus counters if any item of its menu has none yet. */
export async function ensureSurplus(bakeDayId: string, now: Date): Promise<void> {
  const day = await BakeDay.findByPk(bakeDayId, { attributes: ['id', 'status'] });
  if (!day || day.status === 'draft') throw notFound('Bake day');
  const have = await surplusRowCount(bakeDayId);
  if (have > 0) {
    if (have >= (await BakeDayMenuItem.count({ where: { bakeDayId } }))) return;
  }
  const [made, preOrdered] = await Promise.all([madeForDay(bakeDayId, now), paidPreOrders(bakeDayId)]);
  await insertSurplus(
    bakeDayId,
    [...made].map(([menuItemId, n]) => ({ menuItemId, made: n, left: Math.max(0, n - (preOrdered.get(menuItemId) ?? 0)) })),
  );
}

export async function readSurplus(bakeDayId: string): Promise<Surplus> {
  const rows = await surplusRows(bakeDayId);
  const items: SurplusItem[] = rows.map((r) => ({ menuItemId: r.menu_item_id, name: r.name, kind: r.kind, left: r.left_count, made: r.made, preOrdered: r.pre_ordered, sold: r.sold }));
  const sum = (kind: 'ring' | 'hole') => items.filter((i) => i.kind === kind).reduce((s, i) => s + i.left, 0);
  return { items, rings: sum('ring'), holes: sum('hole') };
}

export async function getSurplus(bakeDayId: string, now: Date): Promise<Surplus> {
  await ensureSurplus(bakeDayId, now);
  return readSurplus(bakeDayId);
}
