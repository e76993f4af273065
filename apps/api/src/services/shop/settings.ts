import type { Transaction } from 'sequelize';
import type { ShopLogoView, ShopSettingsView } from '@fryline/schemas';
import { ShopSettings } from '../../db/models/index.js';
import { findPhotos } from '../../db/queries/menu-photos.js';
import { context } from '../../integrations/context.js';
import { ReadCache } from '../../lib/read-cache.js';
import { toPhotoView } from '../menu/photo-view.js';

/** Said to customers before they pay, until the owner writes their own. */
export const DEFAULT_REFUND_POLICY =
  'You can cancel your order for a full refund until orders close for your bake day. After that we refund only if we call the bake day off or cannot make your order. Boxes not collected by the end of the pickup window are not refunded.';

export type Settings = ShopSettingsView & {
  /** An absolute URL of the shop's logo (from PUBLIC_URL, for e-mails), or null when it has none. */
  logoUrl: string | null;
  /** The logo's stored sizes, as this site serves them (same-origin paths), or null. */
  logo: ShopLogoView | null;
  /** A customer's share of one bake day: rings and holes together, over all their orders. */
  maxPiecesPerCustomer: number;
};

/** Three dozen: a family's weekend order, not a reseller's (common practice, no source). */
export const DEFAULT_MAX_PIECES = 36;

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
    logoUrl: null,
    logo: null,
    maxPiecesPerCustomer: row?.maxPiecesPerCustomer ?? DEFAULT_MAX_PIECES,
  };
}

const cache = new ReadCache<Settings>();

/** Call after changing the shop settings, so this process reads them again at once. */
export const forgetShopSettings = () => cache.forget();

/** The e-mails' logo: the size nearest twice the 120 px they show it at. */
const MAIL_LOGO_WIDTH = 240;

async function read(transaction?: Transaction): Promise<Settings> {
  const row = await ShopSettings.findByPk(1, { transaction });
  const view = settingsView(row);
  const stored = row?.logoPhotoId ? (await findPhotos([row.logoPhotoId], transaction)).get(row.logoPhotoId) : undefined;
  if (!stored) return view;
  const logo = toPhotoView(stored);
  const forMail = logo.files.find((f) => f.width >= MAIL_LOGO_WIDTH) ?? logo.files[logo.files.length - 1]!;
  return { ...view, logo, logoUrl: `${context().config.publicUrl}${forMail.url}` };
}

/** The shop's settings; inside a transaction always read fresh, otherwise possibly from the read cache. */
export async function shopSettings(transaction?: Transaction): Promise<Settings> {
  if (transaction) return read(transaction);
  return cache.get('shop', () => read());
}
