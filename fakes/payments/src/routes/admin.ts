import express, { Router, type ErrorRequestHandler, type Response } from 'express';
import { finishAuthentication, payWithCard, type PayOutcome } from '../card-payments.js';
import type { PaymentsRuntime } from '../runtime.js';
import type { DeliveryMode, WebhookEndpoint } from '../webhooks.js';

/** Bad input to an admin route: 400 with a message, nothing changed. */
class AdminInputError extends Error {}

type Json = Record<string, unknown>;

function integer(body: Json, key: string, min: number, max: number): number | undefined {
  const value = body[key];
  if (value === undefined) return undefined;
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) {
    throw new AdminInputError(`${key} must be a whole number from ${min} to ${max}`);
  }
  return value;
}

function flag(body: Json, key: string): boolean | undefined {
  const value = body[key];
  if (value === undefined) return undefined;
  if (typeof value !== 'boolean') throw new AdminInputError(`${key} must be true or false`);
  return value;
}

function onlyKeys(body: Json, allowed: readonly string[]): void {
  const unknown = Object.keys(body).filter((key) => !allowed.includes(key));
  if (unknown.length > 0) throw new AdminInputError(`unknown field(s): ${unknown.join(', ')}; allowed: ${allowed.join(', ')}`);
}

function httpUrl(value: unknown, key: string): string {
  if (typeof value === 'string') {
    try {
      const url = new URL(value);
      if (url.protocol === 'http:' || url.protocol === 'https:') return value;
    } catch {
      // falls through to the error below
    }
  }
  throw new AdminInputError(`${key} must be an absolute http(s) URL or null`);
}

function readDelays(value: unknown): number[] | undefined {
  if (value === undefined) return undefined;
  if (!Array.isArray(value) || value.length > 20 || !value.every((ms) => Number.isInteger(ms) && ms >= 0 && ms <= 3_600_000)) {
    throw new AdminInputError('retryDelaysMs must be a list of up to 20 whole milliseconds (0 to 3600000)');
  }
  return value as number[];
}

function readMode(body: Json): Partial<DeliveryMode> {
  onlyKeys(body, ['copies', 'concurrent', 'shuffle', 'delayMs', 'failFirst', 'wrongSecret', 'staleTimestamp', 'staleSeconds', 'drop']);
  const mode: Partial<DeliveryMode> = {
    copies: integer(body, 'copies', 1, 20),
    delayMs: integer(body, 'delayMs', 0, 60_000),
    failFirst: integer(body, 'failFirst', 0, 1000),
    staleSeconds: integer(body, 'staleSeconds', 1, 7 * 86_400),
    concurrent: flag(body, 'concurrent'),
    shuffle: flag(body, 'shuffle'),
    wrongSecret: flag(body, 'wrongSecret'),
    staleTimestamp: flag(body, 'staleTimestamp'),
    drop: flag(body, 'drop'),
  };
  return Object.fromEntries(Object.entries(mode).filter(([, value]) => value !== undefined));
}

function readEndpoint(body: Json): Partial<WebhookEndpoint> {
  const endpoint: Partial<WebhookEndpoint> = {};
  if (body.url !== undefined) endpoint.url = body.url === null ? null : httpUrl(body.url, 'url');
  if (body.secret !== undefined) {
    if (typeof body.secret !== 'string' || body.secret.trim() === '') throw new AdminInputError('secret must be a non-empty string');
    endpoint.secret = body.secret;
  }
  return endpoint;
}

function optionalText(body: Json, key: string): string | undefined {
  const value = body[key];
  if (value === undefined) return undefined;
  if (typeof value !== 'string') throw new AdminInputError(`${key} must be a string`);
  return value;
}

function sendOutcome(res: Response, outcome: PayOutcome): void {
  switch (outcome.kind) {
    case 'paid':
      res.json({
        outcome: 'paid',
        redirectUrl: outcome.redirectUrl,
        session: outcome.session,
        payment_intent: outcome.paymentIntent,
        charge: outcome.charge,
      });
      return;
    case 'declined':
      res.status(402).json({ outcome: 'declined', error: outcome.error, payment_intent: outcome.paymentIntent });
      return;
    case 'needs_authentication':
      res.status(202).json({ outcome: 'requires_action', payment_intent: outcome.paymentIntent });
      return;
    case 'not_payable': {
      const status = { missing: 404, expired: 410, complete: 409 }[outcome.reason];
      res.status(status).json({ outcome: 'not_payable', reason: outcome.reason, session: outcome.session ?? null });
    }
  }
}

const adminErrors: ErrorRequestHandler = (err: unknown, _req, res, _next) => {
  if (err instanceof AdminInputError) {
    res.status(400).json({ error: { message: err.message } });
    return;
  }
  const parser = err as { status?: number; message?: string };
  if (typeof parser?.status === 'number' && parser.status < 500) {
    res.status(parser.status).json({ error: { message: parser.message ?? 'bad request' } });
    return;
  }
  console.error('[payments fake] admin error', err);
  res.status(500).json({ error: { message: 'unexpected error in the payments fake' } });
};

