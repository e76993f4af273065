import type { Transaction } from 'sequelize';
import { database } from '../../db/sequelize.js';
import { completeAnswer, findAnswer, storeAnswer, type StoredAnswer } from '../../db/queries/counter-requests.js';
import { AppError } from '../../lib/app-error.js';

export interface Answer<T = unknown> {
  status: number;
  body: T;
}

class AlreadyAnswered extends Error {}

/** 4xx answers that say something about the request itself are kept and replayed; sign-in and permission ones are not. */
const replayable = (err: unknown): err is AppError => err instanceof AppError && err.status >= 400 && err.status < 500 && err.status !== 401 && err.status !== 403;

function replay(stored: StoredAnswer, action: string, userId: string): Answer {
  if (stored.action !== action || (stored.user_id !== null && stored.user_id !== userId)) {
    throw new AppError('idempotency_mismatch', 'This Idempotency-Key was already used for a different request', 422);
  }
  return { status: stored.status_code, body: stored.body };
}

export function checkKey(key: string | undefined): string | null {
  if (key === undefined || key === '') return null;
  if (key.length < 8 || key.length > 100 || !/^[\w.:-]+$/.test(key)) {
    throw new AppError('invalid', 'Idempotency-Key must be 8–100 letters, digits, dots, colons, dashes or underscores', 400);
  }
  return key;
}

/**
 * Runs one counter change in a transaction. With an Idempotency-Key, the key
 * is claimed in that same transaction before the work, so a duplicate sent at
 * the same moment waits and then answers the first result; the answer (or a
 * refusal such as already_collected) is kept for every later repeat.
 */
export async function once<T>(
  request: { key: string | null; userId: string; action: string },
  work: (transaction: Transaction) => Promise<Answer<T>>,
): Promise<Answer> {
  const { key, userId, action } = request;
  if (key === null) return database().transaction(work);
  const prior = await findAnswer(key);
  if (prior) return replay(prior, action, userId);
  try {
    return await database().transaction(async (transaction) => {
      if (!(await storeAnswer({ key, userId, action, statusCode: 0, body: null }, transaction))) throw new AlreadyAnswered();
      const answer = await work(transaction);
      await completeAnswer(key, answer.status, answer.body, transaction);
      return answer;
    });
  } catch (err) {
    if (err instanceof AlreadyAnswered) return replay((await findAnswer(key))!, action, userId);
    if (replayable(err)) {
      const body = { error: { code: err.code, message: err.message, details: err.details } };
      if (await storeAnswer({ key, userId, action, statusCode: err.status, body })) throw err;
      return replay((await findAnswer(key))!, action, userId);
    }
    throw err;
  }
}
