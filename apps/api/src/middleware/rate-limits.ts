import type pg from 'pg';
import type { RequestHandler } from 'express';
import { rateLimit, ipKeyGenerator, type Store, type Options, type ClientRateLimitInfo } from 'express-rate-limit';
import type { Config } from '../config/env.js';

/**
 * express-rate-limit's counters kept in PostgreSQL (table `rate_limit_hits`),
 * so every API process behind the proxy counts the same hits. One upsert per
 * request: a window that has run out starts again at 1.
 *
 * Written here rather than taken from @acpr/rate-limit-postgresql: that store
 * opens a pool of its own for every limiter with no `error` listener, and runs
 * its schema migrations from the constructor without awaiting them, so a
 * database that is down at boot (or restarts) would end the process.
 */
export class PostgresRateLimitStore implements Store {
  localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly pool: pg.Pool,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const { rows } = await this.pool.query<{ hits: number; resets_at: Date }>(
      `INSERT INTO rate_limit_hits AS r (key, hits, resets_at)
       VALUES ($1, 1, now() + make_interval(secs => $2::double precision / 1000))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.resets_at <= now() THEN 1 ELSE r.hits + 1 END,
         resets_at = CASE WHEN r.resets_at <= now() THEN EXCLUDED.resets_at ELSE r.resets_at END
       RETURNING hits, resets_at`,
      [`${this.prefix}:${key}`, this.windowMs],
    );
    return { totalHits: rows[0]!.hits, resetTime: rows[0]!.resets_at };
  }

  async decrement(key: string): Promise<void> {
    await this.pool.query(`UPDATE rate_limit_hits SET hits = greatest(hits - 1, 0) WHERE key = $1`, [`${this.prefix}:${key}`]);
  }

  async resetKey(key: string): Promise<void> {
    await this.pool.query(`DELETE FROM rate_limit_hits WHERE key = $1`, [`${this.prefix}:${key}`]);
  }
}

type Limited = 'signIn' | 'orders' | 'cancel' | 'waitlist';

const messages: Record<Limited, string> = {
  signIn: 'Too many sign-in attempts from here. Please wait a little and try again.',
  orders: 'Too many orders in a short time. Please wait a little and try again.',
  cancel: 'Too many cancellations in a short time. Please wait a little and try again.',
  waitlist: 'Too many waitlist requests in a short time. Please wait a little and try again.',
};

/**
 * The limits on sign-in (per address), order creation, cancellation and the
 * waitlist (per signed-in customer, else per address). Over the limit: 429
 * with Retry-After and our usual error body. A store error (database away)
 * goes to the error handler, which answers 503.
 */
export function rateLimits(config: Config, pool: pg.Pool): Record<Limited, RequestHandler> {
  const windowMs = config.RATE_LIMIT_WINDOW_SECONDS * 1000;
  const byUserOrAddress = (req: Parameters<RequestHandler>[0]) => (req.user ? `user:${req.user.id}` : `ip:${ipKeyGenerator(req.ip ?? '')}`);
  const make = (name: Limited, limit: number, keyOf: (req: Parameters<RequestHandler>[0]) => string): RequestHandler =>
    rateLimit({
      windowMs,
      limit,
      standardHeaders: 'draft-7',
      legacyHeaders: false,
      store: new PostgresRateLimitStore(pool, name),
      keyGenerator: (req) => keyOf(req),
      passOnStoreError: false,
      handler: (_req, res, _next, options) => {
        const info = (_req as unknown as { rateLimit?: { resetTime?: Date } }).rateLimit;
        const seconds = info?.resetTime ? Math.max(1, Math.ceil((info.resetTime.getTime() - Date.now()) / 1000)) : Math.ceil(options.windowMs / 1000);
        res.set('Retry-After', String(seconds));
        res.status(429).json({ error: { code: 'rate_limited', message: messages[name], details: { retryAfterSeconds: seconds } } });
      },
    });
  return {
    signIn: make('signIn', config.RATE_LIMIT_SIGNIN, (req) => `ip:${ipKeyGenerator(req.ip ?? '')}`),
    orders: make('orders', config.RATE_LIMIT_ORDERS, byUserOrAddress),
    cancel: make('cancel', config.RATE_LIMIT_CANCEL, byUserOrAddress),
    waitlist: make('waitlist', config.RATE_LIMIT_WAITLIST, byUserOrAddress),
  };
}
