import { Router } from 'express';
import { z } from 'zod';
import { callOffSchema, editBakeDaySchema, type CallOffInput, type EditBakeDayInput } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { bakeDayAction, editBakeDay, editView } from '../services/bake-day-edit/index.js';
import { callOffBakeDay } from '../services/call-off/index.js';
import { getJob } from '../jobs/job-store.js';
import { notFound } from '../lib/app-error.js';

/** The owner changes, calls off, opens, closes or finishes an announced bake day; and follows long jobs. */
export const bakeDayEditRouter = Router();
const idParams = validate('params', z.object({ id: z.uuid('Unknown bake day') }));
const id = (res: Parameters<typeof valid>[0]) => valid<{ id: string }>(res, 'params').id;

// requireRole on each route, not on a path prefix: other routers serve counter staff under /api/staff/bake-days/:id/…
const owner = requireRole('owner');

bakeDayEditRouter.get('/api/staff/bake-days/:id', owner, idParams, async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await editView(id(res), new Date()));
});

bakeDayEditRouter.patch('/api/staff/bake-days/:id', owner, idParams, validate('body', editBakeDaySchema), async (req, res) => {
  res.json(await editBakeDay(currentUser(req), id(res), valid<EditBakeDayInput>(res, 'body'), new Date()));
});

for (const action of ['open-now', 'close-now', 'mark-done'] as const) {
  bakeDayEditRouter.post(`/api/staff/bake-days/:id/${action}`, owner, idParams, async (req, res) => {
    res.json(await bakeDayAction(currentUser(req), id(res), action, new Date()));
  });
}

bakeDayEditRouter.post('/api/staff/bake-days/:id/call-off', owner, idParams, validate('body', callOffSchema), async (req, res) => {
  const job = await callOffBakeDay(currentUser(req), id(res), valid<CallOffInput>(res, 'body').reason, new Date());
  res.status(202).location(`/api/staff/jobs/${job.id}`).json({ jobId: job.id, ...job });
});

bakeDayEditRouter.get('/api/staff/jobs/:id', owner, validate('params', z.object({ id: z.uuid('Unknown job') })), async (_req, res) => {
  const job = await getJob(id(res));
  if (!job) throw notFound('Job');
  res.set('Cache-Control', 'no-store').json(job);
});
