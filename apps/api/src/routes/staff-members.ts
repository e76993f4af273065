import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { addStaff, changeRole, listStaff } from '../services/users/staff-members.js';

/** /api/staff/members: who may sign in as staff, and with which role. */
export const staffMembersRouter = Router();

route(staffMembersRouter, api.listStaff, [requireRole('owner')], () => listStaff());

route(staffMembersRouter, api.addStaff, [requireRole('owner')], ({ req, body }) => addStaff(currentUser(req), body));

// made a customer: no longer staff, so nothing to show (204)
route(staffMembersRouter, api.changeRole, [requireRole('owner')], async ({ req, params, body }) => (await changeRole(currentUser(req), params.id, body.role)) ?? undefined);
