import type { Request } from 'express';
import type { Transaction } from 'sequelize';
import { database } from '../../db/sequelize.js';
import { completeAnswer, findAnswer, storeAnswer, type StoredAnswer } from '../../db/queries/counter-requests.js';
import { AppError } from '../../lib/app-error.js';

class AlreadyAnswered extends Error {}

/** 4xx answers that say something about the request itself are kept and replayed; sign-in and permission ones are not. */
const replayable = (err: unknown): err is AppError => err instanceof AppError && err.status >= 400 && err.status < 500 && err.status !== 401 && err.status !== 403;

/** The first answer again: its body, or its refusal thrown as it was. */
function replay<T>(stored: StoredAnswer, action: string, userId: string): T {
  if (stored.action !== action || (stored.user_id !== null && stored.user_id !== userId)) {
    throw new AppError('idempotency_mismatch', 'This Idempotency-Key was already used for a different request', 422);
  }
  if (stored.status_code >= 400) {
    const { error } = stored.body as { error: { code: string; message: string; details?: unknown } };
    throw new AppError(error.code, error.message, stored.status_code, error.details);
  }
  return stored.body as T;
}

/** The request's optional Idempotency-Key header, checked; null when there is none. */
export function idempotencyKey(req: Request): string | null {
  const key = req.get('idempotency-key');
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
  request: { key: string | null; userId: string; action: string; status?: number },
  work: (transaction: Transaction) => Promise<T>,
): Promise<T> {
  const { key, userId, action } = request;
  if (key === null) return database().transaction(work);
  const prior = await findAnswer(key);
  if (prior) return replay<T>(prior, action, userId);
  try {
    return await database().transaction(async (transaction) => {
      if (!(await storeAnswer({ key, userId, action, statusCode: 0, body: null }, transaction))) throw new AlreadyAnswered();
      const answer = await work(transaction);
      await completeAnswer(key, request.status ?? 200, answer, transaction);
      return answer;
    });
  } catch (err) {
    if (err instanceof AlreadyAnswered) return replay<T>((await findAnswer(key))!, action, userId);
    if (replayable(err)) {
      const body = { error: { code: err.code, message: err.message, details: err.details } };
      if (await storeAnswer({ key, userId, action, statusCode: err.status, body })) throw err;
      return replay<T>((await findAnswer(key))!, action, userId);
    }
    throw err;
  }
}
