import type { Router } from 'express';
import { createSession, expireSession } from '../checkout.js';
import { expandList } from '../expand.js';
import { LIST_PARAMS, paginate } from '../lists.js';
import { readExpand, rejectUnknown } from '../params.js';
import type { PaymentsStore } from '../state.js';
import { bodyOf, eventRequestOf, found, queryOf, resourceRouter, sendObject } from './common.js';

/** `/v1/checkout/sessions` */
export function sessionsRouter(store: PaymentsStore, publicUrl: () => string): Router {
  const router = resourceRouter(store, {
    url: '/v1/checkout/sessions',
    objectName: 'checkout.session',
    collection: store.sessions,
    fields: ['payment_intent', 'status'],
  });

  router.post('/', (req, res) => {
    const params = bodyOf(req);
    sendObject(store, res, createSession(store, params, publicUrl()), params);
  });

  router.post('/:id/expire', (req, res) => {
    const params = bodyOf(req);
    rejectUnknown(params, ['expand']);
    const session = found(store.sessions, req.params.id, 'checkout.session');
    sendObject(store, res, expireSession(store, session, eventRequestOf(req, res)), params);
  });

  router.get('/:id/line_items', (req, res) => {
    const params = queryOf(req);
    rejectUnknown(params, LIST_PARAMS);
    const session = found(store.sessions, req.params.id, 'checkout.session');
    const url = `/v1/checkout/sessions/${session.id}/line_items`;
    res.json(expandList(store, paginate(store.internalsOf(session).lineItems, params, url, 'item'), readExpand(params)));
  });

  return router;
}
