import { DEFAULT_WEBHOOK_SECRET, startPaymentsFake } from './server.js';

/** Starts the payments fake from the environment (the start command runs this). */

function fail(message: string): never {
  console.error(`[payments fake] ${message}`);
  process.exit(1);
}

function readPort(raw: string | undefined): number {
  if (raw === undefined || raw === '') return 3102;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 0 || port > 65_535) fail(`PAYMENTS_FAKE_PORT must be a port number, got "${raw}"`);
  return port;
}

function readDelays(raw: string | undefined): number[] | undefined {
  if (raw === undefined || raw.trim() === '') return undefined;
  const delays = raw.split(',').map((part) => Number(part.trim()));
  if (!delays.every((ms) => Number.isInteger(ms) && ms >= 0)) {
    fail(`PAYMENTS_WEBHOOK_RETRY_DELAYS_MS must be comma-separated milliseconds, got "${raw}"`);
  }
  return delays;
}

const env = process.env;
const port = readPort(env.PAYMENTS_FAKE_PORT);
const webhookUrl = env.PAYMENTS_WEBHOOK_URL ?? 'http://127.0.0.1:3000/webhooks/payments';

try {
  const fake = await startPaymentsFake({
    port,
    host: env.PAYMENTS_FAKE_HOST || '127.0.0.1',
    publicUrl: env.PAYMENTS_FAKE_PUBLIC_URL || undefined,
    webhookUrl: webhookUrl === '' ? null : webhookUrl,
    webhookSecret: env.PAYMENTS_WEBHOOK_SECRET || DEFAULT_WEBHOOK_SECRET,
    retryDelaysMs: readDelays(env.PAYMENTS_WEBHOOK_RETRY_DELAYS_MS),
    stateFile: env.PAYMENTS_FAKE_STATE_FILE || undefined,
  });
  console.log(`[payments fake] listening on ${fake.url} (API ${fake.url}/v1, admin ${fake.url}/__admin/state)`);
  if (env.PAYMENTS_FAKE_STATE_FILE) {
    console.log(`[payments fake] state kept in ${env.PAYMENTS_FAKE_STATE_FILE}${fake.restored ? ` (restored ${fake.runtime.store.sessions.size} sessions)` : ' (new)'}`);
  }
  console.log(`[payments fake] webhooks → ${webhookUrl || 'nowhere (PAYMENTS_WEBHOOK_URL is empty)'}`);
  const stop = () => {
    void fake.close().finally(() => process.exit(0));
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
} catch (error) {
  if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
    fail(`port ${port} is already in use (payments fake) — set PAYMENTS_FAKE_PORT`);
  }
  throw error;
}
