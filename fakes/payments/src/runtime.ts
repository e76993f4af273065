import { catchUp } from './checkout.js';
import { IdempotencyStore } from './idempotency.js';
import { PaymentsStore } from './state.js';
import { WebhookDispatcher, type WebhookEndpoint } from './webhooks.js';

export interface RuntimeOptions {
  endpoint: WebhookEndpoint;
  retryDelaysMs: readonly number[];
}

/** Everything the fake keeps between requests, and the one way to reset it. */
export class PaymentsRuntime {
  readonly store = new PaymentsStore();
  readonly idempotency = new IdempotencyStore(this.store.clock);
  readonly webhooks: WebhookDispatcher;
  /** Extra wait before POST /v1 handlers run, to make in-flight duplicates observable. */
  apiDelayMs = 0;
  /**
   * The next `count` POSTs under `/v1<path>` fail: `before` answers 500 without doing
   * anything; `after` does the work (and remembers the answer for its idempotency key)
   * but drops the connection instead of answering, as a network failure would.
   */
  apiFailures: { count: number; path: string; mode: 'before' | 'after' } = { count: 0, path: '/', mode: 'before' };

  constructor(options: RuntimeOptions) {
    this.webhooks = new WebhookDispatcher(
      { endpoint: options.endpoint, retryDelaysMs: options.retryDelaysMs },
      (eventId) => {
        const event = this.store.events.get(eventId);
        if (event) event.pending_webhooks = Math.max(0, event.pending_webhooks - 1);
      },
    );
    this.store.pendingWebhooks = () => (this.webhooks.active ? 1 : 0);
    this.store.onEvent((event) => this.webhooks.enqueue(event));
  }

  /** Moves the fake's clock forward and applies what falls due (session expiry, settlement). */
  advanceClock(seconds: number): string[] {
    this.store.clock.advance(seconds);
    return catchUp(this.store);
  }

  reset(): void {
    this.webhooks.reset();
    this.store.reset();
    this.idempotency.clear();
    this.apiDelayMs = 0;
    this.apiFailures = { count: 0, path: '/', mode: 'before' };
  }
}
