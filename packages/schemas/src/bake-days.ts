import { z } from 'zod';
import type { BoxSize, PieceKind } from './boxes.js';
import type { MenuPhotoView } from './menu.js';

export const bakeDayStatuses = ['upcoming', 'open', 'closed', 'done'] as const;
export type BakeDayStatus = (typeof bakeDayStatuses)[number];

/** The allergens a menu item can declare (the nine major US food allergens, U.S. FDA). */
export const allergens = [
  'wheat', 'milk', 'eggs', 'soybeans', 'peanuts', 'tree nuts', 'sesame', 'fish', 'crustacean shellfish',
] as const;
export const allergenSchema = z.enum(allergens);
export type Allergen = z.infer<typeof allergenSchema>;

export interface PickupWindowView {
  id: string;
  startsAt: string;
  endsAt: string;
  /** Orders still accepted in this window, or null when the window has no cap. */
  ordersLeft: number | null;
}

export interface BoxView {
  size: BoxSize;
  pieces: number;
  priceCents: number;
  label: string;
}

export interface MenuItemView {
  id: string;
  name: string;
  flavour: string;
  glaze: string;
  description: string;
  kind: PieceKind;
  surchargeCents: number;
  allergens: Allergen[];
  /** The item's photo, or null/absent when it has none. */
  photo?: MenuPhotoView | null;
}

export interface BakeDayView {
  id: string;
  date: string;
  place: string;
  address: string;
  timeZone: string;
  status: BakeDayStatus;
  ordersOpenAt: string;
  cutoffAt: string;
  remaining: { rings: number; holes: number };
  capacity: { rings: number; holes: number };
  pickupWindows: PickupWindowView[];
  boxes: BoxView[];
  menu: MenuItemView[];
  tax: TaxSetting;
}

export const taxSettingSchema = z.object({
  mode: z.enum(['included', 'added']),
  /** Rate in basis points: 825 = 8.25 %. */
  rateBasisPoints: z.number().int().min(0).max(5000),
});
export type TaxSetting = z.infer<typeof taxSettingSchema>;
