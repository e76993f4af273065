import { paramError, stateError } from './errors.js';
import { newId } from './ids.js';
import { isKnownCurrency } from './money.js';
import {
  joinParam,
  readArray,
  readEnum,
  readHash,
  readInteger,
  readMetadata,
  readString,
  rejectUnknown,
  requireHash,
  requireInteger,
  requireString,
  type Params,
} from './params.js';
import type { PaymentsStore } from './state.js';
import type { CheckoutSession, EventRequest, LineItem } from './types.js';

const SESSION_PARAMS = [
  'mode',
  'line_items',
  'success_url',
  'cancel_url',
  'expires_at',
  'metadata',
  'client_reference_id',
  'customer_email',
  'payment_intent_data',
  'payment_method_types',
  'locale',
  'ui_mode',
  'expand',
] as const;

export const MIN_LIFETIME_SECONDS = 30 * 60;
export const MAX_LIFETIME_SECONDS = 24 * 60 * 60;
/** Slack for the second that ticks between a client computing `expires_at` and the fake reading it. */
const EXPIRY_GRACE_SECONDS = 5;
const MAX_LINE_ITEMS = 100;
const MAX_AMOUNT = 99_999_999;
/** The smallest charge in US dollars is 50 cents. */
const USD_MINIMUM = 50;
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function readUrl(params: Params, name: string, required: boolean): string | null {
  const value = required ? requireString(params, name, name, { maxLength: 5000 }) : readString(params, name, name, { maxLength: 5000 });
  if (value === undefined) return null;
  let parsed: URL;
  try {
    parsed = new URL(value);
  } catch {
    throw paramError(`Not a valid URL: ${name} must be an absolute http or https address.`, name, 'url_invalid');
  }
  if (parsed.protocol !== 'http:' && parsed.protocol !== 'https:') {
    throw paramError(`Not a valid URL: ${name} must be an absolute http or https address.`, name, 'url_invalid');
  }
  return value;
}

interface LineItemInput {
  currency: string;
  unitAmount: number;
  quantity: number;
  name: string;
}

function readLineItem(raw: unknown, index: number): LineItemInput {
  const path = `line_items[${index}]`;
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw paramError(`Invalid ${path}: expected a hash.`, path);
  }
  const item = raw as Params;
  if (item.price !== undefined) {
    throw paramError(
      'Saved prices are not kept by the payments fake: describe each line with price_data instead.',
      joinParam(path, 'price'),
    );
  }
  rejectUnknown(item, ['price_data', 'quantity'], path);
  const pricePath = joinParam(path, 'price_data');
  const priceData = requireHash(item, 'price_data', pricePath);
  rejectUnknown(priceData, ['currency', 'unit_amount', 'product_data'], pricePath);
  const currencyPath = joinParam(pricePath, 'currency');
  const currency = requireString(priceData, 'currency', currencyPath).toLowerCase();
  if (!/^[a-z]{3}$/.test(currency) || !isKnownCurrency(currency)) {
    throw paramError(`Invalid currency: ${currency}.`, currencyPath);
  }
  const unitAmount = requireInteger(priceData, 'unit_amount', joinParam(pricePath, 'unit_amount'), { min: 0, max: MAX_AMOUNT });
  const productPath = joinParam(pricePath, 'product_data');
  const productData = requireHash(priceData, 'product_data', productPath);
  rejectUnknown(productData, ['name', 'description', 'metadata'], productPath);
  const name = requireString(productData, 'name', joinParam(productPath, 'name'), { maxLength: 250 });
  readString(productData, 'description', joinParam(productPath, 'description'));
  readMetadata(productData, 'metadata', joinParam(productPath, 'metadata'));
  const quantity = requireInteger(item, 'quantity', joinParam(path, 'quantity'), { min: 1, max: 999_999 });
  return { currency, unitAmount, quantity, name };
}

function buildLineItem(input: LineItemInput, created: number): LineItem {
  const amount = input.unitAmount * input.quantity;
  return {
    id: newId('li_'),
    object: 'item',
    amount_discount: 0,
    amount_subtotal: amount,
    amount_tax: 0,
    amount_total: amount,
    currency: input.currency,
    description: input.name,
    price: {
      id: newId('price_'),
      object: 'price',
      active: false,
      billing_scheme: 'per_unit',
      created,
      currency: input.currency,
      livemode: false,
      lookup_key: null,
      metadata: {},
      nickname: null,
      product: newId('prod_', 14),
      recurring: null,
      tax_behavior: 'unspecified',
      type: 'one_time',
      unit_amount: input.unitAmount,
      unit_amount_decimal: String(input.unitAmount),
    },
    quantity: input.quantity,
  };
}

function readLineItems(params: Params): LineItemInput[] {
  const raw = readArray(params, 'line_items');
  if (raw === undefined || raw.length === 0) {
    throw paramError('Missing required param: line_items. A payment session needs at least one line item.', 'line_items', 'parameter_missing');
  }
  if (raw.length > MAX_LINE_ITEMS) throw paramError(`Invalid line_items: at most ${MAX_LINE_ITEMS} items are allowed.`, 'line_items');
  const items = raw.map(readLineItem);
  const currencies = new Set(items.map((item) => item.currency));
  if (currencies.size > 1) {
    throw paramError(`All line items must use the same currency; got ${[...currencies].join(', ')}.`, 'line_items');
  }
  return items;
}

