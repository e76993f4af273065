import { z } from 'zod';
import { boxSizeSchema, pieceKindSchema } from './boxes.js';

export const bakeDayStatuses = ['upcoming', 'open', 'closed', 'done'] as const;
export const bakeDayStatusSchema = z.enum(bakeDayStatuses);
export type BakeDayStatus = z.infer<typeof bakeDayStatusSchema>;

/** The allergens a menu item can declare (the nine major US food allergens, U.S. FDA). */
export const allergens = [
  'wheat', 'milk', 'eggs', 'soybeans', 'peanuts', 'tree nuts', 'sesame', 'fish', 'crustacean shellfish',
] as const;
export const allergenSchema = z.enum(allergens);
export type Allergen = z.infer<typeof allergenSchema>;

export const taxSettingSchema = z.object({
  mode: z.enum(['included', 'added']),
  /** Rate in basis points: 825 = 8.25 %. */
  rateBasisPoints: z.number().int().min(0).max(5000),
});
export type TaxSetting = z.infer<typeof taxSettingSchema>;

export const pickupWindowViewSchema = z.object({
  id: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  /** Orders still accepted in this window, or null when the window has no cap. */
  ordersLeft: z.number().int().nullable(),
});
export type PickupWindowView = z.infer<typeof pickupWindowViewSchema>;

export const boxViewSchema = z.object({
  size: boxSizeSchema,
  pieces: z.number().int(),
  priceCents: z.number().int(),
  label: z.string(),
});
export type BoxView = z.infer<typeof boxViewSchema>;

export const menuItemViewSchema = z.object({
  id: z.string(),
  name: z.string(),
  flavour: z.string(),
  glaze: z.string(),
  description: z.string(),
  kind: pieceKindSchema,
  surchargeCents: z.number().int(),
  allergens: z.array(allergenSchema),
});
export type MenuItemView = z.infer<typeof menuItemViewSchema>;

const piecesSchema = z.object({ rings: z.number().int(), holes: z.number().int() });

export const bakeDayViewSchema = z.object({
  id: z.string(),
  date: z.string(),
  place: z.string(),
  address: z.string(),
  timeZone: z.string(),
  status: bakeDayStatusSchema,
  ordersOpenAt: z.string(),
  cutoffAt: z.string(),
  remaining: piecesSchema,
  capacity: piecesSchema,
  pickupWindows: z.array(pickupWindowViewSchema),
  boxes: z.array(boxViewSchema),
  menu: z.array(menuItemViewSchema),
  tax: taxSettingSchema,
});
export type BakeDayView = z.infer<typeof bakeDayViewSchema>;
