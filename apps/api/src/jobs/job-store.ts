import { QueryTypes, type Transaction } from 'sequelize';
import type { JobView } from '@fryline/schemas';
import { database } from '../db/sequelize.js';

// The `jobs` and `job_items` tables: long work split into items, each done
// at most once. An item's effect and its 'done' mark commit in one
// transaction; a job is claimed with a lease (FOR UPDATE SKIP LOCKED), and a
// lease that runs out (the process died) lets the next runner carry on.

export type JobKind = 'call-off';

export interface JobRow {
  id: string;
  kind: JobKind;
  subject_id: string;
  state: JobView['state'];
  total: number;
  done: number;
  payload: Record<string, unknown>;
  last_error: string | null;
  created_by: string | null;
  created_at: Date;
  finished_at: Date | null;
}

export interface JobItemRow {
  job_id: string;
  position: number;
  kind: 'order' | 'person';
  ref_id: string;
  attempts: number;
}

const toView = (row: JobRow): JobView => ({
  id: row.id,
  kind: row.kind,
  state: row.state,
  done: row.done,
  total: row.total,
  bakeDayId: row.subject_id,
  lastError: row.last_error,
  createdAt: row.created_at.toISOString(),
  finishedAt: row.finished_at?.toISOString() ?? null,
});

const SELECT_JOB = `SELECT id, kind, subject_id, state, total, done, payload, last_error, created_by, created_at, finished_at FROM jobs`;

