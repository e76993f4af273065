import { isPlainText, PLAIN_TEXT_MESSAGE } from './text.js';
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

const windowRefSchema = z.object({ id: z.string(), startsAt: z.string(), endsAt: z.string() });

export const orderStatusSchema = z.enum(orderStatuses);

export const orderBoxViewSchema = z.object({
  size: boxSizeSchema,
  pieces: z.number().int(),
  priceCents: z.number().int(),
  items: z.array(z.object({ menuItemId: z.string(), name: z.string(), quantity: z.number().int(), surchargeCents: z.number().int(), allergens: z.array(z.string()) })),
});
export type OrderBoxView = z.infer<typeof orderBoxViewSchema>;

export const orderViewSchema = z.object({
  id: z.string(),
  status: orderStatusSchema,
  subtotalCents: z.number().int(),
  taxCents: z.number().int(),
  totalCents: z.number().int(),
  refundedCents: z.number().int(),
  /** ISO 4217 (lower case): the currency the order was priced and paid in. */
  currency: z.string(),
  pickupCode: z.string().nullable(),
  holdExpiresAt: z.string().nullable(),
  checkoutUrl: z.string().nullable(),
  pickupWindow: windowRefSchema,
  bakeDay: z.object({ id: z.string(), date: z.string(), place: z.string(), address: z.string(), timeZone: z.string(), cutoffAt: z.string() }),
  boxes: z.array(orderBoxViewSchema),
  createdAt: z.string(),
  canCancel: z.boolean(),
});
export type OrderView = z.infer<typeof orderViewSchema>;

/** What POST /api/orders answers: the hold and where to pay for it. */
export const createdOrderSchema = z.object({
  id: z.string(),
  status: z.literal('held'),
  totalCents: z.number().int(),
  holdExpiresAt: z.string(),
  checkoutUrl: z.string(),
});
export type CreatedOrder = z.infer<typeof createdOrderSchema>;

/** One order as its customer sees it, with the QR code and calendar link once paid. */
export const orderDetailSchema = orderViewSchema.extend({
  qrDataUrl: z.string().nullable(),
  calendarUrl: z.string().nullable(),
});
export type OrderDetail = z.infer<typeof orderDetailSchema>;

export const checkoutLinkSchema = z.object({ checkoutUrl: z.string() });

export const joinWaitlistSchema = z
  .strictObject({
    rings: z.number().int('Rings must be a whole number').min(0).max(120, 'At most 120').default(0),
    holes: z.number().int('Holes must be a whole number').min(0).max(120, 'At most 120').default(0),
  })
  .refine((b) => b.rings + b.holes > 0, { message: 'Ask for at least one doughnut', path: ['rings'] });
export type JoinWaitlistInput = z.infer<typeof joinWaitlistSchema>;

export const waitlistStatuses = ['waiting', 'offered', 'claimed', 'lapsed', 'left'] as const;

export const waitlistEntryViewSchema = z.object({
  id: z.string(),
  bakeDayId: z.string(),
  rings: z.number().int(),
  holes: z.number().int(),
  status: z.enum(waitlistStatuses),
  /** Place in the queue while waiting (1 = next), null otherwise. */
  position: z.number().int().nullable(),
  offerExpiresAt: z.string().nullable(),
});
export type WaitlistEntryView = z.infer<typeof waitlistEntryViewSchema>;

/** What POST /api/bake-days/:id/waitlist answers: the entry and its place in the queue. */
export const joinedWaitlistSchema = waitlistEntryViewSchema.pick({ id: true, position: true, status: true, rings: true, holes: true });
export type JoinedWaitlist = z.infer<typeof joinedWaitlistSchema>;

export const waitlistOfferViewSchema = z.object({
  bakeDayId: z.string(),
  rings: z.number().int(),
  holes: z.number().int(),
  expiresAt: z.string(),
});
export type WaitlistOfferView = z.infer<typeof waitlistOfferViewSchema>;

/** One line of an order's bill (see orderBill): the lines add up to the order's total. */
export const priceLineSchema = z.object({ kind: z.enum(['box', 'surcharge', 'tax']), label: z.string(), cents: z.number().int(), box: z.number().int().optional() });

/** One order as the staff see it in a bake day's list. */
export const staffOrderViewSchema = z.object({
  id: z.string(),
  status: orderStatusSchema,
  customer: z.object({ name: z.string(), email: z.string() }),
  pickupCode: z.string().nullable(),
  pickupWindow: windowRefSchema,
  totalCents: z.number().int(),
  refundedCents: z.number().int(),
  /** ISO 4217 (lower case): the currency the order was priced and paid in. */
  currency: z.string(),
  paidAt: z.string().nullable(),
  rings: z.number().int(),
  holes: z.number().int(),
  boxes: z.array(z.object({ size: boxSizeSchema, items: z.array(z.object({ name: z.string(), quantity: z.number().int() })) })),
  /** What the total is made of, line by line. */
  priceLines: z.array(priceLineSchema),
});
export type StaffOrderView = z.infer<typeof staffOrderViewSchema>;

export const refundRequestSchema = z.strictObject({
  amountCents: z.number().int('Amount must be whole cents').min(1, 'Amount must be at least 1 cent'),
  reason: z.string().trim().min(1, 'Give a reason').max(200).refine(isPlainText, PLAIN_TEXT_MESSAGE),
});
export type RefundRequest = z.infer<typeof refundRequestSchema>;

export const refundViewSchema = z.object({
  id: z.string(),
  orderId: z.string(),
  amountCents: z.number().int(),
  reason: z.string(),
  createdAt: z.string(),
  order: z.object({ status: orderStatusSchema, totalCents: z.number().int(), refundedCents: z.number().int() }),
});
export type RefundView = z.infer<typeof refundViewSchema>;
