import { Router } from 'express';
import { shopRulesApi } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { getOrderLimit, setOrderLimit } from '../services/shop/rules.js';
import { listPaymentFlags } from '../db/queries/payment-flags.js';

/** /api/staff/order-limit and /api/staff/payment-flags: fair shares and payments that didn't match, for the owner. */
export const shopRulesRouter = Router();

route(shopRulesRouter, shopRulesApi.getOrderLimit, [requireRole('owner')], () => getOrderLimit());
route(shopRulesRouter, shopRulesApi.setOrderLimit, [requireRole('owner')], ({ req, body }) => setOrderLimit(currentUser(req), body));
route(shopRulesRouter, shopRulesApi.listPaymentFlags, [requireRole('owner')], () => listPaymentFlags(), { noStore: true });
