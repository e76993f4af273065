import express, { Router } from 'express';
import { z } from 'zod';
import { subscribeSchema, tokenSchema } from '@fryline/schemas';
import { validate, valid } from '../middleware/validate.js';
import { confirmSubscription, subscribe, unsubscribe } from '../services/announcements/index.js';

/**
 * The one-click unsubscribe address (RFC 8058). Mail programs POST
 * `List-Unsubscribe=One-Click` to it with no cookies, so it is mounted before
 * the session and CSRF checks: the secret token in the address is the
 * authority. A GET (someone opening the link) leads to the shop's page,
 * whose button posts here; a GET never unsubscribes by itself, since link
 * scanners open links.
 */
export const unsubscribeRouter = Router();
const tokenQuery = z.object({ token: z.string().min(20).max(100) });

unsubscribeRouter.post(
  '/api/announcements/unsubscribe',
  express.urlencoded({ extended: false, limit: '2kb' }),
  express.json({ limit: '2kb' }),
  validate('query', tokenQuery),
  async (_req, res) => {
    await unsubscribe(valid<{ token: string }>(res, 'query').token, new Date());
    res.set('Cache-Control', 'no-store').json({ unsubscribed: true });
  },
);

unsubscribeRouter.get('/api/announcements/unsubscribe', validate('query', tokenQuery), (_req, res) => {
  res.redirect(303, `/news/unsubscribe?token=${encodeURIComponent(valid<{ token: string }>(res, 'query').token)}`);
});

/** Asking for news of bake days, signed in or not, and confirming from the e-mail. */
export const announcementsRouter = Router();

announcementsRouter.post('/api/announcements/subscribe', validate('body', subscribeSchema), async (req, res) => {
  await subscribe(valid<{ email: string }>(res, 'body').email, req.user ?? null, new Date());
  res.status(202).json({ message: 'Check your inbox: we sent a link to confirm.' });
});

announcementsRouter.post('/api/announcements/confirm', validate('body', tokenSchema), async (_req, res) => {
  res.json({ confirmed: true, ...(await confirmSubscription(valid<{ token: string }>(res, 'body').token, new Date())) });
});
