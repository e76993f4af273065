import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { refundRequestSchema } from '@fryline/schemas';
import { refundOrder } from '../services/orders/refunds.js';
import { listBakeDayOrders } from '../services/orders/staff-orders.js';
import { AppError } from '../lib/app-error.js';

export const staffOrdersRouter = Router();

staffOrdersRouter.get('/api/staff/bake-days/:id/orders', requireRole('counter'), validate('params', z.object({ id: z.uuid('Unknown bake day') })), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await listBakeDayOrders(valid<{ id: string }>(res, 'params').id));
});

staffOrdersRouter.post(
  '/api/staff/orders/:id/refunds',
  requireRole('owner'),
  validate('params', z.object({ id: z.uuid('Unknown order') })),
  validate('body', refundRequestSchema),
  async (req, res) => {
    const key = req.get('idempotency-key');
    if (!key || key.length < 8 || key.length > 100) {
      throw new AppError('invalid', 'Send an Idempotency-Key header (8–100 characters) with each refund', 400);
    }
    const body = valid<z.infer<typeof refundRequestSchema>>(res, 'body');
    res.status(201).json(await refundOrder(currentUser(req), valid<{ id: string }>(res, 'params').id, body.amountCents, body.reason, key));
  },
);
