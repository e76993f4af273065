import { z } from 'zod';
import { boxSizeSchema } from './boxes.js';
import { orderStatuses } from './orders.js';

// The counter on bake day: the pickup list, hand-over with undo, no-shows,
// walk-up sales of the surplus and the end-of-day figures. Request bodies are
// strict; responses are typed here so the API and the staff app agree.

/**
 * Pickup codes use only letters and digits that can't be mistaken for one
 * another: no 0/O/Q, 1/I/L, 2/Z, 5/S, 8/B, U/V.
 */
export const PICKUP_CODE_ALPHABET = 'ACDEFGHJKMNPRTWXY34679';
export const PICKUP_CODE_LENGTH = 6;

/**
 * What someone types or reads off a screen for a character the alphabet
 * avoids, mapped to the code character it is mistaken for: round shapes to D,
 * upright strokes to J, Z/2 to 7. Characters with no look-alike in the
 * alphabet are left as they are (and so match no code).
 */
const LOOK_ALIKES: Record<string, string> = { O: 'D', '0': 'D', Q: 'D', I: 'J', '1': 'J', L: 'J', Z: '7', '2': '7' };

/** A typed or scanned pickup code as stored: case, spaces and dashes don't matter, look-alikes are mapped. */
export function normalisePickupCode(input: string): string {
  return input
    .toUpperCase()
    .replace(/[\s-]/g, '')
    .replace(/[OQ0IL1Z2]/g, (c) => LOOK_ALIKES[c] ?? c);
}

const statusSchema = z.enum(orderStatuses);
const instant = z.string();

export const pickupBoxSchema = z.object({
  size: boxSizeSchema,
  pieces: z.number().int(),
  items: z.array(z.object({ menuItemId: z.string(), name: z.string(), quantity: z.number().int() })),
});
export type PickupBox = z.infer<typeof pickupBoxSchema>;

/** One row of `GET /api/bake-days/:id/pickups`. */
export const pickupRowSchema = z.object({
  orderId: z.string(),
  name: z.string(),
  pickupCode: z.string().nullable(),
  windowId: z.string(),
  status: statusSchema,
  boxes: z.array(pickupBoxSchema),
  rings: z.number().int(),
  holes: z.number().int(),
  window: z.object({ startsAt: instant, endsAt: instant }),
  /** From this instant a paid order may be marked no-show (window end plus the owner's grace). */
  noShowFrom: instant,
  late: z.boolean(),
  collectedAt: instant.nullable(),
  collectedBy: z.string().nullable(),
  /** Until when the hand-over can still be undone, while it can. */
  undoUntil: instant.nullable(),
  noShowAt: instant.nullable(),
  noShowBy: z.string().nullable(),
});
export type PickupRow = z.infer<typeof pickupRowSchema>;

/** `GET /api/orders/by-code/:code`. */
export const orderByCodeSchema = z.object({
  id: z.string(),
  status: statusSchema,
  pickupCode: z.string(),
  bakeDayId: z.string(),
  windowId: z.string(),
  name: z.string(),
  boxes: z.array(pickupBoxSchema),
  rings: z.number().int(),
  holes: z.number().int(),
  bakeDay: z.object({ date: z.string(), place: z.string(), timeZone: z.string() }),
  window: z.object({ startsAt: instant, endsAt: instant }),
  collectedAt: instant.nullable(),
  collectedBy: z.string().nullable(),
});
export type OrderByCode = z.infer<typeof orderByCodeSchema>;

/** Optional body of collect / uncollect / no-show: the bake day the counter is working, so another day's order is refused. */
export const counterActionSchema = z.strictObject({
  bakeDayId: z.uuid('Unknown bake day').optional(),
});
export type CounterActionInput = z.infer<typeof counterActionSchema>;

/** What a hand-over, undo or no-show answers: the order as the pickup list shows it. */
export type CounterActionResult = PickupRow;

export const markRestNoShowSchema = z.strictObject({
  /** Only this window's orders; all windows whose grace is over when absent. */
  windowId: z.uuid('Unknown pickup window').optional(),
});

