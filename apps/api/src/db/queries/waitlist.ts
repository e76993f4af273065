import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// The waiting list's conditional updates: an offer changes state only in a
// statement that checks its state and its expiry against the caller's `now`.

/** Claims an offer that is still open at `now`; its pieces, or null when it expired or was used. */
export async function markOfferClaimed(token: string, userId: string, bakeDayId: string, now: Date, transaction: Transaction): Promise<{ rings: number; holes: number } | null> {
  const rows = await database().query<{ rings: number; holes: number }>(
    `UPDATE waitlist_entries SET status = 'claimed', updated_at = now()
      WHERE claim_token = :token AND user_id = :userId AND bake_day_id = :bakeDayId
        AND status = 'offered' AND offer_expires_at > :now
      RETURNING rings, holes`,
    { replacements: { token, userId, bakeDayId, now }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0] ?? null;
}

/** The first in line for a bake day, locked; entries another process holds are skipped. */
export async function lockNextWaiting(bakeDayId: string, transaction: Transaction): Promise<{ id: string; user_id: string; rings: number; holes: number } | null> {
  const [entry] = await database().query<{ id: string; user_id: string; rings: number; holes: number }>(
    `SELECT id, user_id, rings, holes FROM waitlist_entries
      WHERE bake_day_id = :bakeDayId AND status = 'waiting'
      ORDER BY created_at LIMIT 1 FOR UPDATE SKIP LOCKED`,
    { replacements: { bakeDayId }, type: QueryTypes.SELECT, transaction },
  );
  return entry ?? null;
}

/** Lapses every offer whose time is up at `now`; what each held. */
export function lapseDueOffers(now: Date, transaction: Transaction): Promise<Array<{ bake_day_id: string; rings: number; holes: number }>> {
  return database().query<{ bake_day_id: string; rings: number; holes: number }>(
    `UPDATE waitlist_entries SET status = 'lapsed', updated_at = now()
      WHERE status = 'offered' AND offer_expires_at <= :now
      RETURNING bake_day_id, rings, holes`,
    { replacements: { now }, type: QueryTypes.SELECT, transaction },
  );
}
