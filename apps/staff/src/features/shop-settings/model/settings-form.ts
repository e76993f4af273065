import { z } from 'zod';
import { shopSettingsInputSchema, type ShopSettingsInput, type ShopSettingsView } from '@fryline/schemas';

/**
 * The tax rate as a person types it, in percent with up to two decimals
 * ("8.25"), read as basis points on the digits (never a float): 8.25 % → 825.
 */
export const percentTextSchema = z.string().transform((text, ctx) => {
  const match = /^\s*(\d{1,2})(?:\.(\d{0,2}))?\s*%?\s*$/.exec(text);
  if (!match) {
    ctx.addIssue({ code: 'custom', message: 'Enter a rate like 8.25 (percent, at most two decimals)' });
    return z.NEVER;
  }
  return Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
});

export const percentText = (basisPoints: number) => `${Math.floor(basisPoints / 100)}.${String(basisPoints % 100).padStart(2, '0')}`;

const minutesText = z.union([z.number(), z.string().trim().min(1, 'Give a number of minutes').pipe(z.coerce.number({ error: 'Give a number of minutes' }))]);

export const settingsFormSchema = shopSettingsInputSchema.extend({
  tax: z.strictObject({
    mode: shopSettingsInputSchema.shape.tax.shape.mode,
    rateBasisPoints: percentTextSchema.pipe(shopSettingsInputSchema.shape.tax.shape.rateBasisPoints.max(5000, 'At most 50 %')),
  }),
  holdMinutes: minutesText.pipe(shopSettingsInputSchema.shape.holdMinutes),
  noShowGraceMinutes: minutesText.pipe(shopSettingsInputSchema.shape.noShowGraceMinutes),
});
export type SettingsFormValues = z.input<typeof settingsFormSchema>;

export function formFromSettings(view: ShopSettingsView): SettingsFormValues {
  return {
    shopName: view.shopName,
    timeZone: view.timeZone,
    currency: view.currency,
    tax: { mode: view.tax.mode, rateBasisPoints: percentText(view.tax.rateBasisPoints) },
    holdMinutes: String(view.holdMinutes),
    noShowGraceMinutes: String(view.noShowGraceMinutes),
    refundPolicy: view.refundPolicy,
  };
}

export type { ShopSettingsInput };
