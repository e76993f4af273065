import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole, requireUser } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { getBakeDay, listUpcoming } from '../services/bake-days/bake-days.js';
import { planForBakeDay, pinFormula, setBakeDayCapacity } from '../services/production/production.js';
import { joinWaitlist } from '../services/waitlist/waitlist.js';

/** /api/bake-days: the days customers see, their waiting lists, and each day's production sheet and capacity. */
export const bakeDaysRouter = Router();

route(bakeDaysRouter, api.listBakeDays, [], ({ now }) => listUpcoming(now));

route(bakeDaysRouter, api.getBakeDay, [], ({ params, now }) => getBakeDay(params.id, now));

route(bakeDaysRouter, api.joinWaitlist, [requireUser], ({ req, params, body, now }) => joinWaitlist(currentUser(req), params.id, body.rings, body.holes, now));

route(bakeDaysRouter, api.getPlan, [requireRole('baker')], ({ params, now }) => planForBakeDay(params.id, now), { noStore: true });

route(bakeDaysRouter, api.pinFormula, [requireRole('baker')], async ({ req, params, body, now }) => {
  await pinFormula(currentUser(req).id, params.id, body.formulaVersionId);
  return planForBakeDay(params.id, now);
});

route(bakeDaysRouter, api.setCapacity, [requireRole('owner')], ({ req, params, body }) =>
  setBakeDayCapacity(currentUser(req).id, params.id, body.rings, body.holes, body.acceptAboveEquipment),
);
