import type { Router } from 'express';
import type { PaymentsStore } from '../state.js';
import { resourceRouter } from './common.js';

/** `/v1/payment_intents` (read only: intents come from checkout). */
export function paymentIntentsRouter(store: PaymentsStore): Router {
  return resourceRouter(store, { url: '/v1/payment_intents', objectName: 'payment_intent', collection: store.paymentIntents });
}

/** `/v1/charges` (read only). */
export function chargesRouter(store: PaymentsStore): Router {
  return resourceRouter(store, {
    url: '/v1/charges',
    objectName: 'charge',
    collection: store.charges,
    fields: ['payment_intent'],
  });
}

/** `/v1/balance_transactions`: what each charge brought in, fee and net. */
export function balanceTransactionsRouter(store: PaymentsStore): Router {
  return resourceRouter(store, {
    url: '/v1/balance_transactions',
    objectName: 'balance_transaction',
    collection: store.balanceTransactions,
    fields: ['source', 'type'],
  });
}
