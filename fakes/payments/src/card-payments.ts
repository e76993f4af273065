import { catchUp } from './checkout.js';
import { newId } from './ids.js';
import { AVAILABLE_AFTER_SECONDS, processingFee } from './money.js';
import type { PaymentsStore, SessionInternals } from './state.js';
import { behaviourOf, parseCard, type CardInput } from './test-cards.js';
import type { CardDetails, Charge, CheckoutSession, PaymentError, PaymentIntent } from './types.js';

export interface PaymentForm extends CardInput {
  name?: string;
  email?: string;
}

export type NotPayableReason = 'missing' | 'expired' | 'complete';

export type PayOutcome =
  | { kind: 'paid'; session: CheckoutSession; paymentIntent: PaymentIntent; charge: Charge; redirectUrl: string }
  /** `paymentIntent` is null when the form was refused before anything reached the card network. */
  | { kind: 'declined'; session: CheckoutSession; error: PaymentError; paymentIntent: PaymentIntent | null }
  | { kind: 'needs_authentication'; session: CheckoutSession; paymentIntent: PaymentIntent }
  | { kind: 'not_payable'; session: CheckoutSession | undefined; reason: NotPayableReason };

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

interface Payer {
  card: CardDetails;
  name: string | null;
  email: string | null;
}

type Payable = { ok: true; session: CheckoutSession; internals: SessionInternals } | { ok: false; outcome: PayOutcome };

function payable(store: PaymentsStore, sessionId: string): Payable {
  catchUp(store);
  const session = store.sessions.get(sessionId);
  if (!session) return { ok: false, outcome: { kind: 'not_payable', session, reason: 'missing' } };
  if (session.status !== 'open') return { ok: false, outcome: { kind: 'not_payable', session, reason: session.status } };
  return { ok: true, session, internals: store.internalsOf(session) };
}

/** The session's payment intent, created on the first attempt. */
function intentFor(store: PaymentsStore, session: CheckoutSession, internals: SessionInternals): PaymentIntent {
  const existing = internals.paymentIntentId ? store.paymentIntents.get(internals.paymentIntentId) : undefined;
  if (existing) return existing;
  const id = newId('pi_');
  const intent: PaymentIntent = {
    id,
    object: 'payment_intent',
    amount: session.amount_total,
    amount_capturable: 0,
    amount_received: 0,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic',
    client_secret: `${id}_secret_${newId('', 25)}`,
    confirmation_method: 'automatic',
    created: store.clock.now(),
    currency: session.currency,
    customer: null,
    description: internals.paymentIntentData.description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: { ...internals.paymentIntentData.metadata },
    next_action: null,
    payment_method: null,
    payment_method_types: ['card'],
    receipt_email: session.customer_email,
    status: 'requires_payment_method',
  };
  internals.paymentIntentId = id;
  return store.paymentIntents.add(intent);
}

function newCharge(store: PaymentsStore, intent: PaymentIntent, payer: Payer, succeeded: boolean): Charge {
  const charge: Charge = {
    id: newId('ch_'),
    object: 'charge',
    amount: intent.amount,
    amount_captured: succeeded ? intent.amount : 0,
    amount_refunded: 0,
    balance_transaction: null,
    billing_details: { email: payer.email, name: payer.name, address: null, phone: null },
    captured: succeeded,
    created: store.clock.now(),
    currency: intent.currency,
    description: intent.description,
    failure_code: null,
    failure_message: null,
    livemode: false,
    metadata: { ...intent.metadata },
    outcome: {
      network_status: succeeded ? 'approved_by_network' : 'declined_by_network',
      reason: null,
      risk_level: 'normal',
      seller_message: succeeded ? 'Payment complete.' : 'The bank did not return any further details with this decline.',
      type: succeeded ? 'authorized' : 'issuer_declined',
    },
    paid: succeeded,
    payment_intent: intent.id,
    payment_method: intent.payment_method ?? newId('pm_'),
    payment_method_details: { type: 'card', card: payer.card },
    receipt_email: intent.receipt_email,
    refunded: false,
    status: succeeded ? 'succeeded' : 'failed',
  };
  return store.charges.add(charge);
}

