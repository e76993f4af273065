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