export const markRestNoShowResultSchema = z.object({ marked: z.number().int(), orderIds: z.array(z.string()) });
export type MarkRestNoShowResult = z.infer<typeof markRestNoShowResultSchema>;

export const paymentMethods = ['cash', 'card'] as const;
export type PaymentMethod = (typeof paymentMethods)[number];

export const walkUpSaleSchema = z.strictObject({
  items: z
    .array(
      z.strictObject({
        menuItemId: z.uuid('Unknown menu item'),
        quantity: z.number({ error: 'Quantity must be a number' }).int('Quantity must be a whole number').min(1, 'Quantity must be at least 1').max(200, 'Quantity is too large'),
      }),
    )
    .min(1, 'Add at least one item')
    .max(30)
    .refine((items) => new Set(items.map((i) => i.menuItemId)).size === items.length, { message: 'List each item once' }),
  method: z.enum(paymentMethods, { error: 'Payment is cash or card' }),
  amountCents: z.number({ error: 'Amount must be a number' }).int('Amount must be whole cents').min(0, 'Amount can’t be negative').max(1_000_000, 'Amount is too large'),
});
export type WalkUpSaleInput = z.infer<typeof walkUpSaleSchema>;

const kindSchema = z.enum(['ring', 'hole']);

export const walkUpSaleViewSchema = z.object({
  id: z.string(),
  bakeDayId: z.string(),
  method: z.enum(paymentMethods),
  amountCents: z.number().int(),
  soldAt: instant,
  soldBy: z.string().nullable(),
  items: z.array(z.object({ menuItemId: z.string(), name: z.string(), kind: kindSchema, quantity: z.number().int() })),
});
export type WalkUpSale = z.infer<typeof walkUpSaleViewSchema>;

export const surplusItemSchema = z.object({
  menuItemId: z.string(),
  name: z.string(),
  kind: kindSchema,
  /** Left to sell now. */
  left: z.number().int(),
  /** What the production plan made of it. */
  made: z.number().int(),
  /** Paid pre-orders of it (handed over, waiting, or no-show). */
  preOrdered: z.number().int(),
  /** Sold to walk-ups so far. */
  sold: z.number().int(),
});
export type SurplusItem = z.infer<typeof surplusItemSchema>;

/** `GET /api/bake-days/:id/surplus`: left per item, and rings and holes left in all. */
export const surplusSchema = z.object({ items: z.array(surplusItemSchema), rings: z.number().int(), holes: z.number().int() });
export type Surplus = z.infer<typeof surplusSchema>;

const pieces = z.object({ rings: z.number().int(), holes: z.number().int() });
const byMethod = z.object({ sales: z.number().int(), amountCents: z.number().int() });

export const endOfDaySchema = z.object({
  bakeDayId: z.string(),
  orders: z.object({ paid: z.number().int(), handedOver: z.number().int(), toHandOver: z.number().int(), noShows: z.number().int(), refunded: z.number().int() }),
  pieces: z.object({ handedOver: pieces, noShows: pieces, toHandOver: pieces }),
  walkUps: z.object({ sales: z.number().int(), rings: z.number().int(), holes: z.number().int(), totalCents: z.number().int(), byMethod: z.object({ cash: byMethod, card: byMethod }) }),
  /** Cash taken for walk-ups today: what should be in the box, on top of the float. */
  cashToCountCents: z.number().int(),
  leftOver: surplusSchema,
});
export type EndOfDay = z.infer<typeof endOfDaySchema>;

/** The owner's counter settings. */
export const counterSettingsSchema = z.strictObject({
  noShowGraceMinutes: z.number({ error: 'Give the minutes as a number' }).int('Whole minutes').min(0, 'At least 0 minutes').max(1440, 'At most a day (1440 minutes)'),
  handOverUndoSeconds: z.number({ error: 'Give the seconds as a number' }).int('Whole seconds').min(5, 'At least 5 seconds').max(600, 'At most 10 minutes (600 seconds)'),
});
export type CounterSettings = z.infer<typeof counterSettingsSchema>;
