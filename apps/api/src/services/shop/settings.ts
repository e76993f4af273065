import type { Transaction } from 'sequelize';
import type { ShopInfo, TaxSetting } from '@fryline/schemas';
import { ShopSettings } from '../../db/models/index.js';
import { ReadCache } from '../../lib/read-cache.js';

export interface Settings {
  shopName: string;
  /** An absolute URL of the shop's logo, or null (no logo is stored yet). */
  logoUrl: string | null;
  currency: string;
  tax: TaxSetting;
  /** A customer's share of one bake day: rings and holes together, over all their orders. */
  maxPiecesPerCustomer: number;
}

/** Three dozen: a family's weekend order, not a reseller's (common practice, no source). */
export const DEFAULT_MAX_PIECES = 36;

const cache = new ReadCache<Settings>();

/** Call after changing the shop settings, so this process reads them again at once. */
export const forgetShopSettings = () => cache.forget();

/** The shop's settings; inside a transaction always read fresh, otherwise possibly from the read cache. */
export async function shopSettings(transaction?: Transaction): Promise<Settings> {
  if (transaction) return readSettings(transaction);
  return cache.get('shop', () => readSettings());
}

async function readSettings(transaction?: Transaction): Promise<Settings> {
  const row = await ShopSettings.findByPk(1, { transaction });
  return {
    shopName: row?.shopName ?? 'Fryline',
    logoUrl: null,
    currency: row?.currency ?? 'usd',
    tax: { mode: row?.taxMode ?? 'included', rateBasisPoints: row?.taxRateBp ?? 0 },
    maxPiecesPerCustomer: row?.maxPiecesPerCustomer ?? DEFAULT_MAX_PIECES,
  };
}

/** The shop's public face: its name and logo. */
export async function shopInfo(): Promise<ShopInfo> {
  const { shopName, logoUrl } = await shopSettings();
  return { name: shopName, logoUrl };
}
