// `npm start`: installs what is missing, starts a project-local PostgreSQL,
// migrates, loads the demo, builds the apps, and runs the fakes and the API.
// A child that stops on its own is started again with backoff; Ctrl-C stops
// everything it started, PostgreSQL included.
import path from 'node:path';
import {
  assertPortsFree, buildApps, ensurePnpm, installDependencies, log, root, SetupError, startChild, waitForHttp, run,
} from './lib/shell.mjs';
import { ensurePostgres } from './lib/postgres.mjs';

const env = process.env;
const num = (name, fallback) => {
  const value = env[name] ?? String(fallback);
  if (!/^\d+$/.test(value) || Number(value) > 65535) throw new SetupError(`${name} must be a port number (got ${JSON.stringify(value)})`);
  return Number(value);
};

/** 1 s, 2 s, 4 s … at most 30 s. */
function restartDelayMs(failuresInARow) {
  return Math.min(30_000, 1000 * 2 ** Math.max(0, failuresInARow - 1));
}

async function main() {
  const ports = {
    'Fryline app (PORT)': num('PORT', 3000),
    'sign-in fake (OAUTH_FAKE_PORT)': num('OAUTH_FAKE_PORT', 3101),
    'payments fake (PAYMENTS_FAKE_PORT)': num('PAYMENTS_FAKE_PORT', 3102),
    'mail inbox (MAIL_INBOX_PORT)': num('MAIL_INBOX_PORT', 3103),
    'SMTP fake (SMTP_PORT)': num('SMTP_PORT', 2525),
  };
  const [appPort, oauthPort, paymentsPort, inboxPort, smtpPort] = Object.values(ports);
  const pgPort = num('PGPORT', 5433);
  await assertPortsFree(ports);

  const pnpm = ensurePnpm();
  installDependencies(pnpm);
  const dataDir = path.resolve(env.FRYLINE_DATA_DIR ?? path.join(root, '.data'));
  const pg = await ensurePostgres({ dataDir, port: pgPort });
  const children = new Map();
  const restarts = new Set();
  let stopping = false;
  const stop = async (code = 0) => {
    if (stopping) return;
    stopping = true;
    log('stopping…');
    for (const timer of restarts) clearTimeout(timer);
    const running = [...children.values()].filter((c) => c.exitCode === null && c.signalCode === null);
    for (const child of running) child.kill('SIGTERM');
    await Promise.all(running.map((c) => new Promise((r) => c.once('exit', r))));
    if (pg.started) {
      log('stopping PostgreSQL');
      pg.stop();
    }
    process.exit(code);
  };
  process.on('SIGINT', () => stop(0));
  process.on('SIGTERM', () => stop(0));

  try {
    const databaseUrl = pg.createDatabase('fryline');
    const appUrl = env.PUBLIC_URL ?? `http://127.0.0.1:${appPort}`;
    const shared = {
      DATABASE_URL: databaseUrl,
      PORT: String(appPort),
      PUBLIC_URL: appUrl,
      OAUTH_URL: `http://127.0.0.1:${oauthPort}`,
      OAUTH_FAKE_PORT: String(oauthPort),
      OAUTH_REDIRECT_URIS: `${appUrl}/auth/google/callback`,
      STRIPE_API_URL: `http://127.0.0.1:${paymentsPort}`,
      PAYMENTS_FAKE_PORT: String(paymentsPort),
      PAYMENTS_FAKE_PUBLIC_URL: `http://127.0.0.1:${paymentsPort}`,
      PAYMENTS_WEBHOOK_URL: `${appUrl}/webhooks/payments`,
      PAYMENTS_FAKE_STATE_FILE: path.join(dataDir, 'payments-fake.json'),
      MAIL_INBOX_PORT: String(inboxPort),
      SMTP_PORT: String(smtpPort),
    };
    buildApps(pnpm);

    // A child that stops on its own is started again after a pause that
    // doubles with each quick failure (1 s … 30 s); the others keep running.
    const supervise = (tag, file) => {
      let failures = 0;
      const launch = () => {
        const startedAt = Date.now();
        const child = startChild(tag, process.execPath, ['--import', 'tsx', file], shared);
        children.set(tag, child);
        child.on('exit', (code, signal) => {
          // Ctrl-C reaches the children too; give our own handler a moment to say so
          setTimeout(() => {
            if (stopping) return;
            failures = Date.now() - startedAt > 30_000 ? 1 : failures + 1;
            const delay = restartDelayMs(failures);
            log(`${tag} stopped unexpectedly (${signal ?? `exit code ${code}`}); restarting it in ${delay / 1000} s (restart ${failures} in a row)`);
            const timer = setTimeout(() => {
              restarts.delete(timer);
              if (!stopping) launch();
            }, delay);
            restarts.add(timer);
          }, 200);
        });
      };
      launch();
    };
    supervise('oauth', 'fakes/oauth/src/main.ts');
    supervise('payments', 'fakes/payments/src/main.ts');
    supervise('mail', 'fakes/mail/src/main.ts');
    await waitForHttp(`http://127.0.0.1:${paymentsPort}/`);
    log('migrating and loading the demo scenario');
    run(process.execPath, ['--import', 'tsx', 'seeds/src/setup.ts'], { env: { ...process.env, ...shared } });
    supervise('api', 'apps/api/src/index.ts');
    await waitForHttp(`${appUrl}/api/health`);

    console.log(`
  Fryline is running.

    Shop            ${appUrl}/
    Staff           ${appUrl}/staff/
    Mail inbox      http://127.0.0.1:${inboxPort}/
    Sign-in fake    http://127.0.0.1:${oauthPort}/
    Payments fake   http://127.0.0.1:${paymentsPort}/  (test card 4242 4242 4242 4242, any future expiry, any CVC)
    SMTP            127.0.0.1:${smtpPort}
    PostgreSQL      ${databaseUrl}

  Demo accounts (choose one on the sign-in page):
    owner@fryline.test     owner: bake days, menu, staff, refunds, sales
    baker@fryline.test     baker: production sheet, formula, pickups
    counter@fryline.test   counter: pickup list
    customer@fryline.test  customer: shop and own orders

  Press Ctrl-C to stop everything.
`);
  } catch (err) {
    console.error(`\n${err instanceof SetupError ? err.message : err.stack}`);
    await stop(1);
  }
}

main().catch((err) => {
  console.error(`\n${err instanceof SetupError ? err.message : err.stack}`);
  process.exit(1);
});
