import express, { Router } from 'express';
import type Stripe from 'stripe';
import { api, type ResponseOf } from '@fryline/schemas';
import { AppError } from '../lib/app-error.js';
import { context } from '../integrations/context.js';
import { handlePaymentEvent } from '../services/payments/payment-events.js';

export const webhooksRouter = Router();

/** Payment events: raw body, signature checked by the SDK, applied once. */
webhooksRouter.post(api.paymentsWebhook.path, express.raw({ type: '*/*', limit: '512kb' }), async (req, res) => {
  const { payments, config } = context();
  const signature = req.get('stripe-signature');
  if (!signature || !Buffer.isBuffer(req.body)) throw new AppError('bad_signature', 'Missing signature', 400);
  let event: Stripe.Event;
  try {
    event = payments.webhooks.constructEvent(req.body, signature, config.STRIPE_WEBHOOK_SECRET, 300);
  } catch {
    throw new AppError('bad_signature', 'The signature does not match', 400);
  }
  const answer: ResponseOf<typeof api.paymentsWebhook> = { received: true, result: await handlePaymentEvent(event, res.locals.now) };
  res.json(answer);
});
