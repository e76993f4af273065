import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole, requireUser } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { getBakeDay, listUpcoming } from '../services/bake-days/bake-days.js';
import { planForBakeDay, planResponseParts, pinFormula, setBakeDayCapacity } from '../services/production/production.js';
import { joinWaitlist } from '../services/waitlist/waitlist.js';
import { listPickups } from '../services/counter/pickups.js';
import { getSurplus } from '../services/counter/surplus.js';
import { sellWalkUp } from '../services/counter/walk-ups.js';
import { markRestNoShow } from '../services/counter/hand-over.js';
import { endOfDay } from '../services/counter/end-of-day.js';
import { idempotencyKey } from '../services/counter/idempotency.js';

/** /api/bake-days: the days customers see, their waiting lists, each day's production sheet and capacity, and the counter's bake day. */
export const bakeDaysRouter = Router();

route(bakeDaysRouter, api.listBakeDays, [], ({ now }) => listUpcoming(now));

route(bakeDaysRouter, api.getBakeDay, [], ({ params, now }) => getBakeDay(params.id, now));

route(bakeDaysRouter, api.joinWaitlist, [requireUser], ({ req, params, body, now }) => joinWaitlist(currentUser(req), params.id, body.rings, body.holes, now));

route(bakeDaysRouter, api.getPlan, [requireRole('baker')], ({ params, now }) => planForBakeDay(params.id, now), {
  noStore: true,
  // Written as it stands (no ETag, which would hash megabytes for an answer that is never stored).
  send: (res, result) => {
    const parts = planResponseParts(result);
    res.set('Content-Type', 'application/json; charset=utf-8');
    res.set('Content-Length', String(parts.reduce((n, b) => n + b.length, 0)));
    for (const part of parts.slice(0, -1)) res.write(part);
    res.end(parts.at(-1));
  },
});

route(bakeDaysRouter, api.pinFormula, [requireRole('baker')], async ({ req, params, body, now }) => {
  await pinFormula(currentUser(req).id, params.id, body.formulaVersionId);
  return planForBakeDay(params.id, now);
});

route(bakeDaysRouter, api.setCapacity, [requireRole('owner')], ({ req, params, body }) =>
  setBakeDayCapacity(currentUser(req).id, params.id, body.rings, body.holes, body.acceptAboveEquipment),
);

// the counter on bake day
const counter = [requireRole('counter')];

route(bakeDaysRouter, api.listPickups, counter, ({ params, now }) => listPickups(params.id, now), { noStore: true });

route(bakeDaysRouter, api.getSurplus, counter, ({ params, now }) => getSurplus(params.id, now), { noStore: true });

route(bakeDaysRouter, api.sellWalkUp, counter, ({ req, params, body, now }) => sellWalkUp(currentUser(req), params.id, body, idempotencyKey(req), now));

route(bakeDaysRouter, api.markRestNoShow, counter, ({ req, params, body, now }) => markRestNoShow(currentUser(req), params.id, body.windowId ?? null, idempotencyKey(req), now));

route(bakeDaysRouter, api.getEndOfDay, counter, ({ params, now }) => endOfDay(params.id, now), { noStore: true });
