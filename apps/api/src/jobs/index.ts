import type { Sequelize } from 'sequelize';
import type { Config } from '../config/env.js';
import { createMailTransport } from '../integrations/mailer.js';
import { relayOutbox } from './outbox-relay.js';
import { sweepHolds } from './hold-sweeper.js';
import { queueReminders } from './reminders.js';
import { every } from './scheduler.js';
import { now } from '../integrations/context.js';
import { runJobs } from './job-runner.js';
import { queueAnnouncements } from '../services/announcements/index.js';

/** Background work of one API process; several processes may run side by side. */
export function startJobs(config: Config, sequelize: Sequelize): () => Promise<void> {
  const transport = createMailTransport(config);
  const stops = [
    every('outbox', 1_000, () => relayOutbox(sequelize, transport, config.MAIL_FROM)),
    every('holds', 5_000, () => sweepHolds(now())),
    every('reminders', 60_000, () => queueReminders(now())),
    // call-offs and other long work; a job left by a stopped process is picked up when its lease runs out
    every('jobs', 2_000, () => runJobs({ now })),
    every('announcements', 30_000, () => queueAnnouncements(now())),
  ];
  return async () => {
    await Promise.all(stops.map((stop) => stop()));
    transport.close();
  };
}
