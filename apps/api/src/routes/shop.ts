import { Router } from 'express';
import { api } from '@fryline/schemas';
import { route } from '../lib/route.js';
import { shopInfo } from '../services/shop/settings.js';

/** /api/shop: the business's own name and logo, public. */
export const shopRouter = Router();

route(shopRouter, api.getShop, [], () => shopInfo());
