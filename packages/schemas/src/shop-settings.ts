import { z } from 'zod';
import { taxSettingSchema } from './bake-days.js';
import { menuPhotoViewSchema } from './menu-photos.js';
import { shopCurrencies } from './money.js';
import { shopInfoSchema } from './shop.js';

// What the owner sets for the whole shop.


/** True when the runtime knows this IANA time zone name. */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return name.includes('/') || name === 'UTC';
  } catch {
    return false;
  }
}

const minutes = (label: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a number of minutes` })
    .int(`${label} must be whole minutes`)
    .min(min, `${label} must be at least ${min} minutes`)
    .max(max, `${label} is at most ${max} minutes`);

export const shopSettingsInputSchema = z.strictObject({
  shopName: z.string().trim().min(2, 'Give the shop a name').max(80, 'At most 80 characters'),
  timeZone: z.string().trim().refine(isTimeZone, 'Not a time zone name (like America/Denver)'),
  currency: z.enum(shopCurrencies, { error: 'Choose one of the listed currencies' }),
  tax: taxSettingSchema,
  holdMinutes: minutes('A hold', 5, 120),
  noShowGraceMinutes: minutes('The grace period', 0, 1440),
  refundPolicy: z.string().trim().min(10, 'Write a sentence or two customers read before they pay').max(2000, 'At most 2,000 characters'),
});
export type ShopSettingsInput = z.infer<typeof shopSettingsInputSchema>;

export const shopSettingsViewSchema = shopSettingsInputSchema.extend({ updatedAt: z.string().nullable() });
export type ShopSettingsView = z.infer<typeof shopSettingsViewSchema>;

/** The multipart field that carries the logo. */
export const SHOP_LOGO_FIELD = 'logo';
/** The widths the logo is stored at, in pixels: the shop's header shows it about 40 px high, e-mails 120 px wide, each at up to twice that for sharp screens. */
export const SHOP_LOGO_WIDTHS = [120, 240, 480] as const;

/** The logo as an <img> needs it: its sizes for srcset, and its shape so the header keeps its place. */
export const shopLogoViewSchema = menuPhotoViewSchema;
export type ShopLogoView = z.infer<typeof shopLogoViewSchema>;

/** What the shop shows every customer (GET /api/shop). */
export const publicShopViewSchema = shopInfoSchema.extend({
  /** The logo's sizes (logoUrl is one of them, on this site); left out when the shop has none. */
  logo: shopLogoViewSchema.optional(),
  shopName: z.string(),
  currency: z.string(),
  timeZone: z.string(),
  refundPolicy: z.string(),
  /** How long a box is held while the customer pays. */
  holdMinutes: z.number().int(),
});
export type PublicShopView = z.infer<typeof publicShopViewSchema>;
