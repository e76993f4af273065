import { costOfPiecesSold, mondayOf, previousMonday, ProductionInputError, weekRange } from '@fryline/production';
import type { WeeklyFigures, WeeklyReport } from '@fryline/schemas';
import {
  businessTimeZone, noShows, piecesByItem, preorderMoney, refundsMade, sellThrough, walkUpSales, type ItemRow, type Range,
} from '../../db/queries/weekly-report.js';
import { AppError } from '../../lib/app-error.js';
import { planForBakeDay } from '../production/production.js';

const sumBy = <T>(rows: T[], key: (r: T) => string, value: (r: T) => number) => {
  const totals = new Map<string, number>();
  for (const r of rows) totals.set(key(r), (totals.get(key(r)) ?? 0) + value(r));
  return [...totals].map(([k, v]) => ({ k, v })).sort((a, b) => b.v - a.v || a.k.localeCompare(b.k));
};

/** Ingredient cost of what each bake day sold, at that day's per-piece costs from its production sheet. */
async function ingredientCost(items: ItemRow[], now: Date): Promise<{ cents: number; notes: string[] }> {
  const notes: string[] = [];
  let cents = 0;
  for (const dayId of new Set(items.map((i) => i.bake_day_id))) {
    try {
      const { plan } = await planForBakeDay(dayId, now);
      cents += costOfPiecesSold(
        plan.cost.perPiece,
        items.filter((i) => i.bake_day_id === dayId).map((i) => ({ kind: i.kind, glazeId: i.glaze_recipe_id, quantity: i.preorder_pieces + i.walk_up_pieces })),
      );
      if (plan.cost.missingPrices.length) notes.push(`No price for ${plan.cost.missingPrices.join(', ')}: counted as free.`);
    } catch (err) {
      if (!(err instanceof AppError) && !(err instanceof ProductionInputError)) throw err;
      notes.push(`The cost of one bake day could not be worked out (${err.message}).`);
    }
  }
  return { cents, notes: [...new Set(notes)] };
}

export async function weeklyFigures(monday: string, timeZone: string, now: Date): Promise<WeeklyFigures & { notes: string[] }> {
  let week;
  try {
    week = weekRange(monday, timeZone);
  } catch (err) {
    if (err instanceof ProductionInputError) throw new AppError('invalid', `start: ${err.message}`, 400, { fields: { start: err.message } });
    throw err;
  }
  const range: Range = { from: new Date(week.from), to: new Date(week.to), startDate: week.start, endDate: week.end };
  const [pre, refunds, items, walks, missed, days] = await Promise.all([
    preorderMoney(range),
    refundsMade(range),
    piecesByItem(range),
    walkUpSales(range),
    noShows(range),
    sellThrough(range),
  ]);
  const walkUps = {
    sales: walks.reduce((n, w) => n + w.sales, 0),
    cents: walks.reduce((n, w) => n + w.cents, 0),
    pieces: walks.reduce((n, w) => n + w.pieces, 0),
    byMethod: walks.map((w) => ({ method: w.method, sales: w.sales, cents: w.cents })),
  };
  const byItem = sumBy(items, (i) => i.menu_item_id, () => 0).map(({ k }) => {
    const rows = items.filter((i) => i.menu_item_id === k);
    const first = rows[0]!;
    const preorderPieces = rows.reduce((n, r) => n + r.preorder_pieces, 0);
    const walkUpPieces = rows.reduce((n, r) => n + r.walk_up_pieces, 0);
    return {
      menuItemId: k, name: first.name, kind: first.kind, flavour: first.flavour, glaze: first.glaze,
      orders: rows.reduce((n, r) => n + r.orders, 0), preorderPieces, walkUpPieces, pieces: preorderPieces + walkUpPieces,
    };
  }).sort((a, b) => b.pieces - a.pieces || a.name.localeCompare(b.name));
  const grossCents = pre.gross + walkUps.cents;
  const netCents = grossCents - refunds - pre.fees;
  const cost = await ingredientCost(items, now);
  const piecesSold = pre.pieces + walkUps.pieces;
  return {
    week: { start: week.start, end: week.end, timeZone, from: range.from.toISOString(), to: range.to.toISOString() },
    grossCents,
    refundsCents: refunds,
    feesCents: pre.fees,
    netCents,
    orders: pre.orders,
    pieces: pre.pieces,
    preorderCents: pre.gross,
    byItem,
    byFlavour: sumBy(byItem, (i) => i.flavour, (i) => i.pieces).map(({ k, v }) => ({ flavour: k, pieces: v })),
    byGlaze: sumBy(byItem, (i) => i.glaze, (i) => i.pieces).map(({ k, v }) => ({ glaze: k, pieces: v })),
    noShows: missed.count,
    noShowPieces: missed.pieces,
    walkUps,
    sellThrough: days.map((d) => {
      const sold = d.preorder_pieces + d.walk_up_pieces;
      return {
        bakeDayId: d.id, date: d.date, place: d.place, capacity: d.capacity, preorderPieces: d.preorder_pieces, walkUpPieces: d.walk_up_pieces, sold,
        percent: d.capacity > 0 ? Math.round((sold / d.capacity) * 1000) / 10 : null,
        calledOff: d.status === 'cancelled',
      };
    }),
    ingredientCents: cost.cents,
    marginCents: netCents - cost.cents,
    costPerPieceCents: piecesSold > 0 ? Math.round(cost.cents / piecesSold) : null,
    notes: cost.notes,
  };
}

/** The week (Monday to Sunday, in the business's time zone) that `start` falls in, with the week before beside it. */
export async function weeklyReport(start: string, now: Date): Promise<WeeklyReport> {
  const timeZone = await businessTimeZone();
  let monday: string;
  try {
    monday = mondayOf(start);
  } catch (err) {
    if (err instanceof ProductionInputError) throw new AppError('invalid', `start: ${err.message}`, 400, { fields: { start: err.message } });
    throw err;
  }
  const current = await weeklyFigures(monday, timeZone, now);
  const { notes: _previousNotes, ...previous } = await weeklyFigures(previousMonday(monday), timeZone, now);
  return { ...current, previous };
}
