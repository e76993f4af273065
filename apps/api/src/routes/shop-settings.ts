import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { logoUpload } from '../middleware/photo-upload.js';
import { route } from '../lib/route.js';
import { removeShopLogo, setShopLogo } from '../services/shop/logo.js';
import { getShopSettings, publicShop, saveShopSettings } from '../services/shop/shop-settings.js';

/** /api/shop (what every customer sees) and /api/staff/shop-settings (the owner's form). */
export const shopSettingsRouter = Router();

route(shopSettingsRouter, api.getShop, [], () => publicShop());

route(shopSettingsRouter, api.getShopSettings, [requireRole('owner')], () => getShopSettings(), { noStore: true });

route(shopSettingsRouter, api.saveShopSettings, [requireRole('owner')], ({ req, body }) => saveShopSettings(currentUser(req), body));

// the owner's role is checked before a byte of the upload is read
route(shopSettingsRouter, api.uploadShopLogo, [requireRole('owner'), logoUpload], ({ req }) => setShopLogo(currentUser(req), req.file!.buffer));

route(shopSettingsRouter, api.removeShopLogo, [requireRole('owner')], ({ req }) => removeShopLogo(currentUser(req)));
