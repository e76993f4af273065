import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { resendInvitation } from '../services/staff/invitations.js';

export const staffInvitationsRouter = Router();

staffInvitationsRouter.post('/api/staff/members/:id/invitation', requireRole('owner'), validate('params', z.object({ id: z.uuid('Unknown person') })), async (req, res) => {
  await resendInvitation(currentUser(req), valid<{ id: string }>(res, 'params').id);
  res.status(202).json({ queued: true });
});
