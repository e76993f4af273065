import type { Transaction } from 'sequelize';
import type { ShopInfo, TaxSetting } from '@fryline/schemas';
import { ShopSettings } from '../../db/models/index.js';

export interface Settings {
  shopName: string;
  /** An absolute URL of the shop's logo, or null (no logo is stored yet). */
  logoUrl: string | null;
  currency: string;
  tax: TaxSetting;
}

export async function shopSettings(transaction?: Transaction): Promise<Settings> {
  const row = await ShopSettings.findByPk(1, { transaction });
  return {
    shopName: row?.shopName ?? 'Fryline',
    logoUrl: null,
    currency: row?.currency ?? 'usd',
    tax: { mode: row?.taxMode ?? 'included', rateBasisPoints: row?.taxRateBp ?? 0 },
  };
}

/** The shop's public face: its name and logo. */
export async function shopInfo(): Promise<ShopInfo> {
  const { shopName, logoUrl } = await shopSettings();
  return { name: shopName, logoUrl };
}