/** Test controls under `/__admin` (JSON in, JSON out). */
export function adminRouter(runtime: PaymentsRuntime): Router {
  const { store, webhooks } = runtime;
  const router = Router();
  router.use(express.json({ limit: '64kb' }));
  const bodyOf = (req: express.Request): Json => {
    const body: unknown = req.body ?? {};
    if (typeof body !== 'object' || body === null || Array.isArray(body)) throw new AdminInputError('send a JSON object');
    return body as Json;
  };
  const endpointView = () => ({ ...webhooks.getEndpoint(), retryDelaysMs: webhooks.getRetryDelays() });

  router.get('/state', (_req, res) => {
    res.json({
      ...store.summary(),
      idempotencyKeys: runtime.idempotency.size,
      apiDelayMs: runtime.apiDelayMs,
      webhook: endpointView(),
      deliveryMode: webhooks.getMode(),
      deliveries: webhooks.deliveries().length,
    });
  });

  router.post('/reset', (_req, res) => {
    runtime.reset();
    res.json({ reset: true });
  });

  router.get('/webhook', (_req, res) => {
    res.json(endpointView());
  });

  router.post('/webhook', (req, res) => {
    const body = bodyOf(req);
    onlyKeys(body, ['url', 'secret', 'retryDelaysMs']);
    const endpoint = readEndpoint(body);
    const delays = readDelays(body.retryDelaysMs);
    webhooks.setEndpoint(endpoint);
    if (delays) webhooks.setRetryDelays(delays);
    res.json(endpointView());
  });

  router.get('/webhook/mode', (_req, res) => {
    res.json(webhooks.getMode());
  });

  router.post('/webhook/mode', (req, res) => {
    res.json(webhooks.setMode(readMode(bodyOf(req))));
  });

  router.delete('/webhook/mode', (_req, res) => {
    webhooks.resetMode();
    res.json(webhooks.getMode());
  });

  router.get('/deliveries', (req, res) => {
    const eventId = typeof req.query.eventId === 'string' ? req.query.eventId : undefined;
    const type = typeof req.query.type === 'string' ? req.query.type : undefined;
    const data = webhooks.deliveries().filter((d) => (!eventId || d.eventId === eventId) && (!type || d.eventType === type));
    res.json({ data });
  });

  router.delete('/deliveries', (_req, res) => {
    webhooks.clearLog();
    res.json({ data: [] });
  });

  router.post('/events/:id/redeliver', (req, res) => {
    const event = store.events.get(req.params.id);
    if (!event) {
      res.status(404).json({ error: { message: `no event ${req.params.id}` } });
      return;
    }
    webhooks.enqueue(event);
    res.status(202).json({ queued: event.id, active: webhooks.active });
  });

  router.get('/clock', (_req, res) => {
    res.json({ now: store.clock.now(), offsetSeconds: store.clock.offsetSeconds });
  });

  router.post('/clock/advance', (req, res) => {
    const body = bodyOf(req);
    onlyKeys(body, ['seconds']);
    const seconds = integer(body, 'seconds', 0, 366 * 86_400);
    if (seconds === undefined) throw new AdminInputError('seconds is required');
    const expiredSessions = runtime.advanceClock(seconds);
    res.json({ now: store.clock.now(), offsetSeconds: store.clock.offsetSeconds, expiredSessions });
  });

  router.post('/api-delay', (req, res) => {
    const body = bodyOf(req);
    onlyKeys(body, ['ms']);
    const ms = integer(body, 'ms', 0, 60_000);
    if (ms === undefined) throw new AdminInputError('ms is required');
    runtime.apiDelayMs = ms;
    res.json({ apiDelayMs: ms });
  });

  router.post('/api-failures', (req, res) => {
    const body = bodyOf(req);
    onlyKeys(body, ['count', 'path', 'mode']);
    const count = integer(body, 'count', 0, 1000) ?? 1;
    const path = optionalText(body, 'path') ?? '/';
    const mode = optionalText(body, 'mode') ?? 'before';
    if (!path.startsWith('/')) throw new AdminInputError('path must start with / (it is matched under /v1)');
    if (mode !== 'before' && mode !== 'after') throw new AdminInputError('mode must be before or after');
    runtime.apiFailures = { count, path, mode };
    res.json(runtime.apiFailures);
  });

  router.post('/sessions/:id/pay', (req, res) => {
    const body = bodyOf(req);
    onlyKeys(body, ['cardNumber', 'expiry', 'cvc', 'name', 'email', 'authentication']);
    const cardNumber = optionalText(body, 'cardNumber');
    if (cardNumber === undefined) throw new AdminInputError('cardNumber is required');
    const authentication = optionalText(body, 'authentication') ?? 'complete';
    if (!['complete', 'fail', 'pending'].includes(authentication)) {
      throw new AdminInputError('authentication must be complete, fail or pending');
    }
    const year = new Date(store.clock.now() * 1000).getUTCFullYear() + 5;
    const outcome = payWithCard(store, req.params.id, {
      cardNumber,
      expiry: optionalText(body, 'expiry') ?? `12/${String(year).slice(-2)}`,
      cvc: optionalText(body, 'cvc') ?? '123',
      name: optionalText(body, 'name'),
      email: optionalText(body, 'email'),
    });
    if (outcome.kind === 'needs_authentication' && authentication !== 'pending') {
      sendOutcome(res, finishAuthentication(store, req.params.id, authentication as 'complete' | 'fail'));
      return;
    }
    sendOutcome(res, outcome);
  });

  router.post('/sessions/:id/confirm', (req, res) => {
    const body = bodyOf(req);
    onlyKeys(body, ['result']);
    if (body.result !== 'complete' && body.result !== 'fail') throw new AdminInputError('result must be complete or fail');
    sendOutcome(res, finishAuthentication(store, req.params.id, body.result));
  });

  router.use(adminErrors);
  return router;
}
