export {
  startPaymentsFake,
  createApp,
  DEFAULT_WEBHOOK_SECRET,
  type PaymentsFake,
  type PaymentsFakeOptions,
} from './server.js';
export { PaymentsRuntime } from './runtime.js';
export { signatureHeader, DEFAULT_RETRY_DELAYS_MS, type DeliveryMode, type DeliveryRecord, type WebhookEndpoint } from './webhooks.js';
export { processingFee } from './money.js';
export { TEST_CARDS, type TestCard } from './test-cards.js';
export type { PaymentForm, PayOutcome } from './card-payments.js';
export type * from './types.js';