function settle(store: PaymentsStore, session: CheckoutSession, internals: SessionInternals, intent: PaymentIntent, payer: Payer): PayOutcome {
  const now = store.clock.now();
  const charge = newCharge(store, intent, payer, true);
  const fee = processingFee(charge.amount);
  const txn = store.balanceTransactions.add({
    id: newId('txn_'),
    object: 'balance_transaction',
    amount: charge.amount,
    available_on: now + AVAILABLE_AFTER_SECONDS,
    created: now,
    currency: charge.currency,
    description: intent.description,
    exchange_rate: null,
    fee,
    fee_details: [{ amount: fee, application: null, currency: charge.currency, description: 'Card processing fees', type: 'stripe_fee' }],
    net: charge.amount - fee,
    reporting_category: 'charge',
    source: charge.id,
    status: 'pending',
    type: 'charge',
  });
  charge.balance_transaction = txn.id;

  intent.status = 'succeeded';
  intent.amount_received = intent.amount;
  intent.latest_charge = charge.id;
  intent.last_payment_error = null;
  intent.next_action = null;

  internals.pendingAuthentication = null;
  session.status = 'complete';
  session.payment_status = 'paid';
  session.payment_intent = intent.id;
  session.url = null;
  session.customer_details = {
    email: session.customer_email ?? payer.email,
    name: payer.name,
    phone: null,
    address: null,
    tax_exempt: 'none',
    tax_ids: [],
  };

  store.emit('payment_intent.succeeded', intent);
  store.emit('checkout.session.completed', session);
  const redirectUrl = session.success_url.split('{CHECKOUT_SESSION_ID}').join(session.id);
  return { kind: 'paid', session, paymentIntent: intent, charge, redirectUrl };
}

function refuse(store: PaymentsStore, session: CheckoutSession, intent: PaymentIntent, error: PaymentError): PayOutcome {
  intent.status = 'requires_payment_method';
  intent.next_action = null;
  intent.last_payment_error = error;
  store.emit('payment_intent.payment_failed', intent);
  return { kind: 'declined', session, error, paymentIntent: intent };
}

function formError(session: CheckoutSession, code: string, message: string, type: PaymentError['type'] = 'card_error'): PayOutcome {
  return { kind: 'declined', session, error: { type, code, message }, paymentIntent: null };
}

/** One attempt to pay a session with a card from the checkout form. */
export function payWithCard(store: PaymentsStore, sessionId: string, form: PaymentForm): PayOutcome {
  const check = payable(store, sessionId);
  if (!check.ok) return check.outcome;
  const { session, internals } = check;

  const parsed = parseCard(form, store.clock.now());
  if (!parsed.ok) return formError(session, parsed.error.code, parsed.error.message);
  const email = form.email?.trim() || null;
  if (email !== null && !EMAIL.test(email)) {
    return formError(session, 'email_invalid', 'Your email address is invalid.', 'invalid_request_error');
  }
  const payer: Payer = { card: parsed.details, name: form.name?.trim() || null, email: session.customer_email ?? email };

  internals.pendingAuthentication = null;
  const intent = intentFor(store, session, internals);
  intent.payment_method = newId('pm_');
  const behaviour = behaviourOf(parsed.number);
  switch (behaviour.kind) {
    case 'approve':
      return settle(store, session, internals, intent, payer);
    case 'authenticate':
      intent.status = 'requires_action';
      intent.next_action = { type: 'use_stripe_sdk', use_stripe_sdk: {} };
      internals.pendingAuthentication = { paymentIntentId: intent.id, ...payer };
      return { kind: 'needs_authentication', session, paymentIntent: intent };
    case 'decline': {
      const charge = newCharge(store, intent, payer, false);
      charge.failure_code = behaviour.code;
      charge.failure_message = behaviour.message;
      charge.outcome.reason = behaviour.declineCode;
      intent.latest_charge = charge.id;
      return refuse(store, session, intent, {
        type: 'card_error',
        code: behaviour.code,
        decline_code: behaviour.declineCode,
        message: behaviour.message,
        charge: charge.id,
      });
    }
  }
}

export type AuthenticationResult = 'complete' | 'fail';

/** The cardholder's answer to the extra confirmation step. */
export function finishAuthentication(store: PaymentsStore, sessionId: string, result: AuthenticationResult): PayOutcome {
  const check = payable(store, sessionId);
  if (!check.ok) return check.outcome;
  const { session, internals } = check;
  const pending = internals.pendingAuthentication;
  const intent = pending ? store.paymentIntents.get(pending.paymentIntentId) : undefined;
  if (!pending || !intent || intent.status !== 'requires_action') {
    return formError(
      session,
      'payment_intent_unexpected_state',
      'No payment is waiting for confirmation. Enter your card details again.',
      'invalid_request_error',
    );
  }
  internals.pendingAuthentication = null;
  if (result === 'complete') return settle(store, session, internals, intent, pending);
  return refuse(store, session, intent, {
    type: 'invalid_request_error',
    code: 'payment_intent_authentication_failure',
    message: 'We are unable to authenticate your payment method. Please choose a different payment method and try again.',
  });
}
