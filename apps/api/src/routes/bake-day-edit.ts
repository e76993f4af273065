import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { notFound } from '../lib/app-error.js';
import { bakeDayAction, editBakeDay, editView } from '../services/bake-day-edit/index.js';
import { callOffBakeDay } from '../services/call-off/index.js';
import { getJob } from '../jobs/job-store.js';

/** /api/staff/bake-days/:id (owner): change, open or close early, finish, call off; and /api/staff/jobs/:id to follow a call-off. */
export const bakeDayEditRouter = Router();
// the role on each route, not on a path prefix: other routers serve counter staff under /api/staff/bake-days/:id/…
const owner = [requireRole('owner')];

route(bakeDayEditRouter, api.getBakeDayForEdit, owner, ({ params, now }) => editView(params.id, now), { noStore: true });

route(bakeDayEditRouter, api.editBakeDay, owner, ({ req, params, body, now }) => editBakeDay(currentUser(req), params.id, body, now));

route(bakeDayEditRouter, api.openBakeDayNow, owner, ({ req, params, now }) => bakeDayAction(currentUser(req), params.id, 'open-now', now));
route(bakeDayEditRouter, api.closeBakeDayNow, owner, ({ req, params, now }) => bakeDayAction(currentUser(req), params.id, 'close-now', now));
route(bakeDayEditRouter, api.markBakeDayDone, owner, ({ req, params, now }) => bakeDayAction(currentUser(req), params.id, 'mark-done', now));

route(bakeDayEditRouter, api.callOffBakeDay, owner, async ({ req, res, params, body, now }) => {
  const job = await callOffBakeDay(currentUser(req), params.id, body.reason, now);
  res.location(`/api/staff/jobs/${job.id}`);
  return { jobId: job.id, ...job };
});

route(
  bakeDayEditRouter,
  api.getJob,
  owner,
  async ({ params }) => {
    const job = await getJob(params.id);
    if (!job) throw notFound('Job');
    return job;
  },
  { noStore: true },
);
