import { z } from 'zod';
import { boxSizeSchema } from './bake-days.js';
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

export const counterStatuses = orderStatuses;

export interface PickupBox {
  size: z.infer<typeof boxSizeSchema>;
  pieces: number;
  items: Array<{ menuItemId: string; name: string; quantity: number }>;
}

/** One row of `GET /api/bake-days/:id/pickups`. */
export interface PickupRow {
  orderId: string;
  name: string;
  pickupCode: string | null;
  windowId: string;
  status: (typeof orderStatuses)[number];
  boxes: PickupBox[];
  rings: number;
  holes: number;
  window: { startsAt: string; endsAt: string };
  /** From this instant a paid order may be marked no-show (window end plus the owner's grace). */
  noShowFrom: string;
  late: boolean;
  collectedAt: string | null;
  collectedBy: string | null;
  /** Until when the hand-over can still be undone, while it can. */
  undoUntil: string | null;
  noShowAt: string | null;
  noShowBy: string | null;
}

/** `GET /api/orders/by-code/:code`. */
export interface OrderByCode {
  id: string;
  status: (typeof orderStatuses)[number];
  pickupCode: string;
  bakeDayId: string;
  windowId: string;
  name: string;
  boxes: PickupBox[];
  rings: number;
  holes: number;
  bakeDay: { date: string; place: string; timeZone: string };
  window: { startsAt: string; endsAt: string };
  collectedAt: string | null;
  collectedBy: string | null;
}

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

export interface MarkRestNoShowResult {
  marked: number;
  orderIds: string[];
}

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

export interface WalkUpSale {
  id: string;
  bakeDayId: string;
  method: PaymentMethod;
  amountCents: number;
  soldAt: string;
  soldBy: string | null;
  items: Array<{ menuItemId: string; name: string; kind: 'ring' | 'hole'; quantity: number }>;
}

export interface SurplusItem {
  menuItemId: string;
  name: string;
  kind: 'ring' | 'hole';
  /** Left to sell now. */
  left: number;
  /** What the production plan made of it. */
  made: number;
  /** Paid pre-orders of it (handed over, waiting, or no-show). */
  preOrdered: number;
  /** Sold to walk-ups so far. */
  sold: number;
}

/** `GET /api/bake-days/:id/surplus`: left per item, and rings and holes left in all. */
export interface Surplus {
  items: SurplusItem[];
  rings: number;
  holes: number;
}

export interface EndOfDay {
  bakeDayId: string;
  orders: { paid: number; handedOver: number; toHandOver: number; noShows: number; refunded: number };
  pieces: { handedOver: { rings: number; holes: number }; noShows: { rings: number; holes: number }; toHandOver: { rings: number; holes: number } };
  walkUps: {
    sales: number;
    rings: number;
    holes: number;
    totalCents: number;
    byMethod: Record<PaymentMethod, { sales: number; amountCents: number }>;
  };
  /** Cash taken for walk-ups today: what should be in the box, on top of the float. */
  cashToCountCents: number;
  leftOver: Surplus;
}

/** The owner's counter settings. */
export const counterSettingsSchema = z.strictObject({
  noShowGraceMinutes: z.number({ error: 'Give the minutes as a number' }).int('Whole minutes').min(0, 'At least 0 minutes').max(1440, 'At most a day (1440 minutes)'),
  handOverUndoSeconds: z.number({ error: 'Give the seconds as a number' }).int('Whole seconds').min(5, 'At least 5 seconds').max(600, 'At most 10 minutes (600 seconds)'),
});
export type CounterSettings = z.infer<typeof counterSettingsSchema>;
