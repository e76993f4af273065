import type { EndOfDay } from '@fryline/schemas';
import { statusTotals } from '../../db/queries/counter-orders.js';
import { walkUpTotals } from '../../db/queries/surplus.js';
import { getSurplus } from './surplus.js';

/** The day's close: handed over, no-shows, walk-ups by payment method (the cash to count), and what is left. */
export async function endOfDay(bakeDayId: string, now: Date): Promise<EndOfDay> {
  const leftOver = await getSurplus(bakeDayId, now);
  const [statuses, walkUps] = await Promise.all([statusTotals(bakeDayId), walkUpTotals(bakeDayId)]);
  const of = (...names: string[]) => {
    const rows = statuses.filter((s) => names.includes(s.status));
    return { orders: rows.reduce((n, r) => n + r.orders, 0), rings: rows.reduce((n, r) => n + r.rings, 0), holes: rows.reduce((n, r) => n + r.holes, 0) };
  };
  const method = (m: 'cash' | 'card') => {
    const row = walkUps.find((w) => w.method === m);
    return { sales: row?.sales ?? 0, amountCents: row?.amount_cents ?? 0 };
  };
  const [collected, waiting, noShows] = [of('collected'), of('paid'), of('no_show')];
  const pieces = (p: { rings: number; holes: number }) => ({ rings: p.rings, holes: p.holes });
  return {
    bakeDayId,
    orders: {
      paid: collected.orders + waiting.orders + noShows.orders,
      handedOver: collected.orders,
      toHandOver: waiting.orders,
      noShows: noShows.orders,
      refunded: of('refunded', 'cancelled').orders,
    },
    pieces: { handedOver: pieces(collected), noShows: pieces(noShows), toHandOver: pieces(waiting) },
    walkUps: {
      sales: walkUps.reduce((n, w) => n + w.sales, 0),
      rings: walkUps.reduce((n, w) => n + w.rings, 0),
      holes: walkUps.reduce((n, w) => n + w.holes, 0),
      totalCents: walkUps.reduce((n, w) => n + w.amount_cents, 0),
      byMethod: { cash: method('cash'), card: method('card') },
    },
    cashToCountCents: method('cash').amountCents,
    leftOver,
  };
}
