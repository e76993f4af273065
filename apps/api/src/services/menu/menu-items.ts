import { QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import type { Me, MenuItemAdminView, MenuItemInput, MenuItemPatch, MenuPhotoView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { MenuItem } from '../../db/models/index.js';
import { deletePhoto, findPhotos, insertPhoto } from '../../db/queries/menu-photos.js';
import { AppError, notFound } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { getProductionSettings } from '../production/production.js';
import { processPhoto } from './photo-processing.js';
import { photoViewsFor, toPhotoView } from './photo-view.js';

const invalidField = (field: string, message: string) => new AppError('invalid', `${field}: ${message}`, 400, { fields: { [field]: message } });

function toAdminView(item: MenuItem, photo: MenuPhotoView | null, orderCount: number): MenuItemAdminView {
  return {
    id: item.id,
    name: item.name,
    flavour: item.flavour,
    glaze: item.glaze,
    glazeRecipeId: item.glazeRecipeId,
    kind: item.kind,
    surchargeCents: item.surchargeCents,
    allergens: item.allergens,
    description: item.description,
    active: item.active,
    archivedAt: item.archivedAt?.toISOString() ?? null,
    photo,
    orderCount,
  };
}

async function orderCounts(ids: string[]): Promise<Map<string, number>> {
  if (ids.length === 0) return new Map();
  const rows = await database().query<{ id: string; n: number }>(
    `SELECT menu_item_id AS id, count(DISTINCT b.order_id) AS n
       FROM order_lines l JOIN order_boxes b ON b.id = l.order_box_id
      WHERE l.menu_item_id IN (:ids) GROUP BY menu_item_id`,
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.id, Number(r.n)]));
}

async function viewsOf(items: MenuItem[]): Promise<MenuItemAdminView[]> {
  const [photos, counts] = await Promise.all([photoViewsFor(items), orderCounts(items.map((i) => i.id))]);
  return items.map((i) => toAdminView(i, (i.photoId && photos.get(i.photoId)) || null, counts.get(i.id) ?? 0));
}

/** Every menu item, archived ones last, for the staff. */
export async function listMenuItems(): Promise<MenuItemAdminView[]> {
  const items = await MenuItem.findAll({ order: [['active', 'DESC'], ['sortOrder', 'ASC'], ['name', 'ASC']] });
  return viewsOf(items);
}

export async function getMenuItem(id: string): Promise<MenuItemAdminView> {
  const item = await MenuItem.findByPk(id);
  if (!item) throw notFound('Menu item');
  return (await viewsOf([item]))[0]!;
}

/** The glaze recipe must be one of the production settings' recipes; its name is the default label. */
async function checkGlaze(glazeRecipeId: string | null | undefined, glaze: string | undefined): Promise<{ glaze?: string }> {
  if (glazeRecipeId === undefined || glazeRecipeId === null) return glaze === undefined ? {} : { glaze };
  const { glazes } = await getProductionSettings();
  const recipe = glazes.find((g) => g.id === glazeRecipeId);
  if (!recipe) throw invalidField('glazeRecipeId', 'That glaze recipe is not in the production settings any more');
  return { glaze: glaze?.trim() ? glaze : recipe.name };
}

function nameTaken(err: unknown): never {
  if (err instanceof UniqueConstraintError) {
    throw new AppError('name_taken', 'name: The menu already has an item of this kind with that name', 409, {
      fields: { name: 'The menu already has an item of this kind with that name' },
    });
  }
  throw err;
}

