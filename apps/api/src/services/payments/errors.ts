import Stripe from 'stripe';
import { AppError } from '../../lib/app-error.js';

/** What we keep of a payments-service error for the log: never the request's key or headers. */
export function describePaymentsError(err: unknown): string {
  if (err instanceof Stripe.errors.StripeError) {
    return [err.type, err.code, err.statusCode ? `HTTP ${err.statusCode}` : null, err.requestId ? `request ${err.requestId}` : null, JSON.stringify(err.message)]
      .filter(Boolean)
      .join(' ');
  }
  return err instanceof Error ? `${err.name} ${JSON.stringify(err.message)}` : String(err);
}

export const isPaymentsError = (err: unknown): err is Stripe.errors.StripeError => err instanceof Stripe.errors.StripeError;

/**
 * The payments service refused for good (bad request, card error, permission):
 * retrying with the same parameters can't succeed. Connection trouble, rate
 * limits, conflicts and the service's own errors may pass on a retry.
 */
export function isDefinitiveRefusal(err: unknown): boolean {
  if (!isPaymentsError(err)) return false;
  return ['StripeInvalidRequestError', 'StripeCardError', 'StripePermissionError', 'StripeAuthenticationError', 'StripeIdempotencyError'].includes(err.type);
}

/** The one answer for "the payments service failed us": 502 payments_error. */
export function paymentsError(message = 'The card payments service could not complete this just now. Please try again shortly.'): AppError {
  return new AppError('payments_error', message, 502);
}
