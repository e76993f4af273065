import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { setTimeout as sleep } from 'node:timers/promises';
import express, { Router, type Express } from 'express';
import { apiKeyOf, requireTestKey } from './auth.js';
import { finishAuthentication, payWithCard, type PaymentForm, type PayOutcome } from './card-payments.js';
import { catchUp } from './checkout.js';
import { ApiError, apiErrorHandler, assignRequestId } from './errors.js';
import { payPageRouter } from './pay-page.js';
import { adminRouter } from './routes/admin.js';
import { eventsRouter } from './routes/events.js';
import { balanceTransactionsRouter, chargesRouter, paymentIntentsRouter } from './routes/payments.js';
import { refundsRouter } from './routes/refunds.js';
import { sessionsRouter } from './routes/sessions.js';
import { StateFile } from './persistence.js';
import { PaymentsRuntime } from './runtime.js';
import type { StripeEvent } from './types.js';
import { DEFAULT_RETRY_DELAYS_MS, type DeliveryMode, type DeliveryRecord } from './webhooks.js';

/** `/v1`: the card payment API as the official SDK calls it. */
function apiRouter(runtime: PaymentsRuntime, publicUrl: () => string): Router {
  const { store } = runtime;
  const api = Router();
  api.use(assignRequestId);
  api.use((req, res, next) => {
    const version = req.get('Stripe-Version');
    if (version) store.apiVersion = version;
    res.set('Stripe-Version', version ?? store.apiVersion);
    next();
  });
  api.use(requireTestKey);
  api.use(express.urlencoded({ extended: true, parameterLimit: 2000, limit: '1mb' }));
  api.use((_req, _res, next) => {
    catchUp(store);
    next();
  });
  api.use((req, res, next) => {
    const failures = runtime.apiFailures;
    if (req.method !== 'POST' || failures.count <= 0 || !req.path.startsWith(failures.path)) return next();
    failures.count -= 1;
    if (failures.mode === 'before') {
      throw new ApiError(500, { type: 'api_error', message: 'An error occurred with our connection to the payments network (injected by the fake).' }, true);
    }
    res.json = () => {
      res.socket?.destroy();
      return res;
    };
    next();
  });
  api.use(runtime.idempotency.middleware(apiKeyOf));
  api.use(async (req, _res, next) => {
    if (req.method === 'POST' && runtime.apiDelayMs > 0) await sleep(runtime.apiDelayMs);
    next();
  });
  api.use('/checkout/sessions', sessionsRouter(store, publicUrl));
  api.use('/payment_intents', paymentIntentsRouter(store));
  api.use('/charges', chargesRouter(store));
  api.use('/refunds', refundsRouter(store));
  api.use('/events', eventsRouter(store));
  api.use('/balance_transactions', balanceTransactionsRouter(store));
  api.use((req) => {
    throw new ApiError(
      404,
      { type: 'invalid_request_error', message: `Unrecognized request URL (${req.method}: ${req.originalUrl.split('?')[0]}).` },
      true,
    );
  });
  api.use(apiErrorHandler);
  return api;
}

export function createApp(runtime: PaymentsRuntime, publicUrl: () => string, onChange: () => void = () => {}): Express {
  const app = express();
  app.set('query parser', 'extended');
  app.set('etag', false);
  app.disable('x-powered-by');
  // any request may change state (reads catch up on expiries too): save after each
  app.use((_req, res, next) => {
    res.on('finish', onChange);
    next();
  });
  app.use('/v1', apiRouter(runtime, publicUrl));
  app.use('/pay', payPageRouter(runtime.store));
  app.use('/__admin', adminRouter(runtime));
  app.get('/', (_req, res) => {
    res.json({
      service: 'payments fake',
      api: `${publicUrl()}/v1`,
      payPage: `${publicUrl()}/pay/<session id>`,
      admin: `${publicUrl()}/__admin/state`,
    });
  });
  return app;
}

/** Listens, turning "address in use" into a plain message. */
export function listen(server: Server, port: number, host: string): Promise<AddressInfo> {
  return new Promise((resolve, reject) => {
    const onError = (error: NodeJS.ErrnoException) => {
      if (error.code === 'EADDRINUSE') {
        reject(Object.assign(new Error(`port ${port} is already in use (payments fake)`), { code: 'EADDRINUSE', port }));
      } else {
        reject(error);
      }
    };
    server.once('error', onError);
    server.listen(port, host, () => {
      server.off('error', onError);
      resolve(server.address() as AddressInfo);
    });
  });
}

export function urlFor(host: string, port: number): string {
  return `http://${host.includes(':') ? `[${host}]` : host}:${port}`;
}

