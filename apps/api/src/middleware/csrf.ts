import crypto from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error.js';

// A synchronizer token bound to the server-side session: an HMAC of the
// session id, so parallel requests always agree on it and sign-in (which
// changes the session id) changes it too. Written here rather than taken from
// a package: `csurf` is deprecated, and the double-submit packages add a
// cookie and a second secret that a server-side session makes unnecessary.

declare module 'express-session' {
  interface SessionData {
    csrfIssued?: boolean;
    returnTo?: string;
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

const tokenFor = (secret: string, sessionId: string) =>
  crypto.createHmac('sha256', secret).update(`csrf:${sessionId}`).digest('base64url');

export function csrfToken(req: Request, secret: string): string {
  // mark the session so a brand-new one is saved and its id stays the same
  req.session.csrfIssued = true;
  return tokenFor(secret, req.sessionID);
}

function matches(a: string | undefined, b: string): boolean {
  if (!a) return false;
  const ab = Buffer.from(a);
  const bb = Buffer.from(b);
  return ab.length === bb.length && crypto.timingSafeEqual(ab, bb);
}

/**
 * Every state-changing request that comes with a session cookie must carry
 * the session's token in X-CSRF-Token. Requests without a session cookie
 * (webhooks, first visits) have no ambient authority to abuse.
 */
export function csrfProtection(cookieName: string, secret: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const hasSessionCookie = (req.headers.cookie ?? '').split(';').some((c) => c.trim().startsWith(`${cookieName}=`));
    if (!hasSessionCookie) return next();
    if (!req.sessionID || !matches(req.get('x-csrf-token'), tokenFor(secret, req.sessionID))) {
      throw new AppError('csrf', 'This request is missing its security token. Reload the page and try again.', 403);
    }
    next();
  };
}
