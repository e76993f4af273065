import type { Transaction } from 'sequelize';
import type { TaxSetting } from '@fryline/schemas';
import { ShopSettings } from '../../db/models/index.js';

export interface Settings {
  shopName: string;
  currency: string;
  tax: TaxSetting;
}

export async function shopSettings(transaction?: Transaction): Promise<Settings> {
  const row = await ShopSettings.findByPk(1, { transaction });
  return {
    shopName: row?.shopName ?? 'Fryline',
    currency: row?.currency ?? 'usd',
    tax: { mode: row?.taxMode ?? 'included', rateBasisPoints: row?.taxRateBp ?? 0 },
  };
}
