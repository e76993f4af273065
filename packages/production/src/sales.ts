/**
 * Weekly sales maths: which instants a week covers in the business's time
 * zone, and what the pieces sold cost to make, from the production costing.
 */
import { DateTime } from 'luxon';
import type { PieceCost } from './cost.js';
import { ProductionInputError } from './errors.js';
import { requireTimeZone } from './time.js';

export interface WeekRange {
  /** Monday, YYYY-MM-DD. */
  start: string;
  /** Sunday, YYYY-MM-DD. */
  end: string;
  /** Monday 00:00 local, inclusive (ISO with the local offset). */
  from: string;
  /** The next Monday 00:00 local, exclusive: a week with a daylight-saving change lasts 167 or 169 hours. */
  to: string;
}

/**
 * The week from Monday 00:00 to the next Monday 00:00, both in `timeZone`.
 * The end is worked out on the calendar (plus one week of local dates), not
 * as 7 × 24 hours, so an instant near a daylight-saving change falls in
 * exactly one week.
 */
export function weekRange(monday: string, timeZone: string): WeekRange {
  requireTimeZone('timeZone', timeZone);
  const start = DateTime.fromISO(monday, { zone: timeZone }).startOf('day');
  if (!start.isValid || !/^\d{4}-\d{2}-\d{2}$/.test(monday)) throw new ProductionInputError('start', `is not a date (got ${monday})`);
  if (start.weekday !== 1) throw new ProductionInputError('start', `must be a Monday (${monday} is a ${start.toFormat('cccc')})`);
  const next = start.plus({ weeks: 1 });
  return { start: start.toISODate()!, end: next.minus({ days: 1 }).toISODate()!, from: start.toISO()!, to: next.toISO()! };
}

/** The Monday of the week a date falls in (ISO 8601 weeks start on Monday). */
export function mondayOf(date: string): string {
  const day = DateTime.fromISO(date, { zone: 'UTC' });
  if (!day.isValid || !/^\d{4}-\d{2}-\d{2}$/.test(date)) throw new ProductionInputError('start', `is not a date (got ${date})`);
  return day.minus({ days: day.weekday - 1 }).toISODate()!;
}

/** The Monday of the week before. */
export function previousMonday(monday: string): string {
  return DateTime.fromISO(monday, { zone: 'UTC' }).minus({ weeks: 1 }).toISODate()!;
}

export interface PiecesSold {
  kind: 'ring' | 'hole';
  /** The glaze recipe on the piece, null for plain (or a recipe the costing doesn't know). */
  glazeId: string | null;
  quantity: number;
}

/**
 * What the pieces sold cost in ingredients, frying fat and glaze: each
 * piece at its rounded per-piece cost from `costBake` (so the figure matches
 * the production sheet's cost per doughnut), summed in whole cents.
 */
export function costOfPiecesSold(perPiece: PieceCost[], sold: PiecesSold[]): number {
  const byGlaze = new Map(perPiece.map((p) => [p.glazeId, p]));
  const plain = byGlaze.get(null);
  return sold.reduce((sum, line) => {
    const cost = byGlaze.get(line.glazeId) ?? plain;
    if (!cost) throw new ProductionInputError('perPiece', 'has no plain piece cost');
    return sum + line.quantity * (line.kind === 'ring' ? cost.ringCents : cost.holeCents);
  }, 0);
}
