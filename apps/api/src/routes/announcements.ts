import express, { Router } from 'express';
import { api } from '@fryline/schemas';
import { route } from '../lib/route.js';
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

route(
  unsubscribeRouter,
  api.unsubscribeFromNews,
  [express.urlencoded({ extended: false, limit: '2kb' }), express.json({ limit: '2kb' })],
  async ({ query, now }) => {
    await unsubscribe(query.token, now);
    return { unsubscribed: true as const };
  },
  { noStore: true },
);

unsubscribeRouter.get('/api/announcements/unsubscribe', (req, res) => {
  const token = typeof req.query.token === 'string' ? req.query.token : '';
  res.redirect(303, `/news/unsubscribe?token=${encodeURIComponent(token)}`);
});

/** /api/announcements: asking for news of bake days, signed in or not, and confirming from the e-mail. */
export const announcementsRouter = Router();

route(announcementsRouter, api.subscribeToNews, [], async ({ req, body, now }) => {
  await subscribe(body.email, req.user ?? null, now);
  return { message: 'Check your inbox: we sent a link to confirm.' };
});

route(announcementsRouter, api.confirmNews, [], async ({ body, now }) => ({ confirmed: true as const, ...(await confirmSubscription(body.token, now)) }));
