import { Router, type Request } from 'express';
import { z } from 'zod';
import { counterActionSchema, counterSettingsSchema, markRestNoShowSchema, walkUpSaleSchema, type CounterSettings, type WalkUpSaleInput } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { listPickups, findByCode } from '../services/counter/pickups.js';
import { changeOrder, markRestNoShow, type CounterAction } from '../services/counter/hand-over.js';
import { getSurplus } from '../services/counter/surplus.js';
import { sellWalkUp } from '../services/counter/walk-ups.js';
import { endOfDay } from '../services/counter/end-of-day.js';
import { checkKey } from '../services/counter/idempotency.js';
import { counterSettings, saveCounterSettings } from '../services/counter/settings.js';

// The counter on bake day (counter role and up): pickup list, hand-over with
// undo, no-shows, walk-up sales of the surplus, end of day. Changes take an
// optional Idempotency-Key; a repeat answers what the first one answered.

export const counterRouter = Router();
const dayParams = z.object({ id: z.uuid('Unknown bake day') });
const orderParams = z.object({ id: z.uuid('Unknown order') });
const id = (res: Parameters<typeof valid>[0]) => valid<{ id: string }>(res, 'params').id;
const key = (req: Request) => checkKey(req.get('idempotency-key'));
const noStore = { 'Cache-Control': 'no-store' };

counterRouter.use(['/api/bake-days/:id/pickups', '/api/bake-days/:id/surplus', '/api/bake-days/:id/walk-ups', '/api/bake-days/:id/no-shows', '/api/bake-days/:id/end-of-day', '/api/orders/by-code'], requireRole('counter'));

counterRouter.get('/api/bake-days/:id/pickups', validate('params', dayParams), async (_req, res) => {
  res.set(noStore).json(await listPickups(id(res), new Date()));
});

counterRouter.get('/api/bake-days/:id/surplus', validate('params', dayParams), async (_req, res) => {
  res.set(noStore).json(await getSurplus(id(res), new Date()));
});

counterRouter.post('/api/bake-days/:id/walk-ups', validate('params', dayParams), validate('body', walkUpSaleSchema), async (req, res) => {
  res.status(201).json(await sellWalkUp(currentUser(req), id(res), valid<WalkUpSaleInput>(res, 'body'), key(req), new Date()));
});

counterRouter.post('/api/bake-days/:id/no-shows', validate('params', dayParams), validate('body', markRestNoShowSchema), async (req, res) => {
  res.json(await markRestNoShow(currentUser(req), id(res), valid<{ windowId?: string }>(res, 'body').windowId ?? null, key(req), new Date()));
});

counterRouter.get('/api/bake-days/:id/end-of-day', validate('params', dayParams), async (_req, res) => {
  res.set(noStore).json(await endOfDay(id(res), new Date()));
});

counterRouter.get('/api/orders/by-code/:code', validate('params', z.object({ code: z.string().trim().min(1).max(40) })), async (_req, res) => {
  res.set(noStore).json(await findByCode(valid<{ code: string }>(res, 'params').code, new Date()));
});

for (const action of ['collect', 'uncollect', 'no-show', 'reverse-no-show'] satisfies CounterAction[]) {
  counterRouter.post(`/api/orders/:id/${action}`, requireRole('counter'), validate('params', orderParams), validate('body', counterActionSchema), async (req, res) => {
    const user = currentUser(req);
    res.json(await changeOrder(action, { user, now: new Date(), orderId: id(res), bakeDayId: valid<{ bakeDayId?: string }>(res, 'body').bakeDayId ?? null, key: key(req) }));
  });
}

counterRouter.get('/api/counter/settings', requireRole('counter'), async (_req, res) => {
  res.json(await counterSettings());
});

counterRouter.put('/api/counter/settings', requireRole('owner'), validate('body', counterSettingsSchema), async (req, res) => {
  res.json(await saveCounterSettings(currentUser(req).id, valid<CounterSettings>(res, 'body')));
});
