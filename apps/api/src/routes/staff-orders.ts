import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { refundOrder } from '../services/orders/refunds.js';
import { AppError } from '../lib/app-error.js';

/** /api/staff/orders: what the owner does to one order. */
export const staffOrdersRouter = Router();

route(staffOrdersRouter, api.refundOrder, [requireRole('owner')], ({ req, params, body, now }) => {
  const key = req.get('idempotency-key');
  if (!key || key.length < 8 || key.length > 100) {
    throw new AppError('invalid', 'Send an Idempotency-Key header (8–100 characters) with each refund', 400);
  }
  return refundOrder(currentUser(req), params.id, body.amountCents, body.reason, key, now);
});
