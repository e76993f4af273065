import type { CounterSettings } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { ShopSettings } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { forgetShopSettings } from '../shop/settings.js';

export async function counterSettings(): Promise<CounterSettings> {
  const row = await ShopSettings.findByPk(1, { attributes: ['noShowGraceMinutes', 'handOverUndoSeconds'] });
  return { noShowGraceMinutes: row?.noShowGraceMinutes ?? 30, handOverUndoSeconds: row?.handOverUndoSeconds ?? 15 };
}

/** The owner sets (the same columns as the shop settings page) how long after a window closes a no-show may be marked, and how long a hand-over can be undone. */
export async function saveCounterSettings(userId: string, settings: CounterSettings): Promise<CounterSettings> {
  await database().transaction(async (transaction) => {
    const [changed] = await ShopSettings.update(settings, { where: { id: 1 }, transaction });
    if (changed === 0) throw notFound('Shop settings');
    await audit({ actorId: userId, action: 'shop.counter_settings', subjectType: 'shop_settings', subjectId: '1', details: { ...settings } }, transaction);
  });
  // the shop settings page reads the same grace through the short read cache
  forgetShopSettings();
  return counterSettings();
}