/** Queues a job with its items, in the caller's transaction (so it exists exactly when the change that needs it commits). */
export async function createJob(
  job: { kind: JobKind; subjectId: string; payload: Record<string, unknown>; createdBy: string | null; items: Array<{ kind: JobItemRow['kind']; refId: string }> },
  transaction: Transaction,
): Promise<string> {
  const [row] = await database().query<{ id: string }>(
    `INSERT INTO jobs (kind, subject_id, payload, created_by, total) VALUES (:kind, :subjectId, CAST(:payload AS jsonb), :createdBy, :total) RETURNING id`,
    {
      replacements: { kind: job.kind, subjectId: job.subjectId, payload: JSON.stringify(job.payload), createdBy: job.createdBy, total: job.items.length },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  const id = row!.id;
  for (let start = 0; start < job.items.length; start += 500) {
    const chunk = job.items.slice(start, start + 500);
    const values = chunk.map((_, i) => `(:id, :p${i}, :k${i}, :r${i})`).join(', ');
    const replacements: Record<string, unknown> = { id };
    chunk.forEach((item, i) => {
      replacements[`p${i}`] = start + i;
      replacements[`k${i}`] = item.kind;
      replacements[`r${i}`] = item.refId;
    });
    await database().query(`INSERT INTO job_items (job_id, position, kind, ref_id) VALUES ${values}`, { replacements, transaction });
  }
  if (job.items.length === 0) {
    await database().query(`UPDATE jobs SET state = 'done', finished_at = now() WHERE id = :id`, { replacements: { id }, transaction });
  }
  return id;
}

export async function getJob(id: string): Promise<JobView | null> {
  const [row] = await database().query<JobRow>(`${SELECT_JOB} WHERE id = :id`, { replacements: { id }, type: QueryTypes.SELECT });
  return row ? toView(row) : null;
}

export async function jobForSubject(kind: JobKind, subjectId: string, transaction?: Transaction): Promise<JobView | null> {
  const [row] = await database().query<JobRow>(`${SELECT_JOB} WHERE kind = :kind AND subject_id = :subjectId`, {
    replacements: { kind, subjectId },
    type: QueryTypes.SELECT,
    transaction,
  });
  return row ? toView(row) : null;
}

/**
 * Takes the oldest job that is waiting or whose lease has run out, and leases
 * it to `workerId` until now + leaseSeconds. Two runners never get the same
 * job: the row is locked and skipped by the other.
 */
export async function claimJob(workerId: string, now: Date, leaseSeconds: number): Promise<JobRow | null> {
  return database().transaction(async (transaction) => {
    const [row] = await database().query<JobRow>(
      `${SELECT_JOB}
        WHERE state IN ('queued', 'running') AND (locked_until IS NULL OR locked_until <= CAST(:now AS timestamptz))
        ORDER BY created_at
        LIMIT 1
        FOR UPDATE SKIP LOCKED`,
      { replacements: { now }, type: QueryTypes.SELECT, transaction },
    );
    if (!row) return null;
    await database().query(
      `UPDATE jobs SET state = 'running', locked_by = :workerId, attempts = attempts + 1,
              locked_until = CAST(:now AS timestamptz) + make_interval(secs => :leaseSeconds), updated_at = now()
        WHERE id = :id`,
      { replacements: { id: row.id, workerId, now, leaseSeconds }, transaction },
    );
    return { ...row, state: 'running' };
  });
}

/** Keeps the lease while the work goes on; false when another runner has taken the job over. */
export async function renewLease(jobId: string, workerId: string, now: Date, leaseSeconds: number): Promise<boolean> {
  const rows = await database().query(
    `UPDATE jobs SET locked_until = CAST(:now AS timestamptz) + make_interval(secs => :leaseSeconds), updated_at = now()
      WHERE id = :jobId AND locked_by = :workerId AND state = 'running' RETURNING id`,
    { replacements: { jobId, workerId, now, leaseSeconds }, type: QueryTypes.SELECT },
  );
  return rows.length === 1;
}

/** The next item not yet done, locked for this transaction. */
export async function nextItem(jobId: string, transaction: Transaction): Promise<JobItemRow | null> {
  const [row] = await database().query<JobItemRow>(
    `SELECT job_id, position, kind, ref_id, attempts FROM job_items
      WHERE job_id = :jobId AND state = 'pending'
      ORDER BY position LIMIT 1 FOR UPDATE SKIP LOCKED`,
    { replacements: { jobId }, type: QueryTypes.SELECT, transaction },
  );
  return row ?? null;
}

/** Marks an item done and counts it, in the transaction of its effect. */
export async function markItemDone(item: JobItemRow, transaction: Transaction): Promise<void> {
  const rows = await database().query(
    `UPDATE job_items SET state = 'done', done_at = now(), last_error = NULL WHERE job_id = :jobId AND position = :position AND state = 'pending' RETURNING position`,
    { replacements: { jobId: item.job_id, position: item.position }, type: QueryTypes.SELECT, transaction },
  );
  if (rows.length === 1) {
    await database().query(`UPDATE jobs SET done = done + 1, updated_at = now() WHERE id = :jobId`, { replacements: { jobId: item.job_id }, transaction });
  }
}

/** An item failed: note why, and let the job wait `retrySeconds` before it is tried again. */
export async function recordItemFailure(item: JobItemRow, error: string, now: Date, retrySeconds: number): Promise<void> {
  await database().transaction(async (transaction) => {
    await database().query(`UPDATE job_items SET attempts = attempts + 1, last_error = :error WHERE job_id = :jobId AND position = :position`, {
      replacements: { jobId: item.job_id, position: item.position, error },
      transaction,
    });
    await database().query(
      `UPDATE jobs SET last_error = :error, locked_by = NULL, locked_until = CAST(:now AS timestamptz) + make_interval(secs => :retrySeconds), updated_at = now()
        WHERE id = :jobId`,
      { replacements: { jobId: item.job_id, error, now, retrySeconds }, transaction },
    );
  });
}

/** Every item done: the job is finished. */
export async function finishJob(jobId: string, transaction: Transaction): Promise<boolean> {
  const rows = await database().query(
    `UPDATE jobs SET state = 'done', finished_at = now(), locked_by = NULL, locked_until = NULL, last_error = NULL, updated_at = now()
      WHERE id = :jobId AND state = 'running' AND done = total RETURNING id`,
    { replacements: { jobId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.length === 1;
}
