import { Router } from 'express';
import { z } from 'zod';
import { changeRoleSchema, createBakeDaySchema, staffMemberInputSchema } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { addStaff, changeRole, createBakeDay, listStaff, publishBakeDay } from '../services/bake-days/setup.js';
import { listDrafts } from '../services/bake-days/bake-days.js';

export const setupRouter = Router();

setupRouter.post('/api/staff/bake-days', requireRole('owner'), validate('body', createBakeDaySchema), async (req, res) => {
  res.status(201).json(await createBakeDay(currentUser(req), valid(res, 'body'), new Date()));
});

setupRouter.get('/api/staff/bake-days/drafts', requireRole('owner'), async (_req, res) => {
  res.json(await listDrafts(new Date()));
});

setupRouter.post('/api/staff/bake-days/:id/publish', requireRole('owner'), validate('params', z.object({ id: z.uuid() })), async (req, res) => {
  res.json(await publishBakeDay(currentUser(req), valid<{ id: string }>(res, 'params').id, new Date()));
});

setupRouter.get('/api/staff/members', requireRole('owner'), async (_req, res) => {
  res.json(await listStaff());
});

setupRouter.post('/api/staff/members', requireRole('owner'), validate('body', staffMemberInputSchema), async (req, res) => {
  res.status(201).json(await addStaff(currentUser(req), valid(res, 'body')));
});

setupRouter.patch('/api/staff/members/:id', requireRole('owner'), validate('params', z.object({ id: z.uuid() })), validate('body', changeRoleSchema), async (req, res) => {
  const member = await changeRole(currentUser(req), valid<{ id: string }>(res, 'params').id, valid<z.infer<typeof changeRoleSchema>>(res, 'body').role);
  if (member) res.json(member);
  else res.status(204).end();
});
