import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

/**
 * Records a payment event's id inside the transaction that applies it; false
 * when the id is already there (a duplicate delivery, in a row or at once).
 */
export async function recordEvent(id: string, type: string, transaction: Transaction): Promise<boolean> {
  const inserted = await database().query(
    `INSERT INTO payment_events (id, type) VALUES (:id, :type) ON CONFLICT (id) DO NOTHING RETURNING id`,
    { replacements: { id, type }, type: QueryTypes.SELECT, transaction },
  );
  return inserted.length === 1;
}

/** What applying the event did, for the record. */
export async function recordOutcome(id: string, orderId: string | null, outcome: string, transaction: Transaction): Promise<void> {
  await database().query(`UPDATE payment_events SET order_id = :orderId, outcome = :outcome WHERE id = :id`, {
    replacements: { id, orderId, outcome },
    transaction,
  });
}
