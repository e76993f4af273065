import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { listDrafts, listPast } from '../services/bake-days/bake-days.js';
import { createBakeDay, publishBakeDay } from '../services/bake-days/setup.js';
import { listBakeDayOrders } from '../services/orders/staff-orders.js';

/** /api/staff/bake-days: the owner's drafts and announcements, the counter's past days, a day's order list. */
export const staffBakeDaysRouter = Router();

route(staffBakeDaysRouter, api.listPastBakeDays, [requireRole('counter')], ({ now }) => listPast(now));

route(staffBakeDaysRouter, api.listDraftBakeDays, [requireRole('owner')], ({ now }) => listDrafts(now));

route(staffBakeDaysRouter, api.createBakeDay, [requireRole('owner')], ({ req, body, now }) => createBakeDay(currentUser(req), body, now));

route(staffBakeDaysRouter, api.publishBakeDay, [requireRole('owner')], ({ req, params, now }) => publishBakeDay(currentUser(req), params.id, now));

route(staffBakeDaysRouter, api.listBakeDayOrders, [requireRole('counter')], ({ params }) => listBakeDayOrders(params.id), { noStore: true });
