import type { Me, PublicShopView, ShopSettingsInput, ShopSettingsView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { ShopSettings } from '../../db/models/index.js';
import { audit } from '../audit/audit.js';
import { forgetShopSettings, settingsView, shopSettings } from './settings.js';

export async function getShopSettings(): Promise<ShopSettingsView> {
  const { shopName, timeZone, currency, tax, holdMinutes, noShowGraceMinutes, refundPolicy, updatedAt } = await shopSettings();
  return { shopName, timeZone, currency, tax, holdMinutes, noShowGraceMinutes, refundPolicy, updatedAt };
}

/** What every customer sees: the business's name and logo, and the terms shown before paying. */
export async function publicShop(): Promise<PublicShopView> {
  const { shopName, logo, currency, timeZone, refundPolicy, holdMinutes } = await shopSettings();
  // the storefront loads images from its own origin only, so the logo's URL here is this site's path
  return { name: shopName, logoUrl: logo?.src ?? null, ...(logo ? { logo } : {}), shopName, currency, timeZone, refundPolicy, holdMinutes };
}

/** Saves the whole form; the audit entry lists each setting that changed, from and to. */
export async function saveShopSettings(owner: Me, input: ShopSettingsInput): Promise<ShopSettingsView> {
  await database().transaction(async (transaction) => {
    const row = await ShopSettings.findByPk(1, { transaction, lock: transaction.LOCK.UPDATE });
    const before = settingsView(row);
    const values = {
      shopName: input.shopName,
      timeZone: input.timeZone,
      currency: input.currency,
      taxMode: input.tax.mode,
      taxRateBp: input.tax.rateBasisPoints,
      holdMinutes: input.holdMinutes,
      noShowGraceMinutes: input.noShowGraceMinutes,
      refundPolicy: input.refundPolicy,
      updatedBy: owner.id,
    };
    if (row) await row.update(values, { transaction });
    else await ShopSettings.create({ id: 1, ...values }, { transaction });
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    for (const key of Object.keys(input) as Array<keyof ShopSettingsInput>) {
      if (JSON.stringify(before[key]) !== JSON.stringify(input[key])) changes[key] = { from: before[key], to: input[key] };
    }
    if (Object.keys(changes).length > 0) {
      await audit({ actorId: owner.id, action: 'shop.settings', subjectType: 'shop_settings', subjectId: '1', details: { changes } }, transaction);
    }
  });
  forgetShopSettings();
  return getShopSettings();
}
