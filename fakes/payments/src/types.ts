/** The public objects the fake serves, shaped as the SDK's types expect. */

export type Metadata = Record<string, string>;

export interface Price {
  id: string;
  object: 'price';
  active: boolean;
  billing_scheme: 'per_unit';
  created: number;
  currency: string;
  livemode: false;
  lookup_key: null;
  metadata: Metadata;
  nickname: null;
  product: string;
  recurring: null;
  tax_behavior: 'unspecified';
  type: 'one_time';
  unit_amount: number;
  unit_amount_decimal: string;
}

export interface LineItem {
  id: string;
  object: 'item';
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: Price;
  quantity: number;
}

export interface CustomerDetails {
  email: string | null;
  name: string | null;
  phone: null;
  address: null;
  tax_exempt: 'none';
  tax_ids: [];
}

export type SessionStatus = 'open' | 'complete' | 'expired';

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: CustomerDetails | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  locale: string | null;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: 'unpaid' | 'paid';
  status: SessionStatus;
  success_url: string;
  total_details: { amount_discount: number; amount_shipping: number; amount_tax: number };
  ui_mode: 'hosted';
  url: string | null;
}

export interface CardDetails {
  brand: string;
  country: string;
  exp_month: number;
  exp_year: number;
  funding: 'credit';
  last4: string;
}

export interface PaymentError {
  type: 'card_error' | 'invalid_request_error';
  code: string;
  decline_code?: string;
  message: string;
  charge?: string;
}

export type PaymentIntentStatus = 'requires_payment_method' | 'requires_action' | 'succeeded' | 'canceled';

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: 'automatic';
  client_secret: string;
  confirmation_method: 'automatic';
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  next_action: { type: 'use_stripe_sdk'; use_stripe_sdk: Record<string, never> } | null;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  status: PaymentIntentStatus;
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  balance_transaction: string | null;
  billing_details: { email: string | null; name: string | null; address: null; phone: null };
  captured: boolean;
  created: number;
  currency: string;
  description: string | null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Metadata;
  outcome: {
    network_status: 'approved_by_network' | 'declined_by_network';
    reason: string | null;
    risk_level: 'normal';
    seller_message: string;
    type: 'authorized' | 'issuer_declined';
  };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { type: 'card'; card: CardDetails };
  receipt_email: string | null;
  refunded: boolean;
  status: 'succeeded' | 'failed';
}

export type RefundReason = 'duplicate' | 'fraudulent' | 'requested_by_customer';

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  balance_transaction: string;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: RefundReason | null;
  receipt_number: null;
  status: 'succeeded';
}

export interface BalanceTransaction {
  id: string;
  object: 'balance_transaction';
  amount: number;
  available_on: number;
  created: number;
  currency: string;
  description: string | null;
  exchange_rate: null;
  fee: number;
  fee_details: { amount: number; application: null; currency: string; description: string; type: 'stripe_fee' }[];
  net: number;
  reporting_category: 'charge' | 'refund';
  source: string;
  status: 'pending' | 'available';
  type: 'charge' | 'refund';
}

export type EventType =
  | 'checkout.session.completed'
  | 'checkout.session.expired'
  | 'payment_intent.succeeded'
  | 'payment_intent.payment_failed'
  | 'charge.refunded'
  | 'refund.created'
  | 'refund.updated';

export interface EventRequest {
  id: string | null;
  idempotency_key: string | null;
}

export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: unknown; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: EventRequest;
  type: EventType;
}

export interface ApiList<T> {
  object: 'list';
  data: T[];
  has_more: boolean;
  url: string;
}
