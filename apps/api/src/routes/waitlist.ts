import { Router } from 'express';
import { z } from 'zod';
import { joinWaitlistSchema } from '@fryline/schemas';
import { currentUser, requireUser } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { getOffer, joinWaitlist, leaveWaitlist, listMyWaitlist } from '../services/waitlist/waitlist.js';

export const waitlistRouter = Router();


waitlistRouter.post('/api/bake-days/:id/waitlist', requireUser, validate('params', z.object({ id: z.uuid() })), validate('body', joinWaitlistSchema), async (req, res) => {
  const body = valid<z.infer<typeof joinWaitlistSchema>>(res, 'body');
  res.status(201).json(await joinWaitlist(currentUser(req), valid<{ id: string }>(res, 'params').id, body.rings, body.holes));
});

waitlistRouter.get('/api/waitlist', requireUser, async (req, res) => {
  res.json(await listMyWaitlist(currentUser(req)));
});

waitlistRouter.delete('/api/waitlist/:id', requireUser, validate('params', z.object({ id: z.uuid() })), async (req, res) => {
  await leaveWaitlist(currentUser(req), valid<{ id: string }>(res, 'params').id);
  res.status(204).end();
});

waitlistRouter.get('/api/waitlist/claims/:token', requireUser, validate('params', z.object({ token: z.string().min(10).max(100) })), async (req, res) => {
  res.json(await getOffer(currentUser(req), valid<{ token: string }>(res, 'params').token));
});
