import { Router } from 'express';
import { weekQuerySchema } from '@fryline/schemas';
import { requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { weeklyReport } from '../services/reports/weekly.js';
import { weeklyCsv } from '../services/reports/weekly-csv.js';

/** The owner's weekly sales, as JSON for the page and as CSV for a spreadsheet. */
export const reportsRouter = Router();
const start = (res: Parameters<typeof valid>[0]) => valid<{ start: string }>(res, 'query').start;

const owner = requireRole('owner');

reportsRouter.get('/api/reports/weekly', owner, validate('query', weekQuerySchema), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await weeklyReport(start(res), new Date()));
});

reportsRouter.get('/api/reports/weekly.csv', owner, validate('query', weekQuerySchema), async (_req, res) => {
  const report = await weeklyReport(start(res), new Date());
  res
    .set('Cache-Control', 'no-store')
    .type('text/csv; charset=utf-8; header=present')
    .attachment(`sales-week-${report.week.start}.csv`)
    .send(weeklyCsv(report));
});
