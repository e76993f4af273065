import { missing, paramError, stateError } from './errors.js';
import { newId } from './ids.js';
import { formatAmount } from './money.js';
import { readEnum, readInteger, readMetadata, readString, rejectUnknown, type Params } from './params.js';
import type { PaymentsStore } from './state.js';
import type { Charge, EventRequest, Refund, RefundReason } from './types.js';

const REFUND_PARAMS = ['payment_intent', 'charge', 'amount', 'reason', 'metadata', 'expand'] as const;
const REASONS: readonly RefundReason[] = ['duplicate', 'fraudulent', 'requested_by_customer'];

function chargeToRefund(store: PaymentsStore, params: Params): Charge {
  const chargeId = readString(params, 'charge');
  const intentId = readString(params, 'payment_intent');
  if (chargeId === undefined && intentId === undefined) {
    throw paramError('One of the following params should be provided for this request: payment_intent or charge.', 'charge', 'parameter_missing');
  }
  let charge: Charge | undefined;
  if (intentId !== undefined) {
    const intent = store.paymentIntents.get(intentId);
    if (!intent) throw missing('payment_intent', intentId, 'payment_intent');
    charge = intent.status === 'succeeded' && intent.latest_charge ? store.charges.get(intent.latest_charge) : undefined;
    if (!charge) {
      throw stateError(`This PaymentIntent (${intentId}) does not have a successful charge to refund.`, undefined, 'payment_intent');
    }
  }
  if (chargeId !== undefined) {
    const named = store.charges.get(chargeId);
    if (!named) throw missing('charge', chargeId, 'charge');
    if (charge && charge.id !== named.id) {
      throw paramError(`The charge ${chargeId} does not belong to the payment intent ${intentId}.`, 'charge');
    }
    charge = named;
  }
  if (!charge || charge.status !== 'succeeded') {
    throw stateError(`Charge ${charge?.id ?? chargeId} did not succeed, so there is nothing to refund.`, undefined, 'charge');
  }
  return charge;
}

/**
 * Refunds all or part of a successful charge. Partial refunds add up until the
 * charge is fully refunded; asking for more than is left is refused.
 */
export function createRefund(store: PaymentsStore, params: Params, request: EventRequest): Refund {
  rejectUnknown(params, REFUND_PARAMS);
  const charge = chargeToRefund(store, params);
  const requested = readInteger(params, 'amount', 'amount', { min: 1 });
  const reason = readEnum(params, 'reason', REASONS) ?? null;
  const metadata = readMetadata(params) ?? {};

  const remaining = charge.amount - charge.amount_refunded;
  if (remaining <= 0) {
    throw stateError(`Charge ${charge.id} has already been refunded.`, 'charge_already_refunded');
  }
  const amount = requested ?? remaining;
  if (amount > remaining) {
    throw stateError(
      `Refund amount (${formatAmount(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatAmount(remaining, charge.currency)})`,
      'charge_already_refunded',
      'amount',
    );
  }

  const now = store.clock.now();
  const refundId = newId('re_');
  const txn = store.balanceTransactions.add({
    id: newId('txn_'),
    object: 'balance_transaction',
    amount: -amount,
    available_on: now,
    created: now,
    currency: charge.currency,
    description: 'REFUND FOR CHARGE',
    exchange_rate: null,
    fee: 0,
    fee_details: [],
    net: -amount,
    reporting_category: 'refund',
    source: refundId,
    status: 'available',
    type: 'refund',
  });
  const refund = store.refunds.add({
    id: refundId,
    object: 'refund',
    amount,
    balance_transaction: txn.id,
    charge: charge.id,
    created: now,
    currency: charge.currency,
    metadata,
    payment_intent: charge.payment_intent,
    reason,
    receipt_number: null,
    status: 'succeeded',
  });

  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded >= charge.amount;

  store.emit('refund.created', refund, { request });
  store.emit('charge.refunded', charge, { request, previousAttributes: previous });
  return refund;
}
