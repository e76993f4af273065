import { z } from 'zod';
import { boxSizeSchema } from './boxes.js';

const quantity = z
  .number({ error: 'Quantity must be a number' })
  .int('Quantity must be a whole number')
  .min(1, 'Quantity must be at least 1')
  .max(100, 'Quantity is too large');

export const orderItemInputSchema = z.strictObject({
  menuItemId: z.string().uuid('Unknown menu item'),
  quantity,
});

export const boxInputSchema = z.strictObject({
  size: boxSizeSchema,
  items: z.array(orderItemInputSchema).min(1, 'A box needs at least one item').max(24),
});
export type BoxInput = z.infer<typeof boxInputSchema>;

/**
 * What a customer may send to create an order. Strict: a client-sent price,
 * status, total or user id is refused, never trusted.
 */
export const createOrderSchema = z.strictObject({
  bakeDayId: z.string().uuid('Unknown bake day'),
  pickupWindowId: z.string().uuid('Choose a pickup window'),
  boxes: z.array(boxInputSchema).min(1, 'Add at least one box').max(20, 'At most 20 boxes in one order'),
});
export type CreateOrderInput = z.infer<typeof createOrderSchema>;

export const moveOrderSchema = z.strictObject({
  pickupWindowId: z.string().uuid('Choose a pickup window'),
});

export const orderStatuses = ['held', 'paid', 'collected', 'no_show', 'cancelled', 'refunded', 'expired'] as const;
export type OrderStatus = (typeof orderStatuses)[number];

export interface OrderBoxView {
  size: z.infer<typeof boxSizeSchema>;
  pieces: number;
  priceCents: number;
  items: Array<{ menuItemId: string; name: string; quantity: number; surchargeCents: number; allergens: string[] }>;
}

export interface OrderView {
  id: string;
  status: OrderStatus;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  refundedCents: number;
  pickupCode: string | null;
  holdExpiresAt: string | null;
  checkoutUrl: string | null;
  pickupWindow: { id: string; startsAt: string; endsAt: string };
  bakeDay: { id: string; date: string; place: string; address: string; timeZone: string; cutoffAt: string };
  boxes: OrderBoxView[];
  createdAt: string;
  canCancel: boolean;
}

/** What POST /api/orders answers: the hold and where to pay for it. */
export interface CreatedOrder {
  id: string;
  status: 'held';
  totalCents: number;
  holdExpiresAt: string;
  checkoutUrl: string;
}

/** One order as its customer sees it, with the QR code and calendar link once paid. */
export interface OrderDetail extends OrderView {
  qrDataUrl: string | null;
  calendarUrl: string | null;
}

export const joinWaitlistSchema = z
  .strictObject({
    rings: z.number().int('Rings must be a whole number').min(0).max(120, 'At most 120').default(0),
    holes: z.number().int('Holes must be a whole number').min(0).max(120, 'At most 120').default(0),
  })
  .refine((b) => b.rings + b.holes > 0, { message: 'Ask for at least one doughnut', path: ['rings'] });
export type JoinWaitlistInput = z.infer<typeof joinWaitlistSchema>;

export interface WaitlistEntryView {
  id: string;
  bakeDayId: string;
  rings: number;
  holes: number;
  status: 'waiting' | 'offered' | 'claimed' | 'lapsed' | 'left';
  /** Place in the queue while waiting (1 = next), null otherwise. */
  position: number | null;
  offerExpiresAt: string | null;
}

export interface WaitlistOfferView {
  bakeDayId: string;
  rings: number;
  holes: number;
  expiresAt: string;
}

/** One order as the staff see it in a bake day's list. */
export interface StaffOrderView {
  id: string;
  status: OrderStatus;
  customer: { name: string; email: string };
  pickupCode: string | null;
  pickupWindow: { id: string; startsAt: string; endsAt: string };
  totalCents: number;
  refundedCents: number;
  paidAt: string | null;
  rings: number;
  holes: number;
  boxes: Array<{ size: z.infer<typeof boxSizeSchema>; items: Array<{ name: string; quantity: number }> }>;
}

export const refundRequestSchema = z.strictObject({
  amountCents: z.number().int('Amount must be whole cents').min(1, 'Amount must be at least 1 cent'),
  reason: z.string().trim().min(1, 'Give a reason').max(200),
});
export type RefundRequest = z.infer<typeof refundRequestSchema>;
