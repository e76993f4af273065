import type { Transaction } from 'sequelize';
import { formatPieces } from '../../lib/pieces.js';
import { AppError } from '../../lib/app-error.js';
import { soldPieces } from '../../db/queries/bake-day-edit.js';
import { setDayCapacity } from '../../db/queries/capacity.js';

/**
 * Sets a bake day's capacity, never below what is already sold or held: in
 * that case nothing changes and the answer names both numbers.
 */
export async function setCapacityKeepingSold(bakeDayId: string, rings: number, holes: number, transaction?: Transaction): Promise<void> {
  if (await setDayCapacity(bakeDayId, rings, holes, transaction)) return;
  const sold = await soldPieces(bakeDayId, transaction);
  const short = [sold.rings > rings ? 'ringCapacity' : null, sold.holes > holes ? 'holeCapacity' : null].filter((f): f is string => f !== null);
  const message = `Already sold or on hold: ${formatPieces(sold.rings, sold.holes)}. Capacity can't go below that (you asked for ${formatPieces(rings, holes)}).`;
  throw new AppError('below_sold', message, 409, {
    sold,
    requested: { rings, holes },
    fields: Object.fromEntries(short.map((f) => [f, `At least ${f === 'ringCapacity' ? `${sold.rings} rings` : `${sold.holes} holes`}: that many are sold or on hold`])),
  });
}
