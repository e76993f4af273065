import crypto from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error.js';

// A synchronizer token kept in the server-side session. Written here rather
// than taken from a package: `csurf` is deprecated, and the double-submit
// packages add a cookie and a second secret that a server-side session
// already makes unnecessary.

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
    returnTo?: string;
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export function csrfToken(req: Request): string {
  req.session.csrfToken ??= crypto.randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

function matches(a: string | undefined, b: string | undefined): boolean {
  if (!a || !b) return false;
  const ab = Buffer.from(a);
  const bb = Buffer.from(b);
  return ab.length === bb.length && crypto.timingSafeEqual(ab, bb);
}

/**
 * Every state-changing request that comes with a session cookie must carry
 * the session's token in X-CSRF-Token. Requests without a session cookie
 * (webhooks, first visits) have no ambient authority to abuse.
 */
export function csrfProtection(cookieName: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const hasSessionCookie = (req.headers.cookie ?? '').split(';').some((c) => c.trim().startsWith(`${cookieName}=`));
    if (!hasSessionCookie) return next();
    if (!matches(req.get('x-csrf-token'), req.session?.csrfToken)) {
      throw new AppError('csrf', 'This request is missing its security token. Reload the page and try again.', 403);
    }
    next();
  };
}
