import type { Router } from 'express';
import { createRefund } from '../refunds.js';
import type { PaymentsStore } from '../state.js';
import { bodyOf, eventRequestOf, resourceRouter, sendObject } from './common.js';

/** `/v1/refunds` */
export function refundsRouter(store: PaymentsStore): Router {
  const router = resourceRouter(store, {
    url: '/v1/refunds',
    objectName: 'refund',
    collection: store.refunds,
    fields: ['charge', 'payment_intent'],
  });
  router.post('/', (req, res) => {
    const params = bodyOf(req);
    sendObject(store, res, createRefund(store, params, eventRequestOf(req, res)), params);
  });
  return router;
}
