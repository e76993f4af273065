import { Router } from 'express';
import { z } from 'zod';
import { validate, valid } from '../middleware/validate.js';
import { getBakeDay, listPast, listUpcoming } from '../services/bake-days/bake-days.js';
import { requireRole } from '../middleware/auth.js';

export const bakeDaysRouter = Router();
const idParams = z.object({ id: z.uuid('Unknown bake day') });

bakeDaysRouter.get('/api/bake-days', async (_req, res) => {
  res.json(await listUpcoming(new Date()));
});

bakeDaysRouter.get('/api/bake-days/:id', validate('params', idParams), async (_req, res) => {
  res.json(await getBakeDay(valid<z.infer<typeof idParams>>(res, 'params').id, new Date()));
});

bakeDaysRouter.get('/api/staff/bake-days/past', requireRole('counter'), async (_req, res) => {
  res.json(await listPast(new Date()));
});
