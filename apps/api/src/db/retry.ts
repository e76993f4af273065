import type { Transaction } from 'sequelize';
import { database } from './sequelize.js';

// PostgreSQL ends one of two transactions that wait on each other (deadlock,
// 40P01) or that can't be serialised (40001); the statement is fine and a
// second try normally succeeds. Sequelize's own `retry` option repeats single
// queries, which can't help inside a transaction the server has aborted, so
// the whole transaction is run again here.

const CONFLICT_CODES = new Set(['40P01', '40001']);

export function isTransactionConflict(err: unknown): boolean {
  const e = err as { parent?: { code?: string }; original?: { code?: string }; code?: string } | null;
  const code = e?.parent?.code ?? e?.original?.code ?? e?.code;
  return typeof code === 'string' && CONFLICT_CODES.has(code);
}

/**
 * Runs `work` in a transaction, again (up to `tries` times in all, after a
 * short random pause) when PostgreSQL ends it as a deadlock or serialisation
 * conflict. `work` must keep its side effects inside the transaction (or
 * reset them at its start), since a failed try is rolled back.
 */
export async function transactionWithRetry<T>(work: (transaction: Transaction) => Promise<T>, tries = 3): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await database().transaction(work);
    } catch (err) {
      if (attempt >= tries || !isTransactionConflict(err)) throw err;
      await new Promise((resolve) => setTimeout(resolve, 20 + Math.random() * 80 * attempt));
    }
  }
}
