import express, { Router, type Response } from 'express';
import { finishAuthentication, payWithCard, type NotPayableReason, type PayOutcome } from './card-payments.js';
import { catchUp } from './checkout.js';
import { checkoutPage, confirmationPage, noticePage, type CardFormValues } from './pay-page-html.js';
import type { PaymentsStore } from './state.js';
import type { CheckoutSession } from './types.js';

function text(value: unknown): string | undefined {
  return typeof value === 'string' ? value : undefined;
}

function showNotPayable(res: Response, session: CheckoutSession | undefined, reason: NotPayableReason, whilePaying: boolean): void {
  if (!session || reason === 'missing') {
    res.status(404).send(noticePage('Checkout not found', 'This checkout link is not valid. Nothing was charged.'));
    return;
  }
  if (reason === 'expired') {
    const back = session.cancel_url ? { href: session.cancel_url, label: 'Back to the shop' } : undefined;
    res.status(410).send(noticePage('This checkout has expired', 'The time to pay has run out. Nothing was charged; start again from the shop.', back));
    return;
  }
  res
    .status(whilePaying ? 409 : 200)
    .send(
      noticePage('This checkout is already paid', 'The payment for this checkout went through earlier. Nothing more was charged.', {
        href: session.success_url.split('{CHECKOUT_SESSION_ID}').join(session.id),
        label: 'Continue',
      }),
    );
}

function show(store: PaymentsStore, res: Response, outcome: PayOutcome, values: CardFormValues): void {
  switch (outcome.kind) {
    case 'paid':
      res.redirect(303, outcome.redirectUrl);
      return;
    case 'declined':
      res.status(402).send(checkoutPage(outcome.session, store.internalsOf(outcome.session).lineItems, values, outcome.error.message));
      return;
    case 'needs_authentication':
      res.status(200).send(confirmationPage(outcome.session));
      return;
    case 'not_payable':
      showNotPayable(res, outcome.session, outcome.reason, true);
  }
}

/** `GET /pay/:id` shows the checkout; `POST /pay/:id` pays; `POST /pay/:id/confirm` ends the extra step. */
export function payPageRouter(store: PaymentsStore): Router {
  const router = Router();
  router.use(express.urlencoded({ extended: false, limit: '16kb' }));
  router.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    // Nothing but the page's own inline styles may load.
    res.set('Content-Security-Policy', "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'");
    res.type('html');
    next();
  });

  router.get('/:id', (req, res) => {
    catchUp(store);
    const session = store.sessions.get(req.params.id);
    if (!session) {
      showNotPayable(res, session, 'missing', false);
      return;
    }
    if (session.status !== 'open') {
      showNotPayable(res, session, session.status, false);
      return;
    }
    const internals = store.internalsOf(session);
    if (internals.pendingAuthentication) {
      res.send(confirmationPage(session));
      return;
    }
    res.send(checkoutPage(session, internals.lineItems));
  });

  router.post('/:id', (req, res) => {
    const body = (req.body ?? {}) as Record<string, unknown>;
    const form = {
      cardNumber: text(body.cardNumber),
      expiry: text(body.expiry),
      cvc: text(body.cvc),
      name: text(body.name),
      email: text(body.email),
    };
    show(store, res, payWithCard(store, req.params.id, form), form);
  });

  router.post('/:id/confirm', (req, res) => {
    const result = (req.body as Record<string, unknown> | undefined)?.result === 'complete' ? 'complete' : 'fail';
    show(store, res, finishAuthentication(store, req.params.id, result), {});
  });

  return router;
}
