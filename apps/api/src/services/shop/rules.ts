import type { Me, OrderLimit } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { ShopSettings } from '../../db/models/index.js';
import { audit } from '../audit/audit.js';
import { forgetShopSettings, shopSettings } from './settings.js';

/** The owner's limit on pieces per customer per bake day. */
export async function getOrderLimit(): Promise<OrderLimit> {
  return database().transaction(async (transaction) => ({ maxPiecesPerCustomer: (await shopSettings(transaction)).maxPiecesPerCustomer }));
}

/** Sets it; orders already placed keep what they have, new orders and waitlist requests follow the new limit. */
export async function setOrderLimit(owner: Me, limit: OrderLimit): Promise<OrderLimit> {
  await database().transaction(async (transaction) => {
    await ShopSettings.update({ maxPiecesPerCustomer: limit.maxPiecesPerCustomer }, { where: { id: 1 }, transaction });
    await audit({ actorId: owner.id, action: 'shop.order_limit', subjectType: 'shop', subjectId: '1', details: { ...limit } }, transaction);
  });
  forgetShopSettings();
  return getOrderLimit();
}
