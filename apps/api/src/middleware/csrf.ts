import crypto from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error.js';

// A synchronizer token bound to the server-side session: an HMAC of the
// session id, so parallel requests always agree on it and sign-in (which
// changes the session id) changes it too. Whether a request carries a
// session is decided by the session middleware itself (it found a stored
// session for the cookie), never by reading the Cookie header here.
// Written here rather than taken from a package: `csurf` is deprecated, and
// csrf-sync would store a token in every session, while the HMAC of
// req.sessionID needs nothing stored and no session for anonymous visitors.

declare module 'express-session' {
  interface SessionData {
    returnTo?: string;
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

const tokenFor = (secret: string, sessionId: string) =>
  crypto.createHmac('sha256', secret).update(`csrf:${sessionId}`).digest('base64url');

/** The token for this request's session (an anonymous visitor's is never asked for, and makes no session row). */
export function csrfToken(req: Request, secret: string): string {
  return tokenFor(secret, req.sessionID);
}

/**
 * A session that was loaded from the store carries something besides its
 * cookie (the signed-in user, or the sign-in's state and return address); a
 * session the middleware has just made for this request carries nothing.
 */
export function hasStoredSession(req: Request): boolean {
  return !!req.session && Object.keys(req.session).some((key) => key !== 'cookie');
}

function matches(a: string | undefined, b: string): boolean {
  if (!a) return false;
  const ab = Buffer.from(a);
  const bb = Buffer.from(b);
  return ab.length === bb.length && crypto.timingSafeEqual(ab, bb);
}

/**
 * Every state-changing request that comes with a session must carry the
 * session's token in X-CSRF-Token. Requests without one (webhooks, first
 * visits) have no ambient authority to abuse.
 */
export function csrfProtection(secret: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    if (!hasStoredSession(req)) return next();
    if (!matches(req.get('x-csrf-token'), tokenFor(secret, req.sessionID))) {
      throw new AppError('csrf', 'This request is missing its security token. Reload the page and try again.', 403);
    }
    next();
  };
}
