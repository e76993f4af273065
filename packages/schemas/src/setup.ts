import { z } from 'zod';
import { boxSizeSchema } from './boxes.js';
import { menuItemViewSchema } from './bake-days.js';
import { roleSchema } from './roles.js';

// The owner's setup: new bake days and the staff who may sign in.

const clock = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use 24-hour time, like 08:30');

export const pickupWindowInputSchema = z
  .strictObject({
    start: clock,
    end: clock,
    maxOrders: z.number().int('Whole orders only').min(1, 'At least 1').max(1000).nullable().default(null),
  })
  .refine((w) => w.start < w.end, { message: 'A window ends after it starts', path: ['end'] });

export const createBakeDaySchema = z
  .strictObject({
    date: z.iso.date({ error: 'Pick a date' }),
    place: z.string().trim().min(2, 'Name the place').max(120),
    address: z.string().trim().max(200).default(''),
    timeZone: z.string().trim().min(3, 'Choose a time zone').max(60),
    windows: z.array(pickupWindowInputSchema).min(1, 'Add at least one pickup window').max(12),
    menuItemIds: z.array(z.uuid()).min(1, 'Put at least one item on the menu').max(40),
    boxes: z
      .array(z.strictObject({ size: boxSizeSchema, pieces: z.number().int().min(1).max(60), priceCents: z.number().int('Whole cents').min(0).max(100_000) }))
      .min(1, 'Offer at least one box')
      .max(3),
    ringCapacity: z.number().int('Whole rings').min(0).max(10_000),
    holeCapacity: z.number().int('Whole holes').min(0).max(10_000),
    acceptAboveEquipment: z.boolean().default(false),
    /** When pre-orders open; default now. */
    ordersOpenAt: z.iso.datetime({ offset: true }).optional(),
    /** When pre-orders close; default worked back from the production schedule. */
    cutoffAt: z.iso.datetime({ offset: true }).optional(),
    publish: z.boolean().default(true),
  })
  .superRefine((d, ctx) => {
    const sorted = [...d.windows].sort((a, b) => a.start.localeCompare(b.start));
    for (let i = 1; i < sorted.length; i += 1) {
      if (sorted[i]!.start < sorted[i - 1]!.end) ctx.addIssue({ code: 'custom', path: ['windows'], message: 'Pickup windows must not overlap' });
    }
    const sizes = d.boxes.map((b) => b.size);
    if (new Set(sizes).size !== sizes.length) ctx.addIssue({ code: 'custom', path: ['boxes'], message: 'Each box size once' });
  });
export type CreateBakeDayInput = z.infer<typeof createBakeDaySchema>;

export const staffMemberInputSchema = z.strictObject({
  email: z.email('Enter an e-mail address').transform((e) => e.toLowerCase()),
  name: z.string().trim().max(100).default(''),
  role: roleSchema.exclude(['customer']),
});
export type StaffMemberInput = z.infer<typeof staffMemberInputSchema>;

export const changeRoleSchema = z.strictObject({ role: roleSchema });

export const staffMemberViewSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema.exclude(['customer']),
  /** False until they have signed in once with this (verified) address. */
  signedIn: z.boolean(),
});
export type StaffMemberView = z.infer<typeof staffMemberViewSchema>;

/** A menu item as the staff manage it: the customer's view without the description, with whether it is on sale. */
export const menuItemAdminViewSchema = menuItemViewSchema.omit({ description: true }).extend({
  allergens: z.array(z.string()),
  active: z.boolean(),
});
export type MenuItemAdminView = z.infer<typeof menuItemAdminViewSchema>;
