import type { Sequelize } from 'sequelize';
import type { Config } from '../config/env.js';
import { createMailTransport } from '../integrations/mailer.js';
import { relayOutbox } from './outbox-relay.js';
import { sweepHolds } from './hold-sweeper.js';
import { queueReminders } from './reminders.js';
import { every } from './scheduler.js';
import { reconcilePayments } from './payment-reconciler.js';
import { retryPendingRefunds } from '../services/refund-intents.js';
import { retryFlaggedRefunds } from '../services/payment-checks.js';

/** Background work of one API process; several processes may run side by side. */
export function startJobs(config: Config, sequelize: Sequelize): () => Promise<void> {
  const transport = createMailTransport(config);
  const stops = [
    every('outbox', 1_000, () => relayOutbox(sequelize, transport, config.MAIL_FROM)),
    every('holds', 5_000, () => sweepHolds(new Date())),
    every('reminders', 60_000, () => queueReminders(new Date())),
    // lost webhooks and refunds the payments service didn't confirm
    every('payments-reconcile', 60_000, () => reconcilePayments(new Date())),
    every('refund-retries', 30_000, async () => ({ refunds: await retryPendingRefunds(), flagged: await retryFlaggedRefunds() })),
    // rate-limit windows that ran out only cost space
    every('rate-limits', 300_000, () => sequelize.query(`DELETE FROM rate_limit_hits WHERE resets_at < now() - interval '1 minute'`)),
  ];
  return async () => {
    await Promise.all(stops.map((stop) => stop()));
    transport.close();
  };
}
