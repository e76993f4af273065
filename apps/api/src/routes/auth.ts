import { Router, type Request, type Response } from 'express';
import type { PassportStatic } from 'passport';
import { csrfToken } from '../middleware/csrf.js';
import { api } from '@fryline/schemas';
import { currentUser, requireUser } from '../middleware/auth.js';
import { route } from '../lib/route.js';

/** Only a same-origin path may be a return address after sign-in. */
export function safeReturnTo(value: unknown): string {
  if (typeof value !== 'string' || !value.startsWith('/') || value.startsWith('//') || value.includes('\\')) return '/';
  return value;
}

export function authRouter(passport: PassportStatic, cookieName: string, secret: string) {
  const router = Router();

  router.get('/auth/google', (req, res, next) => {
    req.session.returnTo = safeReturnTo(req.query.returnTo);
    passport.authenticate('google', { scope: ['openid', 'email', 'profile'], prompt: 'select_account' })(req, res, next);
  });

  router.get('/auth/google/callback', (req, res, next) => {
    const fail = (code: string) => {
      const returnTo = req.session.returnTo ?? '/';
      // no half-made session survives a failed sign-in
      req.session.destroy(() => {
        res.clearCookie(cookieName, { path: '/' });
        res.redirect(303, `/signin?error=${code}${returnTo === '/' ? '' : `&returnTo=${encodeURIComponent(returnTo)}`}`);
      });
    };
    passport.authenticate('google', (err: (Error & { code?: string }) | null, user: Express.User | false, info?: { message?: string }) => {
      if (err) return fail(err.code === 'account_conflict' ? 'conflict' : 'failed');
      if (!user) {
        if (req.query.error === 'access_denied') return fail('access_denied');
        return fail(/state/i.test(info?.message ?? '') ? 'state' : 'failed');
      }
      const returnTo = req.session.returnTo ?? '/';
      // passport regenerates the session id here (no session fixation)
      req.logIn(user, (loginErr) => {
        if (loginErr) return next(loginErr);
        res.redirect(303, returnTo);
      });
    })(req, res, next);
  });

  router.post('/auth/logout', (req: Request, res: Response, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy(() => {
        res.clearCookie(cookieName, { path: '/' });
        res.status(204).end();
      });
    });
  });

  route(router, api.csrf, [], ({ req }) => ({ token: csrfToken(req, secret) }), { noStore: true });

  route(router, api.me, [requireUser], ({ req }) => {
    const { id, email, name, role } = currentUser(req);
    return { id, email, name, role };
  }, { noStore: true });

  return router;
}
