import type { Transaction } from 'sequelize';
import type { ShopSettingsView } from '@fryline/schemas';
import { ShopSettings } from '../../db/models/index.js';
import { context } from '../../integrations/context.js';

/** Said to customers before they pay, until the owner writes their own. */
export const DEFAULT_REFUND_POLICY =
  'You can cancel your order for a full refund until orders close for your bake day. After that we refund only if we call the bake day off or cannot make your order. Boxes not collected by the end of the pickup window are not refunded.';

export type Settings = ShopSettingsView;

/** The shop's settings as every part of the API reads them, with the defaults filled in. */
export function settingsView(row: ShopSettings | null): Settings {
  return {
    shopName: row?.shopName ?? 'Fryline',
    timeZone: row?.timeZone ?? 'UTC',
    currency: (row?.currency ?? 'usd') as Settings['currency'],
    tax: { mode: row?.taxMode ?? 'included', rateBasisPoints: row?.taxRateBp ?? 0 },
    holdMinutes: row?.holdMinutes ?? context().config.HOLD_MINUTES,
    noShowGraceMinutes: row?.noShowGraceMinutes ?? 30,
    refundPolicy: row?.refundPolicy || DEFAULT_REFUND_POLICY,
    updatedAt: row?.updatedAt?.toISOString() ?? null,
  };
}

export async function shopSettings(transaction?: Transaction): Promise<Settings> {
  return settingsView(await ShopSettings.findByPk(1, { transaction }));
}
