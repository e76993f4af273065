import { createHmac } from 'node:crypto';
import { newId } from './ids.js';
import type { StripeEvent } from './types.js';

/** How events are handed to the endpoint; tests switch these to provoke the awkward cases. */
export interface DeliveryMode {
  /** Deliver each event this many times. */
  copies: number;
  /** Send the copies of an event at the same moment instead of one after another. */
  concurrent: boolean;
  /** Shuffle the order of each batch of events (those one action produces together). */
  shuffle: boolean;
  /** Wait this long before every attempt. */
  delayMs: number;
  /** The next N attempts count as failed whatever the endpoint answers (they are still sent), so they are retried. */
  failFirst: number;
  /** Sign with a secret that is not the endpoint's. */
  wrongSecret: boolean;
  /** Sign with a timestamp `staleSeconds` in the past. */
  staleTimestamp: boolean;
  staleSeconds: number;
  /** Record events but deliver none. */
  drop: boolean;
}

export interface WebhookEndpoint {
  url: string | null;
  secret: string;
}

export interface DeliveryRecord {
  id: string;
  eventId: string;
  eventType: string;
  /** 1-based copy number (see `copies`). */
  copy: number;
  /** 1-based attempt number for this copy. */
  attempt: number;
  url: string | null;
  at: string;
  outcome: 'delivered' | 'failed' | 'dropped';
  httpStatus: number | null;
  error: string | null;
  /** Counted as failed by `failFirst`, whatever the endpoint answered. */
  forcedFailure: boolean;
  signature: { header: string; timestamp: number; secret: 'endpoint' | 'wrong'; stale: boolean } | null;
  durationMs: number;
  /** Delay before the next attempt, or null when none follows. */
  nextRetryInMs: number | null;
  gaveUp: boolean;
}

export const DEFAULT_RETRY_DELAYS_MS: readonly number[] = [1000, 2000, 4000, 8000];
export const WRONG_SECRET = 'whsec_this_is_not_the_endpoint_secret';
const ATTEMPT_TIMEOUT_MS = 10_000;
const LOG_LIMIT = 5000;

export function defaultDeliveryMode(): DeliveryMode {
  return {
    copies: 1,
    concurrent: false,
    shuffle: false,
    delayMs: 0,
    failFirst: 0,
    wrongSecret: false,
    staleTimestamp: false,
    staleSeconds: 600,
    drop: false,
  };
}

/** `t=<unix>,v1=<hex HMAC-SHA256(secret, "<t>.<payload>")>`, the header receivers verify. */
export function signatureHeader(payload: string, secret: string, timestamp: number): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

function shuffled<T>(items: T[]): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i -= 1) {
    const j = Math.floor(Math.random() * (i + 1));
    [out[i], out[j]] = [out[j] as T, out[i] as T];
  }
  return out;
}

function describe(error: unknown): string {
  if (error instanceof Error) {
    const cause = (error as { cause?: { code?: string; message?: string } }).cause;
    return cause?.code ?? cause?.message ?? error.message;
  }
  return String(error);
}

/**
 * Posts events to the configured endpoint, signed, retrying failures on the
 * schedule in `retryDelaysMs`, and keeps a log of every attempt.
 */
export class WebhookDispatcher {
  private endpoint: WebhookEndpoint;
  private mode = defaultDeliveryMode();
  private retryDelays: number[];
  private forcedFailuresLeft = 0;
  private readonly records: DeliveryRecord[] = [];
  private queue: StripeEvent[] = [];
  private flushHandle: NodeJS.Immediate | null = null;
  private chain: Promise<void> = Promise.resolve();
  private busy = 0;
  private idleWaiters: (() => void)[] = [];
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly controllers = new Set<AbortController>();
  /** Bumped by reset/close so work started before it stops counting. */
  private generation = 0;

  constructor(
    private readonly initial: { endpoint: WebhookEndpoint; retryDelaysMs: readonly number[] },
    private readonly onSettled: (eventId: string) => void = () => {},
  ) {
    this.endpoint = { ...initial.endpoint };
    this.retryDelays = [...initial.retryDelaysMs];
  }

