import { SHOP_LOGO_WIDTHS, type Me, type ShopLogoView } from '@fryline/schemas';
import { database } from '../../db/sequelize.js';
import { ShopSettings } from '../../db/models/index.js';
import { deletePhoto, findPhotos, insertPhoto } from '../../db/queries/menu-photos.js';
import { AppError } from '../../lib/app-error.js';
import { audit } from '../audit/audit.js';
import { processPhoto } from '../menu/photo-processing.js';
import { toPhotoView } from '../menu/photo-view.js';
import { forgetShopSettings } from './settings.js';

/**
 * The business's logo goes through the menu photos' checks (by content,
 * EXIF and location left behind, resized to WebP) and is stored the same way;
 * a new logo replaces the old one, whose files go.
 */
export async function setShopLogo(owner: Me, bytes: Buffer): Promise<ShopLogoView> {
  const processed = await processPhoto(bytes, SHOP_LOGO_WIDTHS);
  const photoId = await database().transaction(async (transaction) => {
    const row = await ShopSettings.findByPk(1, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw new AppError('no_settings', 'Save the shop settings once before adding a logo', 409);
    const created = await insertPhoto({ width: processed.width, height: processed.height, uploadedBy: owner.id }, processed.files, transaction);
    const old = row.logoPhotoId;
    await row.update({ logoPhotoId: created }, { transaction });
    if (old) await deletePhoto(old, transaction);
    await audit(
      { actorId: owner.id, action: 'shop.logo', subjectType: 'shop', subjectId: '1', details: { width: processed.width, height: processed.height, bytesUploaded: bytes.length } },
      transaction,
    );
    return created;
  });
  forgetShopSettings();
  return toPhotoView((await findPhotos([photoId])).get(photoId)!);
}

/** Takes the logo away (the header shows the name alone); nothing to do when there is none. */
export async function removeShopLogo(owner: Me): Promise<void> {
  await database().transaction(async (transaction) => {
    const row = await ShopSettings.findByPk(1, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row?.logoPhotoId) return;
    const old = row.logoPhotoId;
    await row.update({ logoPhotoId: null }, { transaction });
    await deletePhoto(old, transaction);
    await audit({ actorId: owner.id, action: 'shop.logo_removed', subjectType: 'shop', subjectId: '1', details: {} }, transaction);
  });
  forgetShopSettings();
}
