import { stringify } from 'csv-stringify/sync';
import type { WeeklyFigures, WeeklyReport } from '@fryline/schemas';

type Row = [section: string, name: string, measure: string, thisWeek: number | string, previousWeek: number | string];

const SUMMARY: Array<[keyof WeeklyFigures, string]> = [
  ['grossCents', 'gross_cents'],
  ['refundsCents', 'refunds_cents'],
  ['feesCents', 'fees_cents'],
  ['netCents', 'net_cents'],
  ['orders', 'orders'],
  ['pieces', 'pieces'],
  ['noShows', 'no_shows'],
  ['ingredientCents', 'ingredient_cents'],
  ['marginCents', 'margin_cents'],
];

/**
 * The week as CSV (RFC 4180: CRLF line ends, quotes where needed, a header
 * row), one figure per row with the week before beside it. Money in whole
 * cents, so a spreadsheet adds it up exactly; the currency they are cents of
 * (ISO 4217) is the row after the week's.
 */
export function weeklyCsv(report: WeeklyReport, currency: string): string {
  const prev = report.previous;
  const code = currency.toUpperCase();
  const rows: Row[] = [['week', 'start', 'date', report.week.start, prev.week.start], ['week', 'currency', 'code', code, code]];
  for (const [key, name] of SUMMARY) rows.push(['summary', name, name.endsWith('_cents') ? 'cents' : 'count', report[key] as number, prev[key] as number]);
  rows.push(['walk_ups', 'all', 'sales', report.walkUps.sales, prev.walkUps.sales]);
  rows.push(['walk_ups', 'all', 'cents', report.walkUps.cents, prev.walkUps.cents]);
  rows.push(['walk_ups', 'all', 'pieces', report.walkUps.pieces, prev.walkUps.pieces]);
  for (const method of ['cash', 'card'] as const) {
    const now = report.walkUps.byMethod.find((m) => m.method === method);
    const before = prev.walkUps.byMethod.find((m) => m.method === method);
    rows.push(['walk_ups', method, 'cents', now?.cents ?? 0, before?.cents ?? 0]);
  }
  const names = new Map([...report.byItem, ...prev.byItem].map((i) => [i.menuItemId, i.name]));
  for (const [id, name] of names) {
    const now = report.byItem.find((i) => i.menuItemId === id);
    const before = prev.byItem.find((i) => i.menuItemId === id);
    rows.push(['item', name, 'pieces', now?.pieces ?? 0, before?.pieces ?? 0]);
  }
  for (const day of report.sellThrough) {
    rows.push(['sell_through', `${day.date} ${day.place}`, 'sold', day.sold, '']);
    rows.push(['sell_through', `${day.date} ${day.place}`, 'capacity', day.capacity, '']);
  }
  return stringify(rows, { header: true, columns: ['section', 'name', 'measure', 'this_week', 'previous_week'], record_delimiter: 'windows' });
}