  getEndpoint(): WebhookEndpoint {
    return { ...this.endpoint };
  }

  setEndpoint(endpoint: Partial<WebhookEndpoint>): WebhookEndpoint {
    this.endpoint = { ...this.endpoint, ...endpoint };
    return this.getEndpoint();
  }

  getRetryDelays(): number[] {
    return [...this.retryDelays];
  }

  setRetryDelays(delays: readonly number[]): void {
    this.retryDelays = [...delays];
  }

  getMode(): DeliveryMode & { forcedFailuresLeft: number } {
    return { ...this.mode, forcedFailuresLeft: this.forcedFailuresLeft };
  }

  setMode(changes: Partial<DeliveryMode>): DeliveryMode & { forcedFailuresLeft: number } {
    this.mode = { ...this.mode, ...changes };
    if (changes.failFirst !== undefined) this.forcedFailuresLeft = changes.failFirst;
    return this.getMode();
  }

  resetMode(): void {
    this.mode = defaultDeliveryMode();
    this.forcedFailuresLeft = 0;
  }

  deliveries(): DeliveryRecord[] {
    return this.records.map((record) => ({ ...record }));
  }

  clearLog(): void {
    this.records.length = 0;
  }

  /** Whether events would be sent anywhere now. */
  get active(): boolean {
    return this.endpoint.url !== null;
  }

  /** Queues an event; events queued in the same turn form one batch. */
  enqueue(event: StripeEvent): void {
    if (!this.active) return;
    this.queue.push(event);
    if (this.flushHandle) return;
    this.busy += 1;
    const generation = this.generation;
    this.flushHandle = setImmediate(() => {
      this.flushHandle = null;
      const batch = this.mode.shuffle ? shuffled(this.queue) : this.queue;
      this.queue = [];
      this.chain = this.chain
        .then(() => this.deliverBatch(batch, generation))
        .catch((error: unknown) => console.error('[payments fake] webhook batch failed', error))
        .finally(() => this.done(generation));
    });
  }

