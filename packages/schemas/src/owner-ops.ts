import { z } from 'zod';
import { boxSizeSchema } from './boxes.js';

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
  /** Told to customers in the e-mail; may be left out. */
  reason: z.string().trim().max(300, 'At most 300 characters: customers read it in an e-mail').default(''),
});
export type CallOffInput = z.infer<typeof callOffSchema>;

const int = z.number().int();
const cents = z.number().int();
const pieces = z.object({ rings: int, holes: int });

/** `GET /api/staff/jobs/:id`: how far a long piece of work has got. */
export const jobViewSchema = z.object({
  id: z.uuid(),
  kind: z.enum(['call-off']),
  state: z.enum(['queued', 'running', 'done', 'failed']),
  done: int,
  total: int,
  bakeDayId: z.uuid(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type JobView = z.infer<typeof jobViewSchema>;
export type JobState = JobView['state'];
export const callOffStartedSchema = jobViewSchema.extend({ jobId: z.uuid() });

export const editWindowViewSchema = z.object({
  id: z.uuid(),
  /** Local clock times in the bake day's zone. */
  start: z.string(),
  end: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  maxOrders: int.nullable(),
  /** Orders on hold or paid that count against this window. */
  booked: int,
  /** Taken off the day; kept for the orders still in it. */
  removed: z.boolean(),
});
export type EditWindowView = z.infer<typeof editWindowViewSchema>;

/** What the owner's edit page starts from. */
export const bakeDayEditViewSchema = z.object({
  id: z.uuid(),
  date: z.string(),
  place: z.string(),
  address: z.string(),
  timeZone: z.string(),
  /** The stored state: draft, published, cancelled (called off) or done. */
  state: z.enum(['draft', 'published', 'cancelled', 'done']),
  /** What customers see. */
  status: z.enum(['upcoming', 'open', 'closed', 'done']),
  ordersOpenAt: z.string(),
  cutoffAt: z.string(),
  capacity: pieces,
  sold: pieces,
  windows: z.array(editWindowViewSchema),
  menuItemIds: z.array(z.uuid()),
  boxes: z.array(z.object({ size: boxSizeSchema, pieces: int, priceCents: cents })),
  paidOrders: int,
  callOff: jobViewSchema.nullable(),
  calledOffReason: z.string().nullable(),
});
export type BakeDayEditView = z.infer<typeof bakeDayEditViewSchema>;

export const bakeDayEditResultSchema = z.object({
  day: bakeDayEditViewSchema,
  /** What changed, in words. */
  changes: z.array(z.string()),
  /** Paid orders whose customers were e-mailed about the change. */
  customersTold: int,
});
export type BakeDayEditResult = z.infer<typeof bakeDayEditResultSchema>;

export const subscribeSchema = z.strictObject({
  email: z.email('Enter an e-mail address').max(200).transform((e) => e.trim().toLowerCase()),
});
export const tokenSchema = z.strictObject({ token: z.string().min(20).max(100) });

export const weekQuerySchema = z.object({
  start: z.iso.date({ error: 'Give the week’s Monday as YYYY-MM-DD' }),
});

export const weeklyFiguresSchema = z.object({
  /** Monday and Sunday of the week (local dates) and the instants it covers. */
  week: z.object({ start: z.string(), end: z.string(), timeZone: z.string(), from: z.string(), to: z.string() }),
  /** Paid pre-orders plus walk-up sales. */
  grossCents: cents,
  refundsCents: cents,
  /** Card processing fees of the pre-orders paid this week. */
  feesCents: cents,
  /** grossCents − refundsCents − feesCents. */
  netCents: cents,
  /** Pre-orders paid this week and not cancelled or fully refunded. */
  orders: int,
  /** Pieces in those orders. */
  pieces: int,
  preorderCents: cents,
  byItem: z.array(
    z.object({ menuItemId: z.uuid(), name: z.string(), kind: z.enum(['ring', 'hole']), flavour: z.string(), glaze: z.string(), orders: int, preorderPieces: int, walkUpPieces: int, pieces: int }),
  ),
  byFlavour: z.array(z.object({ flavour: z.string(), pieces: int })),
  byGlaze: z.array(z.object({ glaze: z.string(), pieces: int })),
  noShows: int,
  noShowPieces: int,
  walkUps: z.object({ sales: int, cents, pieces: int, byMethod: z.array(z.object({ method: z.enum(['cash', 'card']), sales: int, cents })) }),
  sellThrough: z.array(
    z.object({
      bakeDayId: z.uuid(),
      date: z.string(),
      place: z.string(),
      capacity: int,
      preorderPieces: int,
      walkUpPieces: int,
      sold: int,
      /** sold ÷ capacity × 100, one decimal; null when the capacity is 0. */
      percent: z.number().nullable(),
      calledOff: z.boolean(),
    }),
  ),
  /** Ingredients, frying fat and glaze for the pieces sold, from the production costing. */
  ingredientCents: cents,
  /** netCents − ingredientCents. */
  marginCents: cents,
  /** ingredientCents ÷ pieces sold (pre-orders and walk-ups), to the cent; null with nothing sold. */
  costPerPieceCents: cents.nullable(),
});
export type WeeklyFigures = z.infer<typeof weeklyFiguresSchema>;

export const weeklyReportSchema = weeklyFiguresSchema.extend({
  previous: weeklyFiguresSchema,
  /** Anything the figures had to leave out or guess (an ingredient without a price). */
  notes: z.array(z.string()),
});
export type WeeklyReport = z.infer<typeof weeklyReportSchema>;

export const subscribedSchema = z.object({ message: z.string() });
export const confirmedSchema = z.object({ confirmed: z.literal(true), email: z.string() });
export const unsubscribedSchema = z.object({ unsubscribed: z.literal(true) });
