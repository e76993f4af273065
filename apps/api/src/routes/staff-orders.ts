import { Router } from 'express';
import { z } from 'zod';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { refundOrder } from '../services/refunds.js';
import { AppError } from '../lib/app-error.js';

export const staffOrdersRouter = Router();

const refundBody = z.strictObject({
  amountCents: z.number().int('Amount must be whole cents').min(1, 'Amount must be at least 1 cent'),
  reason: z.string().trim().min(1, 'Give a reason').max(200),
});

staffOrdersRouter.post(
  '/api/staff/orders/:id/refunds',
  requireRole('owner'),
  validate('params', z.object({ id: z.uuid('Unknown order') })),
  validate('body', refundBody),
  async (req, res) => {
    const key = req.get('idempotency-key');
    if (!key || key.length < 8 || key.length > 100) {
      throw new AppError('invalid', 'Send an Idempotency-Key header (8–100 characters) with each refund', 400);
    }
    const body = valid<z.infer<typeof refundBody>>(res, 'body');
    res.status(201).json(await refundOrder(currentUser(req), valid<{ id: string }>(res, 'params').id, body.amountCents, body.reason, key));
  },
);
