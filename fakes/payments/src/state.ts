import { FakeClock } from './clock.js';
import { newId } from './ids.js';
import type {
  BalanceTransaction,
  CardDetails,
  Charge,
  CheckoutSession,
  EventRequest,
  EventType,
  LineItem,
  Metadata,
  PaymentIntent,
  Refund,
  StripeEvent,
} from './types.js';

/** The API version reported in events when no client has told us theirs yet. */
export const DEFAULT_API_VERSION = '2026-10-28.endive';

/** A set of objects of one kind, kept in creation order. */
export class Collection<T extends { id: string }> {
  private readonly items = new Map<string, T>();

  add(item: T): T {
    this.items.set(item.id, item);
    return item;
  }

  get(id: string): T | undefined {
    return this.items.get(id);
  }

  /** Newest first, the order the service lists in. */
  newestFirst(): T[] {
    return [...this.items.values()].reverse();
  }

  get size(): number {
    return this.items.size;
  }

  clear(): void {
    this.items.clear();
  }

  /** Every item, oldest first (the order `restore` expects). */
  all(): T[] {
    return [...this.items.values()];
  }

  restore(items: readonly T[]): void {
    this.items.clear();
    for (const item of items) this.items.set(item.id, item);
  }
}

/** Everything the store holds, as plain JSON (see persistence.ts). */
export interface StoreSnapshot {
  version: 1;
  clockOffsetSeconds: number;
  apiVersion: string;
  sessions: CheckoutSession[];
  sessionInternals: Array<[string, SessionInternals]>;
  paymentIntents: PaymentIntent[];
  charges: Charge[];
  refunds: Refund[];
  balanceTransactions: BalanceTransaction[];
  events: StripeEvent[];
}

/** What a card attempt is waiting on when the issuer asked for an extra confirmation. */
export interface PendingAuthentication {
  paymentIntentId: string;
  card: CardDetails;
  name: string | null;
  email: string | null;
}

/** Session facts that are not part of the public object. */
export interface SessionInternals {
  lineItems: LineItem[];
  /** The payment intent behind the attempts; public on the session once paid. */
  paymentIntentId: string | null;
  pendingAuthentication: PendingAuthentication | null;
  paymentIntentData: { metadata: Metadata; description: string | null };
}

export type EventListener = (event: StripeEvent) => void;

export interface EmitOptions {
  request?: EventRequest;
  previousAttributes?: Record<string, unknown>;
}

const NO_REQUEST: EventRequest = { id: null, idempotency_key: null };

/** All objects the fake holds, its clock, and the event stream. */
export class PaymentsStore {
  readonly clock = new FakeClock();
  readonly sessions = new Collection<CheckoutSession>();
  readonly sessionInternals = new Map<string, SessionInternals>();
  readonly paymentIntents = new Collection<PaymentIntent>();
  readonly charges = new Collection<Charge>();
  readonly refunds = new Collection<Refund>();
  readonly balanceTransactions = new Collection<BalanceTransaction>();
  readonly events = new Collection<StripeEvent>();
  /** The version the last API client announced (`Stripe-Version`), stamped on events. */
  apiVersion = DEFAULT_API_VERSION;
  /** How many endpoints an event waits on, reported as `pending_webhooks`. */
  pendingWebhooks: () => number = () => 0;
  private readonly listeners = new Set<EventListener>();

  onEvent(listener: EventListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Records an event with a snapshot of the object as it is now, and hands it to the listeners. */
  emit(type: EventType, object: unknown, opts: EmitOptions = {}): StripeEvent {
    const event: StripeEvent = {
      id: newId('evt_'),
      object: 'event',
      api_version: this.apiVersion,
      created: this.clock.now(),
      data: {
        object: structuredClone(object),
        ...(opts.previousAttributes ? { previous_attributes: opts.previousAttributes } : {}),
      },
      livemode: false,
      pending_webhooks: this.pendingWebhooks(),
      request: opts.request ?? NO_REQUEST,
      type,
    };
    this.events.add(event);
    for (const listener of this.listeners) listener(event);
    return event;
  }

  internalsOf(session: CheckoutSession): SessionInternals {
    const internals = this.sessionInternals.get(session.id);
    if (!internals) throw new Error(`session ${session.id} has no internal record`);
    return internals;
  }

  /** Looks an object up by the prefix of its id, for expansion. */
  findById(id: string): unknown {
    if (id.startsWith('cs_')) return this.sessions.get(id);
    if (id.startsWith('pi_')) return this.paymentIntents.get(id);
    if (id.startsWith('ch_')) return this.charges.get(id);
    if (id.startsWith('re_')) return this.refunds.get(id);
    if (id.startsWith('txn_')) return this.balanceTransactions.get(id);
    if (id.startsWith('evt_')) return this.events.get(id);
    return undefined;
  }

  summary(): Record<string, number> {
    return {
      now: this.clock.now(),
      clockOffsetSeconds: this.clock.offsetSeconds,
      sessions: this.sessions.size,
      paymentIntents: this.paymentIntents.size,
      charges: this.charges.size,
      refunds: this.refunds.size,
      balanceTransactions: this.balanceTransactions.size,
      events: this.events.size,
    };
  }

  snapshot(): StoreSnapshot {
    return {
      version: 1,
      clockOffsetSeconds: this.clock.offsetSeconds,
      apiVersion: this.apiVersion,
      sessions: this.sessions.all(),
      sessionInternals: [...this.sessionInternals],
      paymentIntents: this.paymentIntents.all(),
      charges: this.charges.all(),
      refunds: this.refunds.all(),
      balanceTransactions: this.balanceTransactions.all(),
      events: this.events.all(),
    };
  }

  restore(snapshot: StoreSnapshot): void {
    this.clock.reset();
    this.clock.advance(Math.max(0, Math.floor(snapshot.clockOffsetSeconds)));
    this.apiVersion = snapshot.apiVersion;
    this.sessions.restore(snapshot.sessions);
    this.sessionInternals.clear();
    for (const [id, internals] of snapshot.sessionInternals) this.sessionInternals.set(id, internals);
    this.paymentIntents.restore(snapshot.paymentIntents);
    this.charges.restore(snapshot.charges);
    this.refunds.restore(snapshot.refunds);
    this.balanceTransactions.restore(snapshot.balanceTransactions);
    this.events.restore(snapshot.events);
  }

  reset(): void {
    this.clock.reset();
    this.sessions.clear();
    this.sessionInternals.clear();
    this.paymentIntents.clear();
    this.charges.clear();
    this.refunds.clear();
    this.balanceTransactions.clear();
    this.events.clear();
    this.apiVersion = DEFAULT_API_VERSION;
  }
}
