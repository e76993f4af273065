import { z } from 'zod';
import { menuPhotoViewSchema } from './menu-photos.js';
import { allergenSchema } from './bake-days.js';
import { pieceKindSchema } from './boxes.js';

// The owner's menu: what can go in a box. Archived items stay in the
// database so past orders keep pointing at them, but are not offered again.

/** Largest photo upload accepted, in bytes (8 MB). */
export const MENU_PHOTO_MAX_BYTES = 8 * 1024 * 1024;
/** The widths each photo is stored at, in pixels. */
export const MENU_PHOTO_WIDTHS = [320, 640, 1280] as const;
/** The multipart field that carries the photo. */
export const MENU_PHOTO_FIELD = 'photo';

const text = (label: string, min: number, max: number) =>
  z.string({ error: `${label} is missing` }).trim().min(min, min === 1 ? `Give the ${label.toLowerCase()}` : `${label} needs at least ${min} characters`).max(max, `${label} is at most ${max} characters`);

const menuItemFields = {
  name: text('Name', 2, 80),
  kind: pieceKindSchema,
  flavour: text('Flavour', 1, 60),
  /** The glaze as customers read it. */
  glaze: z.string().trim().max(60, 'Glaze is at most 60 characters').default(''),
  /** The glaze recipe in the production settings that this item takes; null for none. */
  glazeRecipeId: z.string().trim().min(1).max(40).nullable().default(null),
  allergens: z
    .array(allergenSchema, { error: 'Choose from the listed allergens' })
    .max(9)
    .refine((list) => new Set(list).size === list.length, 'Each allergen once')
    .default([]),
  description: z.string().trim().max(280, 'Keep the description under 280 characters').default(''),
  surchargeCents: z
    .number({ error: 'Extra charge must be an amount' })
    .int('Extra charge must be whole cents')
    .min(0, "Extra charge can't be negative")
    .max(5000, 'Extra charge is at most $50.00'),
};

export const menuItemInputSchema = z.strictObject(menuItemFields);
export type MenuItemInput = z.infer<typeof menuItemInputSchema>;

/** An edit sends only what changed. */
export const menuItemPatchSchema = z
  .strictObject({
    name: menuItemFields.name,
    kind: pieceKindSchema,
    flavour: menuItemFields.flavour,
    glaze: z.string().trim().max(60, 'Glaze is at most 60 characters'),
    glazeRecipeId: z.string().trim().min(1).max(40).nullable(),
    allergens: menuItemFields.allergens.unwrap(),
    description: z.string().trim().max(280, 'Keep the description under 280 characters'),
    surchargeCents: menuItemFields.surchargeCents,
  })
  .partial()
  .refine((patch) => Object.keys(patch).length > 0, 'Nothing to change');
export type MenuItemPatch = z.infer<typeof menuItemPatchSchema>;

export { menuPhotoFileSchema, menuPhotoViewSchema, type MenuPhotoFile, type MenuPhotoView } from './menu-photos.js';

/** What the owner's menu pages show beyond the staff list: the description, the glaze recipe, the photo, archiving. */
export const menuItemOwnerFields = {
  glazeRecipeId: z.string().nullable().optional(),
  description: z.string().optional(),
  archivedAt: z.string().nullable().optional(),
  photo: menuPhotoViewSchema.nullable().optional(),
  /** How many orders include it (an archived item stays for them). */
  orderCount: z.number().int().optional(),
};
