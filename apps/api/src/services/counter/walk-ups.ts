import type { Me, WalkUpSale, WalkUpSaleInput } from '@fryline/schemas';
import { insertWalkUpSale, surplusLeft, takeSurplus } from '../../db/queries/surplus.js';
import { BakeDay, MenuItem } from '../../db/models/index.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { once } from './idempotency.js';
import { ensureSurplus } from './surplus.js';

/**
 * Records a walk-up sale of the surplus: items and quantities, cash or card
 * (taken on a separate reader; Fryline records it and charges nothing), and
 * the amount. Each item is taken by one conditional UPDATE, in a fixed order
 * so two sales never wait on each other in a circle; if any item has run
 * out, nothing of the sale is kept.
 */
export async function sellWalkUp(user: Me, bakeDayId: string, input: WalkUpSaleInput, key: string | null, now: Date): Promise<WalkUpSale> {
  const day = await BakeDay.findByPk(bakeDayId, { attributes: ['id', 'status'] });
  if (!day || day.status === 'draft') throw notFound('Bake day');
  if (day.status === 'cancelled') throw new AppError('bake_day_cancelled', 'This bake day was cancelled', 409);
  await ensureSurplus(bakeDayId, now);
  const names = new Map(
    (await MenuItem.findAll({ where: { id: input.items.map((i) => i.menuItemId) }, attributes: ['id', 'name', 'kind'] })).map((m) => [m.id, m]),
  );
  const items = [...input.items].sort((a, b) => a.menuItemId.localeCompare(b.menuItemId));

  return once({ key, userId: user.id, action: `walk-up:${bakeDayId}`, status: 201 }, async (transaction): Promise<WalkUpSale> => {
    for (const item of items) {
      const menuItem = names.get(item.menuItemId);
      const left = await takeSurplus(bakeDayId, item.menuItemId, item.quantity, transaction);
      if (left !== null) continue;
      if (!menuItem) throw new AppError('invalid', 'That item is not on this bake day’s menu', 400, { fields: { items: 'Unknown menu item' } });
      const stillLeft = await surplusLeft(bakeDayId, item.menuItemId, transaction);
      if (stillLeft === null) throw new AppError('invalid', `${menuItem.name} is not on this bake day’s menu`, 400, { fields: { items: `${menuItem.name} is not on this bake day’s menu` } });
      throw new AppError(
        'surplus_gone',
        stillLeft === 0 ? `No ${menuItem.name} left` : `Only ${stillLeft} ${menuItem.name} left (this sale wanted ${item.quantity})`,
        409,
        { menuItemId: item.menuItemId, name: menuItem.name, left: stillLeft, wanted: item.quantity },
      );
    }
    const sale = await insertWalkUpSale({ bakeDayId, method: input.method, amountCents: input.amountCents, soldBy: user.id, idempotencyKey: key, soldAt: now, items }, transaction);
    await audit(
      { actorId: user.id, action: 'walk_up.sold', subjectType: 'walk_up_sale', subjectId: sale.id, details: { bakeDayId, method: input.method, amountCents: input.amountCents, items } },
      transaction,
    );
    return {
        id: sale.id,
        bakeDayId,
        method: input.method,
        amountCents: input.amountCents,
        soldAt: new Date(sale.sold_at).toISOString(),
        soldBy: user.name || user.email,
        items: input.items.map((i) => ({ menuItemId: i.menuItemId, name: names.get(i.menuItemId)?.name ?? '', kind: names.get(i.menuItemId)?.kind ?? 'ring', quantity: i.quantity })),
    };
  });
}
