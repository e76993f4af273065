import { z } from 'zod';
import type { Endpoint } from './api.js';

/** A customer's share of one bake day: rings and holes together, over all their orders. */
export const orderLimitSchema = z.strictObject({
  maxPiecesPerCustomer: z.number().int('A whole number of pieces').min(1, 'At least 1 piece').max(10_000, 'At most 10,000 pieces'),
});
export type OrderLimit = z.infer<typeof orderLimitSchema>;

/** A payment that did not match its order: never accepted, refunded in full. */
export const paymentFlagViewSchema = z.object({
  id: z.string(),
  orderId: z.string().nullable(),
  checkoutSessionId: z.string(),
  problem: z.string(),
  amountCents: z.number().int(),
  currency: z.string(),
  refundStatus: z.enum(['pending', 'succeeded', 'failed', 'none']),
  createdAt: z.string(),
  /** The order the session named, when it exists: who, which bake day, and where it stands now. */
  order: z
    .object({
      customerName: z.string(),
      customerEmail: z.string(),
      bakeDayId: z.string(),
      bakeDayDate: z.string(),
      status: z.string(),
      totalCents: z.number().int(),
    })
    .nullable(),
});
export type PaymentFlagView = z.infer<typeof paymentFlagViewSchema>;

/** The owner's side of fair shares and payment checks (part of the route contract; see `api`). */
export const shopRulesApi = {
  getOrderLimit: { method: 'get', path: '/api/staff/order-limit', response: orderLimitSchema },
  setOrderLimit: { method: 'put', path: '/api/staff/order-limit', body: orderLimitSchema, response: orderLimitSchema },
  listPaymentFlags: { method: 'get', path: '/api/staff/payment-flags', response: z.array(paymentFlagViewSchema) },
} as const satisfies Record<string, Endpoint>;
