import { Router } from 'express';
import { shopSettingsInputSchema, type ShopSettingsInput } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { getShopSettings, publicShop, saveShopSettings } from '../services/shop/shop-settings.js';

export const shopSettingsRouter = Router();

/** What every customer sees: the shop's name and its refund policy. */
shopSettingsRouter.get('/api/shop', async (_req, res) => {
  res.set('Cache-Control', 'no-cache').json(await publicShop());
});

shopSettingsRouter.get('/api/staff/shop-settings', requireRole('owner'), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await getShopSettings());
});

shopSettingsRouter.put('/api/staff/shop-settings', requireRole('owner'), validate('body', shopSettingsInputSchema), async (req, res) => {
  res.json(await saveShopSettings(currentUser(req), valid<ShopSettingsInput>(res, 'body')));
});
