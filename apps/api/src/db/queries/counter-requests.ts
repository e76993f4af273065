import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// The first answer to each Idempotency-Key the counter sends, so a retried
// hand-over, undo, no-show or walk-up answers what it answered the first time.

export interface StoredAnswer {
  action: string;
  user_id: string | null;
  status_code: number;
  body: unknown;
}

export async function findAnswer(key: string, transaction?: Transaction): Promise<StoredAnswer | null> {
  const rows = await database().query<StoredAnswer>(
    'SELECT action, user_id, status_code, body FROM counter_requests WHERE idempotency_key = :key',
    { replacements: { key }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0] ?? null;
}

/** Stores an answer unless the key already has one; true when this call stored it. */
export async function storeAnswer(
  answer: { key: string; userId: string; action: string; statusCode: number; body: unknown },
  transaction?: Transaction,
): Promise<boolean> {
  const rows = await database().query(
    `INSERT INTO counter_requests (idempotency_key, user_id, action, status_code, body)
     VALUES (:key, :userId, :action, :statusCode, CAST(:body AS jsonb))
     ON CONFLICT (idempotency_key) DO NOTHING RETURNING idempotency_key`,
    { replacements: { ...answer, body: JSON.stringify(answer.body) }, type: QueryTypes.SELECT, transaction },
  );
  return rows.length === 1;
}

export async function completeAnswer(key: string, statusCode: number, body: unknown, transaction: Transaction): Promise<void> {
  await database().query('UPDATE counter_requests SET status_code = :statusCode, body = CAST(:body AS jsonb) WHERE idempotency_key = :key', {
    replacements: { key, statusCode, body: JSON.stringify(body) },
    transaction,
  });
}
