import type { Request } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type pg from 'pg';
import type { Me } from '@fryline/schemas';

const PgStore = connectPgSimple(session);
const TOUCH_EVERY_MS = 60 * 60 * 1000;

/** The signed-in user read with the session, handed from the store's `get` to passport's deserializeUser for the same request. */
const loadedWith = Symbol('fryline.loadedUser');
const usersOfRequests = new WeakMap<Request, Me>();

interface SessionRow {
  sess: session.SessionData | string;
  user_id: string | null;
  email: string | null;
  name: string | null;
  role: Me['role'] | null;
}

/**
 * The PostgreSQL session store (connect-pg-simple's table and writes) with
 * two savings on every signed-in request:
 *
 * - a session's expiry is touched at most once an hour per process instead
 *   of on every request (one UPDATE saved; the 30-day expiry moves by at most
 *   an hour less);
 * - the session and its signed-in user are read in one statement, so the
 *   user is not looked up again (one SELECT saved). The user is read fresh
 *   with every request, so a role change counts from the next one.
 */
export class FrylineSessionStore extends PgStore {
  private touched = new Map<string, number>();
  private readonly pool: pg.Pool;

  constructor(options: connectPgSimple.PGStoreOptions & { pool: pg.Pool }) {
    super(options);
    this.pool = options.pool;
  }

  override get(sid: string, fn: (err: unknown, sess?: session.SessionData | null) => void): void {
    this.pool.query<SessionRow>(
      `SELECT s.sess, u.id AS user_id, u.email, u.name, u.role
         FROM "session" s
         LEFT JOIN users u
           ON u.id = CASE WHEN s.sess #>> '{passport,user}' ~ '^[0-9a-fA-F-]{36}$' THEN (s.sess #>> '{passport,user}')::uuid END
        WHERE s.sid = $1 AND s.expire >= now()`,
      [sid],
      (err, result) => {
        if (err) return fn(err);
        const row = result.rows[0];
        if (!row) return fn(null, null);
        let sess: session.SessionData;
        try {
          sess = typeof row.sess === 'string' ? (JSON.parse(row.sess) as session.SessionData) : row.sess;
        } catch {
          return this.destroy(sid, (destroyErr) => fn(destroyErr ?? null, null));
        }
        if (row.user_id) {
          // not enumerable: never saved back into the session, never part of its change check
          Object.defineProperty(sess, loadedWith, { value: { id: row.user_id, email: row.email!, name: row.name!, role: row.role! } satisfies Me, enumerable: false });
        }
        fn(null, sess);
      },
    );
  }

  override createSession(req: Request, sess: session.SessionData): session.Session & Partial<session.SessionData> {
    const user = (sess as unknown as Record<symbol, Me | undefined>)[loadedWith];
    if (user) usersOfRequests.set(req, user);
    return super.createSession(req, sess);
  }

  override touch(sid: string, sess: session.SessionData, fn?: (err?: unknown) => void) {
    const now = Date.now();
    if (now - (this.touched.get(sid) ?? 0) < TOUCH_EVERY_MS) {
      fn?.();
      return;
    }
    if (this.touched.size > 50_000) this.touched.clear();
    this.touched.set(sid, now);
    super.touch(sid, sess, fn as never);
  }
}

/** The user the session store read with this request's session, if it is the one with `id`. */
export function userLoadedWithSession(req: Request, id: string): Me | null {
  const user = usersOfRequests.get(req);
  return user && user.id === id ? user : null;
}
