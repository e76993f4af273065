import { Router } from 'express';
import { api } from '@fryline/schemas';
import { requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { weeklyReport } from '../services/reports/weekly.js';
import { weeklyCsv } from '../services/reports/weekly-csv.js';
import { shopSettings } from '../services/shop/settings.js';

/** /api/reports: the owner's weekly sales, as JSON for the page and as CSV for a spreadsheet. */
export const reportsRouter = Router();
const owner = [requireRole('owner')];

route(reportsRouter, api.weeklySales, owner, ({ query, now }) => weeklyReport(query.start, now), { noStore: true });

route(reportsRouter, api.weeklySalesCsv, owner, async ({ query, now, res }) => {
  const report = await weeklyReport(query.start, now);
  res.attachment(`sales-week-${report.week.start}.csv`);
  return weeklyCsv(report, (await shopSettings()).currency);
}, {
  noStore: true,
  send: (res, csv) => res.type('text/csv; charset=utf-8; header=present').send(csv),
});
