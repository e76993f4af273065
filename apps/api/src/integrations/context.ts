import type Stripe from 'stripe';
import type { Config } from '../config/env.js';
import { createPaymentsClient } from './payments.js';

// The process-wide configuration and payments client that services need.
// Set once by createApp (or a job runner), like the database connection.

interface Context {
  config: Config;
  payments: Stripe;
}

let current: Context | null = null;

export function setContext(config: Config): Context {
  current = { config, payments: createPaymentsClient(config) };
  return current;
}

export function context(): Context {
  if (!current) throw new Error('setContext() has not been called');
  return current;
}

// The one clock. A request reads it once (res.locals.now) and a job once per
// run; that `now` is passed down to the services and into SQL as a parameter,
// so moving this clock in a test moves time for the whole path.
let clock: () => Date = () => new Date();

export const now = (): Date => clock();

/** Tests only: make `now()` answer `at` (a fixed instant or a function); `setClock()` goes back to the real time. */
export function setClock(at?: Date | (() => Date)): void {
  clock = at === undefined ? () => new Date() : typeof at === 'function' ? at : () => new Date(at.getTime());
}
