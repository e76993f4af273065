import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import express from 'express';
import helmet from 'helmet';
import session from 'express-session';
import { isPlainText } from '@fryline/schemas';
import { createPool } from './db/availability.js';
import { logger } from './lib/logger.js';
import type { Config } from './config/env.js';
import { configurePassport } from './integrations/passport.js';
import { FrylineSessionStore } from './integrations/session-store.js';
import { csrfProtection } from './middleware/csrf.js';
import { rateLimits } from './middleware/rate-limits.js';
import { errorHandler, notFoundHandler } from './middleware/errors.js';
import { healthRouter } from './routes/health.js';
import { authRouter } from './routes/auth.js';
import { bakeDaysRouter } from './routes/bake-days.js';
import { ordersRouter } from './routes/orders.js';
import { waitlistRouter } from './routes/waitlist.js';
import { webhooksRouter } from './routes/webhooks.js';
import { staffBakeDaysRouter } from './routes/staff-bake-days.js';
import { staffOrdersRouter } from './routes/staff-orders.js';
import { staffMembersRouter } from './routes/staff-members.js';
import { menuItemsRouter } from './routes/menu-items.js';
import { productionRouter } from './routes/production.js';
import { shopRulesRouter } from './routes/shop-rules.js';
import { shopSettingsRouter } from './routes/shop-settings.js';
import { auditLogRouter } from './routes/audit-log.js';
import { photosRouter } from './routes/photos.js';
import { setContext } from './integrations/context.js';
import { requestClock } from './middleware/request-clock.js';
import { requestLog } from './middleware/request-log.js';
import { checkResponsesAgainstContract } from './lib/route.js';
import { bakeDayEditRouter } from './routes/bake-day-edit.js';
import { announcementsRouter, unsubscribeRouter } from './routes/announcements.js';
import { reportsRouter } from './routes/reports.js';
import { counterRouter } from './routes/counter.js';

export const SESSION_COOKIE = 'fryline.sid';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');

/** Serves a built single-page app under `mount`, falling back to its index.html. */
function spa(app: express.Express, mount: string, dir: string) {
  const index = path.join(dir, 'index.html');
  if (!fs.existsSync(index)) return;
  app.use(mount, express.static(dir, { index: false, maxAge: '1h', immutable: false }));
  const fallback: express.RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' || !req.accepts('html')) return next();
    res.set('Cache-Control', 'no-cache').sendFile(index);
  };
  app.get(mount === '/' ? '/{*splat}' : [mount, `${mount}/{*splat}`], fallback);
}

/**
 * Builds the whole HTTP app: API, sign-in, webhooks and the two built front
 * ends. Only index.ts listens; tests drive this with supertest.
 */
export function createApp(config: Config) {
  setContext(config);
  checkResponsesAgainstContract(config.NODE_ENV !== 'production');
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.set('query parser', 'extended');
  app.use(requestLog);

  // Everything the apps load comes from this origin; images may be data: URLs (QR codes).
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          frameAncestors: ["'none'"],
          formAction: ["'self'"],
        },
      },
      referrerPolicy: { policy: 'same-origin' },
      strictTransportSecurity: config.secureCookies,
    }),
  );

  app.use(requestClock);
  app.use(healthRouter);
  // photo files need no session: served before it is read
  app.use(photosRouter);

  // Webhooks read the raw body for signature checks: mounted before express.json().
  app.use(webhooksRouter);
  // one-click unsubscribe comes from mail programs, without cookies: before sessions and CSRF
  app.use(unsubscribeRouter);

  // no string (or key) in any JSON body may hold NUL, other control characters or lone surrogates:
  // refused with 400 before a route sees it, so such text never reaches the database or the payments service
  app.use(
    express.json({
      limit: '100kb',
      reviver(key: string, value: unknown) {
        if ((typeof value === 'string' && !isPlainText(value)) || !isPlainText(key)) {
          throw new SyntaxError('The request holds text with control characters or broken Unicode');
        }
        return value;
      },
    }),
  );

  const sessionPool = createPool(config.DATABASE_URL, 5, 'session store', { asyncCommit: true });
  // Sessions only where they are used: the API and sign-in. The apps' files and pages
  // never read one, and must not re-send a session cookie (rolling): a file fetched
  // with the cookie from before a sign-in (the staff app's service worker fetches
  // its files in the background) would otherwise answer with that old cookie after
  // the sign-in had set the new one, and sign the person out again.
  const SESSION_PATHS = ['/api', '/auth'];
  app.use(
    SESSION_PATHS,
    session({
      name: SESSION_COOKIE,
      secret: config.SESSION_SECRET,
      store: new FrylineSessionStore({
        pool: sessionPool,
        tableName: 'session',
        createTableIfMissing: false,
        pruneSessionInterval: config.JOBS === 'on' ? 600 : false,
        errorLog: (...args: unknown[]) => logger.error({ sessionStore: args.map(String).join(' ').slice(0, 500) }, 'session store error'),
      }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.secureCookies,
        maxAge: 30 * 24 * 3600 * 1000,
        path: '/',
      },
    }),
  );
  const passport = configurePassport(config);
  app.use(SESSION_PATHS, passport.session());
  app.use(SESSION_PATHS, csrfProtection(config.SESSION_SECRET));

  // counted in PostgreSQL, so every API process shares the counts
  const limits = rateLimits(config, sessionPool);
  app.get(['/auth/google', '/auth/google/callback'], limits.signIn);
  app.post('/api/orders', limits.orders);
  app.post('/api/orders/:id/cancel', limits.cancel);
  app.post('/api/bake-days/:id/waitlist', limits.waitlist);

  app.use(authRouter(passport, SESSION_COOKIE, config.SESSION_SECRET));
  app.use(bakeDaysRouter);
  app.use(ordersRouter);
  app.use(waitlistRouter);
  app.use(staffBakeDaysRouter);
  app.use(staffOrdersRouter);
  app.use(staffMembersRouter);
  app.use(menuItemsRouter);
  app.use(productionRouter);
  app.use(shopRulesRouter);
  app.use(bakeDayEditRouter);
  app.use(announcementsRouter);
  app.use(reportsRouter);
  app.use(shopSettingsRouter);
  app.use(auditLogRouter);
  app.use(counterRouter);

  app.use(['/api', '/auth', '/webhooks'], notFoundHandler);

  const staticRoot = config.STATIC_DIR ?? path.join(repoRoot, 'apps');
  spa(app, '/staff', path.join(staticRoot, 'staff/dist'));
  spa(app, '/', path.join(staticRoot, 'shop/dist'));

  app.use(notFoundHandler);
  app.use(errorHandler);

  return Object.assign(app, {
    sessionPool,
    async closeResources() {
      await sessionPool.end();
    },
  });
}

export type FrylineApp = ReturnType<typeof createApp>;
