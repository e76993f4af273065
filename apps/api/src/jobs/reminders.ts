import { QueryTypes } from 'sequelize';
import { database } from '../db/sequelize.js';
import { queueReminder } from '../services/mail/order-mails.js';

/** Queues the day-before reminder for paid orders whose pickup starts within 24 hours; once per order. */
export async function queueReminders(now: Date): Promise<number> {
  const due = await database().query<{ id: string }>(
    `SELECT o.id FROM orders o JOIN pickup_windows w ON w.id = o.pickup_window_id
      WHERE o.status = 'paid'
        AND w.starts_at > CAST(:now AS timestamptz) AND w.starts_at <= CAST(:now AS timestamptz) + interval '24 hours'
        AND NOT EXISTS (SELECT 1 FROM outbox m WHERE m.dedupe_key = 'reminder:' || o.id::text)
      LIMIT 200`,
    { replacements: { now }, type: QueryTypes.SELECT },
  );
  for (const row of due) {
    await database().transaction((transaction) => queueReminder(row.id, transaction));
  }
  return due.length;
}