export interface PaymentsFakeOptions {
  /** 0 (the default) picks a free port. */
  port?: number;
  /** Defaults to 127.0.0.1. */
  host?: string;
  /** Base of the hosted pay page links in `session.url`; defaults to the fake's own URL. */
  publicUrl?: string;
  /** Where events are posted; without it events are only recorded (and listed by `/v1/events`). */
  webhookUrl?: string | null;
  /** Signing secret; defaults to `whsec_fryline_local`. */
  webhookSecret?: string;
  /** Waits between delivery attempts of a failed event; defaults to 1, 2, 4 and 8 seconds. */
  retryDelaysMs?: number[];
  /** A JSON file the state is kept in (loaded at start, rewritten atomically after each change); none keeps it in memory only. */
  stateFile?: string;
}

export interface PaymentsFake {
  /** Base URL, e.g. `http://127.0.0.1:3102`; the API is under `/v1`. */
  url: string;
  port: number;
  host: string;
  publicUrl: string;
  /** The store, webhook dispatcher and idempotency keys behind the fake. */
  runtime: PaymentsRuntime;
  /** Whether state was loaded from `stateFile` at start. */
  restored: boolean;
  close(): Promise<void>;
  /** Forgets every object, event, key and delivery; restores the start options. */
  reset(): void;
  /** Unix seconds on the fake's clock. */
  now(): number;
  /** Moves the fake's clock forward; returns the ids of sessions that expired. */
  advanceClock(seconds: number): string[];
  setWebhookEndpoint(url: string | null, secret?: string): void;
  setDeliveryMode(mode: Partial<DeliveryMode>): DeliveryMode;
  resetDeliveryMode(): void;
  deliveries(): DeliveryRecord[];
  /** Resolves once no webhook is queued, in flight or waiting for a retry. */
  webhooksIdle(): Promise<void>;
  /** Every event so far, newest first. */
  events(): StripeEvent[];
  /** Pays a session as the checkout page would (the extra confirmation step, if any, is completed). */
  paySession(sessionId: string, form: PaymentForm): PayOutcome;
}

export const DEFAULT_WEBHOOK_SECRET = 'whsec_fryline_local';
const SWEEP_INTERVAL_MS = 1000;

export async function startPaymentsFake(options: PaymentsFakeOptions = {}): Promise<PaymentsFake> {
  const host = options.host ?? '127.0.0.1';
  const runtime = new PaymentsRuntime({
    endpoint: { url: options.webhookUrl ?? null, secret: options.webhookSecret ?? DEFAULT_WEBHOOK_SECRET },
    retryDelaysMs: options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS,
  });
  const stateFile = options.stateFile ? new StateFile(options.stateFile, runtime) : null;
  const restored = stateFile?.load() ?? false;
  const changed = () => stateFile?.changed();
  runtime.store.onEvent(changed);
  let publicUrl = options.publicUrl?.replace(/\/+$/, '') ?? '';
  const server = createServer(createApp(runtime, () => publicUrl, changed));
  const address = await listen(server, options.port ?? 0, host);
  const url = urlFor(host, address.port);
  publicUrl ||= url;

  const sweeper = setInterval(() => {
    try {
      catchUp(runtime.store);
    } catch (error) {
      console.error('[payments fake] sweep failed', error);
    }
  }, SWEEP_INTERVAL_MS);
  sweeper.unref();

  return {
    url,
    port: address.port,
    host,
    publicUrl,
    runtime,
    restored,
    close: async () => {
      await new Promise<void>((resolve, reject) => {
        clearInterval(sweeper);
        runtime.webhooks.stop();
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      });
      await stateFile?.close();
    },
    reset: () => {
      runtime.reset();
      changed();
    },
    now: () => runtime.store.clock.now(),
    advanceClock: (seconds) => {
      const expired = runtime.advanceClock(seconds);
      changed();
      return expired;
    },
    setWebhookEndpoint: (webhookUrl, secret) => {
      runtime.webhooks.setEndpoint({ url: webhookUrl, ...(secret === undefined ? {} : { secret }) });
    },
    setDeliveryMode: (mode) => runtime.webhooks.setMode(mode),
    resetDeliveryMode: () => runtime.webhooks.resetMode(),
    deliveries: () => runtime.webhooks.deliveries(),
    webhooksIdle: () => runtime.webhooks.idle(),
    events: () => runtime.store.events.newestFirst(),
    paySession: (sessionId, form) => {
      const outcome = payWithCard(runtime.store, sessionId, form);
      changed();
      return outcome.kind === 'needs_authentication' ? finishAuthentication(runtime.store, sessionId, 'complete') : outcome;
    },
  };
}
