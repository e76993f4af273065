import crypto from 'node:crypto';
import type { Transaction } from 'sequelize';
import { database } from '../db/sequelize.js';
import { claimJob, finishJob, markItemDone, nextItem, recordItemFailure, renewLease, type JobItemRow, type JobKind, type JobRow } from './job-store.js';
import { callOffHandler } from '../services/call-off/index.js';

export interface JobHandler {
  /** Does one item's work inside `transaction`; the item is marked done in the same transaction. */
  runItem(job: JobRow, item: JobItemRow, transaction: Transaction, now: Date): Promise<void>;
  /** After the last item, in the transaction that marks the job done. */
  finish?(job: JobRow, transaction: Transaction): Promise<void>;
}

const handlers: Record<JobKind, JobHandler> = { 'call-off': callOffHandler };

/** Thrown by a test hook to stop a runner dead, as if its process were killed mid-item. */
export class JobStopped extends Error {}

export interface RunJobsOptions {
  workerId?: string;
  now?: () => Date;
  leaseSeconds?: number;
  /**
   * Test hook: called inside each item's transaction after its work, before
   * it commits, with how many items this run has done including this one.
   * Throw JobStopped to simulate a crash at the worst moment.
   */
  afterItem?: (itemsThisRun: number, item: JobItemRow) => void;
}

const retrySeconds = (attempts: number) => Math.min(5 * 2 ** attempts, 600);

/**
 * Runs every job that is due, item by item, until none is left. Returns the
 * number of items done. Several API processes may run this side by side.
 */
export async function runJobs(opts: RunJobsOptions = {}): Promise<number> {
  const workerId = opts.workerId ?? `api-${process.pid}-${crypto.randomUUID().slice(0, 8)}`;
  const now = opts.now ?? (() => new Date());
  const lease = opts.leaseSeconds ?? 60;
  let count = 0;
  for (;;) {
    const job = await claimJob(workerId, now(), lease);
    if (!job) return count;
    const handler = handlers[job.kind];
    for (;;) {
      if (!(await renewLease(job.id, workerId, now(), lease))) break;
      let failed: { item: JobItemRow; error: unknown } | null = null;
      const more = await database()
        .transaction(async (transaction) => {
          const item = await nextItem(job.id, transaction);
          if (!item) {
            if (await finishJob(job.id, transaction)) await handler.finish?.(job, transaction);
            return false;
          }
          try {
            await database().transaction({ transaction }, (savepoint) => handler.runItem(job, item, savepoint, now()));
          } catch (error) {
            if (error instanceof JobStopped) throw error;
            failed = { item, error };
            return false;
          }
          await markItemDone(item, transaction);
          count += 1;
          opts.afterItem?.(count, item);
          return true;
        });
      if (failed) {
        const { item, error } = failed as { item: JobItemRow; error: unknown };
        console.error(`[job ${job.kind} ${job.id}] item ${item.position} failed:`, (error as Error).message);
        await recordItemFailure(item, String((error as Error).message).slice(0, 500), now(), retrySeconds(item.attempts));
        break;
      }
      if (!more) break;
    }
  }
}