export async function createMenuItem(owner: Me, input: MenuItemInput): Promise<MenuItemAdminView> {
  const { glaze } = await checkGlaze(input.glazeRecipeId, input.glaze);
  try {
    const item = await database().transaction(async (transaction) => {
      const last = (await MenuItem.max<number, MenuItem>('sortOrder', { transaction })) ?? -1;
      const created = await MenuItem.create({ ...input, glaze: glaze ?? input.glaze, sortOrder: last + 1 }, { transaction });
      await audit(
        {
          actorId: owner.id,
          action: 'menu.created',
          subjectType: 'menu_item',
          subjectId: created.id,
          details: { name: created.name, kind: created.kind, surchargeCents: created.surchargeCents, allergens: created.allergens },
        },
        transaction,
      );
      return created;
    });
    return (await viewsOf([item]))[0]!;
  } catch (err) {
    return nameTaken(err);
  }
}

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** Changes what the owner sent; a change of the extra charge is also logged as a price change. */
export async function updateMenuItem(owner: Me, id: string, patch: MenuItemPatch): Promise<MenuItemAdminView> {
  try {
    const item = await database().transaction(async (transaction) => {
      const row = await MenuItem.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw notFound('Menu item');
      const recipeId = patch.glazeRecipeId === undefined ? undefined : patch.glazeRecipeId;
      const next: MenuItemPatch = { ...patch, ...(await checkGlaze(recipeId, patch.glaze)) };
      const changes: Record<string, { from: unknown; to: unknown }> = {};
      for (const [key, value] of Object.entries(next)) {
        const before = row.get(key as keyof MenuItem);
        if (!sameValue(before, value)) changes[key] = { from: before, to: value };
      }
      if (Object.keys(changes).length === 0) return row;
      await row.update(next, { transaction });
      const { surchargeCents, ...rest } = changes;
      if (surchargeCents) {
        await audit(
          { actorId: owner.id, action: 'menu.price_changed', subjectType: 'menu_item', subjectId: row.id, details: { name: row.name, surchargeCents } },
          transaction,
        );
      }
      if (Object.keys(rest).length > 0) {
        await audit({ actorId: owner.id, action: 'menu.updated', subjectType: 'menu_item', subjectId: row.id, details: { name: row.name, changes: rest } }, transaction);
      }
      return row;
    });
    return (await viewsOf([item]))[0]!;
  } catch (err) {
    return nameTaken(err);
  }
}

/** Takes an item off the menu (or puts it back). Past orders keep pointing at it; it is never deleted. */
export async function setArchived(owner: Me, id: string, archived: boolean, now: Date): Promise<MenuItemAdminView> {
  const item = await database().transaction(async (transaction) => {
    const row = await MenuItem.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('Menu item');
    if (row.active === !archived) return row;
    await row.update({ active: !archived, archivedAt: archived ? now : null }, { transaction });
    await audit(
      { actorId: owner.id, action: archived ? 'menu.archived' : 'menu.restored', subjectType: 'menu_item', subjectId: row.id, details: { name: row.name } },
      transaction,
    );
    return row;
  });
  return (await viewsOf([item]))[0]!;
}

async function replacePhoto(row: MenuItem, photoId: string | null, transaction: Transaction) {
  const old = row.photoId;
  await row.update({ photoId }, { transaction });
  if (old) await deletePhoto(old, transaction);
}

/**
 * Stores a new photo for an item: checked and resized first, so nothing is
 * written unless the whole photo is good; the old photo goes.
 */
export async function setPhoto(owner: Me, id: string, bytes: Buffer): Promise<MenuPhotoView> {
  if (!(await MenuItem.findByPk(id))) throw notFound('Menu item');
  const processed = await processPhoto(bytes);
  const photoId = await database().transaction(async (transaction) => {
    const row = await MenuItem.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('Menu item');
    const created = await insertPhoto({ width: processed.width, height: processed.height, uploadedBy: owner.id }, processed.files, transaction);
    await replacePhoto(row, created, transaction);
    await audit(
      {
        actorId: owner.id,
        action: 'menu.photo',
        subjectType: 'menu_item',
        subjectId: row.id,
        details: { name: row.name, width: processed.width, height: processed.height, bytesUploaded: bytes.length },
      },
      transaction,
    );
    return created;
  });
  const stored = await findPhotos([photoId]);
  return toPhotoView(stored.get(photoId)!);
}

export async function removePhoto(owner: Me, id: string): Promise<void> {
  await database().transaction(async (transaction) => {
    const row = await MenuItem.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('Menu item');
    if (!row.photoId) return;
    await replacePhoto(row, null, transaction);
    await audit({ actorId: owner.id, action: 'menu.photo_removed', subjectType: 'menu_item', subjectId: row.id, details: { name: row.name } }, transaction);
  });
}