  /** Resolves once nothing is queued, in flight or waiting to be retried. */
  idle(): Promise<void> {
    if (this.busy === 0) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  reset(): void {
    this.stop();
    this.endpoint = { ...this.initial.endpoint };
    this.retryDelays = [...this.initial.retryDelaysMs];
    this.resetMode();
    this.clearLog();
  }

  /** Stops all delivery work: timers cleared, requests aborted. */
  stop(): void {
    this.generation += 1;
    if (this.flushHandle) clearImmediate(this.flushHandle);
    this.flushHandle = null;
    this.queue = [];
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    for (const controller of this.controllers) controller.abort();
    this.controllers.clear();
    this.chain = Promise.resolve();
    this.busy = 0;
    this.wakeIdle();
  }

  private done(generation: number): void {
    if (generation !== this.generation) return;
    this.busy -= 1;
    if (this.busy === 0) this.wakeIdle();
  }

  private wakeIdle(): void {
    const waiters = this.idleWaiters;
    this.idleWaiters = [];
    for (const wake of waiters) wake();
  }

  private async deliverBatch(batch: StripeEvent[], generation: number): Promise<void> {
    for (const event of batch) {
      if (generation !== this.generation) return;
      await this.deliverEvent(event, generation);
    }
  }

  private async deliverEvent(event: StripeEvent, generation: number): Promise<void> {
    if (this.mode.drop) {
      this.record(event, 1, 1, { outcome: 'dropped', url: this.endpoint.url });
      this.onSettled(event.id);
      return;
    }
    const copies = Array.from({ length: Math.max(1, this.mode.copies) }, (_, i) => i + 1);
    if (this.mode.concurrent) {
      await Promise.all(copies.map((copy) => this.attempt(event, copy, 1, generation)));
    } else {
      for (const copy of copies) await this.attempt(event, copy, 1, generation);
    }
  }

  private wait(ms: number): Promise<void> {
    return new Promise((resolve) => {
      const timer = setTimeout(() => {
        this.timers.delete(timer);
        resolve();
      }, ms);
      this.timers.add(timer);
    });
  }

  private async attempt(event: StripeEvent, copy: number, attempt: number, generation: number): Promise<void> {
    this.busy += 1;
    try {
      if (this.mode.delayMs > 0) await this.wait(this.mode.delayMs);
      if (generation !== this.generation) return;
      await this.send(event, copy, attempt, generation);
    } finally {
      this.done(generation);
    }
  }

  private async send(event: StripeEvent, copy: number, attempt: number, generation: number): Promise<void> {
    const url = this.endpoint.url;
    const payload = JSON.stringify(event, null, 2);
    const stale = this.mode.staleTimestamp;
    const wrong = this.mode.wrongSecret;
    const timestamp = Math.floor(Date.now() / 1000) - (stale ? this.mode.staleSeconds : 0);
    const header = signatureHeader(payload, wrong ? WRONG_SECRET : this.endpoint.secret, timestamp);
    const signature = { header, timestamp, secret: wrong ? ('wrong' as const) : ('endpoint' as const), stale };

    const started = Date.now();
    let httpStatus: number | null = null;
    let error: string | null = null;
    if (url === null) {
      error = 'no webhook endpoint is configured';
    } else {
      const controller = new AbortController();
      this.controllers.add(controller);
      const timeout = setTimeout(() => controller.abort(new Error('timed out')), ATTEMPT_TIMEOUT_MS);
      try {
        const response = await fetch(url, {
          method: 'POST',
          headers: {
            'Content-Type': 'application/json; charset=utf-8',
            'Stripe-Signature': header,
            'User-Agent': 'fryline-payments-fake/1.0 (webhooks)',
          },
          body: payload,
          signal: controller.signal,
        });
        httpStatus = response.status;
        await response.arrayBuffer().catch(() => undefined);
      } catch (caught) {
        error = describe(caught);
      } finally {
        clearTimeout(timeout);
        this.controllers.delete(controller);
      }
    }
    if (generation !== this.generation) return;

    const answeredOk = httpStatus !== null && httpStatus >= 200 && httpStatus < 300;
    const forcedFailure = this.forcedFailuresLeft > 0;
    if (forcedFailure) this.forcedFailuresLeft -= 1;
    const delivered = answeredOk && !forcedFailure;
    const retryDelay = !delivered && url !== null ? this.retryDelays[attempt - 1] : undefined;
    this.record(event, copy, attempt, {
      url,
      outcome: delivered ? 'delivered' : 'failed',
      httpStatus,
      error,
      forcedFailure,
      signature,
      durationMs: Date.now() - started,
      nextRetryInMs: retryDelay ?? null,
      gaveUp: !delivered && retryDelay === undefined,
    });
    if (retryDelay !== undefined) {
      this.scheduleRetry(event, copy, attempt + 1, retryDelay, generation);
    } else if (copy === 1) {
      this.onSettled(event.id);
    }
  }

  private scheduleRetry(event: StripeEvent, copy: number, attempt: number, delay: number, generation: number): void {
    this.busy += 1;
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      void this.attempt(event, copy, attempt, generation).finally(() => this.done(generation));
    }, delay);
    this.timers.add(timer);
  }

  private record(event: StripeEvent, copy: number, attempt: number, details: Partial<DeliveryRecord>): void {
    this.records.push({
      id: newId('whdel_', 16),
      eventId: event.id,
      eventType: event.type,
      copy,
      attempt,
      url: null,
      at: new Date().toISOString(),
      outcome: 'failed',
      httpStatus: null,
      error: null,
      forcedFailure: false,
      signature: null,
      durationMs: 0,
      nextRetryInMs: null,
      gaveUp: false,
      ...details,
    });
    if (this.records.length > LOG_LIMIT) this.records.splice(0, this.records.length - LOG_LIMIT);
  }
}
