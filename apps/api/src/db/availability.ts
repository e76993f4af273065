import pg from 'pg';
import { logger } from '../lib/logger.js';

// Telling "the database is not there right now" apart from a bug: those
// answer 503 with Retry-After and the client tries again; the pools
// reconnect by themselves once PostgreSQL is back.

const CONNECTION_ERRORS = new Set([
  'SequelizeConnectionError',
  'SequelizeConnectionRefusedError',
  'SequelizeConnectionTimedOutError',
  'SequelizeHostNotFoundError',
  'SequelizeHostNotReachableError',
  'SequelizeConnectionAcquireTimeoutError',
  'SequelizeInvalidConnectionError',
]);

// PostgreSQL SQLSTATE codes (PostgreSQL manual, appendix A "Error codes"):
// class 08 connection exception; 57P01 admin_shutdown, 57P02 crash_shutdown,
// 57P03 cannot_connect_now; 53300 too_many_connections.
const SQLSTATES = /^(08...|57P0[123]|53300)$/;
const SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', 'EHOSTUNREACH', 'EAI_AGAIN']);
const MESSAGES = /Connection terminated|terminating connection|timeout exceeded when trying to connect|the database system is (starting up|shutting down|in recovery)|Client has encountered a connection error|Connection is closed/i;

export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== 'object' || depth > 4) return false;
  const e = err as { name?: string; code?: string; message?: string; parent?: unknown; original?: unknown; cause?: unknown };
  if (e.name && CONNECTION_ERRORS.has(e.name)) return true;
  if (typeof e.code === 'string' && (SQLSTATES.test(e.code) || SOCKET_CODES.has(e.code))) return true;
  if (typeof e.message === 'string' && MESSAGES.test(e.message)) return true;
  return [e.parent, e.original, e.cause].some((inner) => inner !== err && isDatabaseUnavailable(inner, depth + 1));
}

/** Seconds a client should wait before trying again while the database is away. */
export const RETRY_AFTER_SECONDS = 2;

/**
 * A pg pool that survives the server going away: an idle client that the
 * server ends (57P01 on restart) emits `error` on the pool, which without a
 * listener would end the process. The pool drops that client and opens a new
 * one on the next query.
 */
export function createPool(connectionString: string, max: number, name: string, opts: { asyncCommit?: boolean } = {}): pg.Pool {
  const pool = new pg.Pool({
    connectionString,
    max,
    connectionTimeoutMillis: 10_000,
    idleTimeoutMillis: 30_000,
    // sessions and rate-limit counters: a crash may forget the last fraction of a second of
    // them (someone signs in again, a few hits go uncounted), and no write waits for the disk
    ...(opts.asyncCommit ? { options: '-c synchronous_commit=off' } : {}),
  });
  let lastLogged = 0;
  pool.on('error', (err) => {
    // at most one line every 5 s, so an outage doesn't flood the log
    if (Date.now() - lastLogged > 5_000) {
      lastLogged = Date.now();
      logger.warn({ pool: name, db: (err as { code?: string }).code ?? err.message }, 'idle database connection lost; the pool reconnects on the next query');
    }
  });
  return pool;
}
