import { z } from 'zod';
import { boxSizeSchema } from './bake-days.js';

// The owner's back office: changing an announced bake day, calling one off,
// announcements to subscribers, and the weekly sales report.

const noOverlap = (windows: Array<{ start: string; end: string }>) => {
  const sorted = [...windows].sort((a, b) => a.start.localeCompare(b.start));
  return sorted.every((w, i) => i === 0 || w.start >= sorted[i - 1]!.end);
};

/** Only what is sent changes; `windows` is the whole list the day keeps (a window left out is taken off). */
export const editBakeDaySchema = z
  .strictObject({
    place: z.string().trim().min(2, 'Name the place').max(120),
    address: z.string().trim().max(200),
    windows: z
      .array(
        z
          .strictObject({
            /** With an id it changes that window; without, it is new. */
            id: z.uuid().optional(),
            start: z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use 24-hour time, like 08:30'),
            end: z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use 24-hour time, like 08:30'),
            maxOrders: z.number().int('Whole orders only').min(0, 'At least 0').max(1000).nullable().default(null),
          })
          .refine((w) => w.start < w.end, { message: 'A window ends after it starts', path: ['end'] }),
      )
      .min(1, 'Keep at least one pickup window')
      .max(12)
      .refine(noOverlap, 'Pickup windows must not overlap'),
    ordersOpenAt: z.iso.datetime({ offset: true }),
    cutoffAt: z.iso.datetime({ offset: true }),
    ringCapacity: z.number().int('Whole rings').min(0).max(10_000),
    holeCapacity: z.number().int('Whole holes').min(0).max(10_000),
    menuItemIds: z.array(z.uuid()).min(1, 'Keep at least one item on the menu').max(40),
    boxes: z
      .array(z.strictObject({ size: boxSizeSchema, pieces: z.number().int().min(1).max(60), priceCents: z.number().int('Whole cents').min(0).max(100_000) }))
      .min(1, 'Offer at least one box')
      .max(3)
      .refine((boxes) => new Set(boxes.map((b) => b.size)).size === boxes.length, 'Each box size once'),
    acceptAboveEquipment: z.boolean(),
  })
  .partial();
export type EditBakeDayInput = z.infer<typeof editBakeDaySchema>;

export const callOffSchema = z.strictObject({
  reason: z.string().trim().min(3, 'Say why, in a few words: customers read it').max(300),
});
export type CallOffInput = z.infer<typeof callOffSchema>;

export type JobState = 'queued' | 'running' | 'done' | 'failed';

/** `GET /api/staff/jobs/:id`: how far a long piece of work has got. */
export interface JobView {
  id: string;
  kind: 'call-off';
  state: JobState;
  done: number;
  total: number;
  bakeDayId: string;
  lastError: string | null;
  createdAt: string;
  finishedAt: string | null;
}

export interface EditWindowView {
  id: string;
  /** Local clock times in the bake day's zone. */
  start: string;
  end: string;
  startsAt: string;
  endsAt: string;
  maxOrders: number | null;
  /** Orders on hold or paid that count against this window. */
  booked: number;
  /** Taken off the day; kept for the orders still in it. */
  removed: boolean;
}

/** What the owner's edit page starts from. */
export interface BakeDayEditView {
  id: string;
  date: string;
  place: string;
  address: string;
  timeZone: string;
  /** The stored state: draft, published, cancelled (called off) or done. */
  state: 'draft' | 'published' | 'cancelled' | 'done';
  /** What customers see: upcoming, open, closed or done. */
  status: 'upcoming' | 'open' | 'closed' | 'done';
  ordersOpenAt: string;
  cutoffAt: string;
  capacity: { rings: number; holes: number };
  sold: { rings: number; holes: number };
  windows: EditWindowView[];
  menuItemIds: string[];
  boxes: Array<{ size: z.infer<typeof boxSizeSchema>; pieces: number; priceCents: number }>;
  paidOrders: number;
  callOff: JobView | null;
  calledOffReason: string | null;
}

export interface BakeDayEditResult {
  day: BakeDayEditView;
  /** What changed, in words. */
  changes: string[];
  /** Paid orders whose customers were e-mailed about the change. */
  customersTold: number;
}

export const subscribeSchema = z.strictObject({
  email: z.email('Enter an e-mail address').max(200).transform((e) => e.trim().toLowerCase()),
});
export const tokenSchema = z.strictObject({ token: z.string().min(20).max(100) });

export const weekQuerySchema = z.object({
  start: z.iso.date({ error: 'Give the week’s Monday as YYYY-MM-DD' }),
});

export interface WeeklyFigures {
  /** Monday and Sunday of the week (local dates) and the instants it covers. */
  week: { start: string; end: string; timeZone: string; from: string; to: string };
  /** Paid pre-orders plus walk-up sales. */
  grossCents: number;
  refundsCents: number;
  /** Card processing fees of the pre-orders paid this week. */
  feesCents: number;
  /** grossCents − refundsCents − feesCents. */
  netCents: number;
  /** Pre-orders paid this week and not cancelled or fully refunded. */
  orders: number;
  /** Pieces in those orders. */
  pieces: number;
  preorderCents: number;
  byItem: Array<{ menuItemId: string; name: string; kind: 'ring' | 'hole'; flavour: string; glaze: string; orders: number; preorderPieces: number; walkUpPieces: number; pieces: number }>;
  byFlavour: Array<{ flavour: string; pieces: number }>;
  byGlaze: Array<{ glaze: string; pieces: number }>;
  noShows: number;
  noShowPieces: number;
  walkUps: { sales: number; cents: number; pieces: number; byMethod: Array<{ method: 'cash' | 'card'; sales: number; cents: number }> };
  sellThrough: Array<{
    bakeDayId: string;
    date: string;
    place: string;
    capacity: number;
    preorderPieces: number;
    walkUpPieces: number;
    sold: number;
    /** sold ÷ capacity × 100, one decimal; null when the capacity is 0. */
    percent: number | null;
    calledOff: boolean;
  }>;
  /** Ingredients, frying fat and glaze for the pieces sold, from the production costing. */
  ingredientCents: number;
  /** netCents − ingredientCents. */
  marginCents: number;
  /** ingredientCents ÷ pieces sold (pre-orders and walk-ups), to the cent; null with nothing sold. */
  costPerPieceCents: number | null;
}

export interface WeeklyReport extends WeeklyFigures {
  previous: WeeklyFigures;
}