function readExpiry(params: Params, now: number): number {
  const expiresAt = readInteger(params, 'expires_at');
  if (expiresAt === undefined) return now + MAX_LIFETIME_SECONDS;
  if (expiresAt < now + MIN_LIFETIME_SECONDS - EXPIRY_GRACE_SECONDS) {
    throw paramError('The expires_at timestamp must be at least 30 minutes after the session is created.', 'expires_at');
  }
  if (expiresAt > now + MAX_LIFETIME_SECONDS + EXPIRY_GRACE_SECONDS) {
    throw paramError('The expires_at timestamp must be at most 24 hours after the session is created.', 'expires_at');
  }
  return expiresAt;
}

function readPaymentIntentData(params: Params): { metadata: Record<string, string>; description: string | null } {
  const data = readHash(params, 'payment_intent_data');
  if (!data) return { metadata: {}, description: null };
  rejectUnknown(data, ['metadata', 'description'], 'payment_intent_data');
  return {
    metadata: readMetadata(data, 'metadata', 'payment_intent_data[metadata]') ?? {},
    description: readString(data, 'description', 'payment_intent_data[description]', { maxLength: 1000 }) ?? null,
  };
}

function readPaymentMethodTypes(params: Params): void {
  const types = readArray(params, 'payment_method_types');
  types?.forEach((type, i) => {
    if (type !== 'card') throw paramError('The payments fake takes cards only.', `payment_method_types[${i}]`);
  });
}

/** Validates the create parameters and stores a new open session. */
export function createSession(store: PaymentsStore, params: Params, publicUrl: string): CheckoutSession {
  rejectUnknown(params, SESSION_PARAMS);
  const mode = readString(params, 'mode');
  if (mode === undefined) throw paramError('Missing required param: mode.', 'mode', 'parameter_missing');
  if (mode !== 'payment') throw paramError(`Invalid mode: only 'payment' is supported, got '${mode}'.`, 'mode');
  readEnum(params, 'ui_mode', ['hosted']);
  readPaymentMethodTypes(params);
  const lineItemInputs = readLineItems(params);
  const successUrl = readUrl(params, 'success_url', true) as string;
  const cancelUrl = readUrl(params, 'cancel_url', false);
  const now = store.clock.now();
  const expiresAt = readExpiry(params, now);
  const metadata = readMetadata(params) ?? {};
  const clientReferenceId = readString(params, 'client_reference_id', 'client_reference_id', { maxLength: 200 }) ?? null;
  const customerEmail = readString(params, 'customer_email', 'customer_email', { maxLength: 800 }) ?? null;
  if (customerEmail !== null && !EMAIL.test(customerEmail)) {
    throw paramError(`Invalid email address: ${customerEmail}`, 'customer_email', 'email_invalid');
  }
  const locale = readString(params, 'locale') ?? null;
  const paymentIntentData = readPaymentIntentData(params);

  const lineItems = lineItemInputs.map((input) => buildLineItem(input, now));
  const total = lineItems.reduce((sum, item) => sum + item.amount_total, 0);
  const currency = lineItems[0]?.currency ?? 'usd';
  if (total > MAX_AMOUNT) throw paramError(`The total amount must be at most ${MAX_AMOUNT}.`, 'line_items');
  if (currency === 'usd' && total < USD_MINIMUM) {
    throw paramError('The session total must add up to at least $0.50 usd.', 'line_items', 'amount_too_small');
  }

  const id = newId('cs_test_', 58);
  const session: CheckoutSession = {
    id,
    object: 'checkout.session',
    amount_subtotal: total,
    amount_total: total,
    cancel_url: cancelUrl,
    client_reference_id: clientReferenceId,
    created: now,
    currency,
    customer: null,
    customer_details: null,
    customer_email: customerEmail,
    expires_at: expiresAt,
    livemode: false,
    locale,
    metadata,
    mode: 'payment',
    payment_intent: null,
    payment_method_types: ['card'],
    payment_status: 'unpaid',
    status: 'open',
    success_url: successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: 'hosted',
    url: `${publicUrl}/pay/${id}`,
  };
  store.sessions.add(session);
  store.sessionInternals.set(id, { lineItems, paymentIntentId: null, pendingAuthentication: null, paymentIntentData });
  return session;
}

/** Closes an open session for good and announces it. */
export function expireSession(store: PaymentsStore, session: CheckoutSession, request?: EventRequest): CheckoutSession {
  if (session.status !== 'open') {
    throw stateError(
      `This Checkout Session can't be expired: its status is '${session.status}', and only open sessions can be expired.`,
    );
  }
  const now = store.clock.now();
  session.status = 'expired';
  session.url = null;
  const internals = store.internalsOf(session);
  internals.pendingAuthentication = null;
  const intent = internals.paymentIntentId ? store.paymentIntents.get(internals.paymentIntentId) : undefined;
  if (intent && intent.status !== 'succeeded' && intent.status !== 'canceled') {
    intent.status = 'canceled';
    intent.canceled_at = now;
    intent.cancellation_reason = 'abandoned';
    intent.next_action = null;
  }
  store.emit('checkout.session.expired', session, { request });
  return session;
}

/** Expires every open session whose `expires_at` has passed on the fake's clock. */
export function sweepExpiredSessions(store: PaymentsStore): string[] {
  const now = store.clock.now();
  const due = store.sessions
    .newestFirst()
    .reverse()
    .filter((session) => session.status === 'open' && session.expires_at <= now);
  for (const session of due) expireSession(store, session);
  return due.map((session) => session.id);
}

/** Marks balance transactions available once their `available_on` has passed. */
export function settleBalances(store: PaymentsStore): void {
  const now = store.clock.now();
  for (const txn of store.balanceTransactions.newestFirst()) {
    if (txn.status === 'pending' && txn.available_on <= now) txn.status = 'available';
  }
}

/** Brings time-driven state up to the fake's clock: expiries and settlement. */
export function catchUp(store: PaymentsStore): string[] {
  settleBalances(store);
  return sweepExpiredSessions(store);
}
