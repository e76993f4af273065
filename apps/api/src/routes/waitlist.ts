import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireUser } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { getOffer, leaveWaitlist, listMyWaitlist } from '../services/waitlist/waitlist.js';

/** /api/waitlist: a customer's places in the waiting lists, and the offers made to them (joining is on /api/bake-days/:id/waitlist). */
export const waitlistRouter = Router();

route(waitlistRouter, api.listWaitlist, [requireUser], ({ req }) => listMyWaitlist(currentUser(req)));

route(waitlistRouter, api.leaveWaitlist, [requireUser], async ({ req, params, now }) => {
  await leaveWaitlist(currentUser(req), params.id, now);
});

route(waitlistRouter, api.getOffer, [requireUser], ({ req, params, now }) => getOffer(currentUser(req), params.token, now));
