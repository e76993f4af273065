import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from '../lib/app-error.js';
import { isDatabaseUnavailable, RETRY_AFTER_SECONDS } from '../db/availability.js';
import { describePaymentsError, isPaymentsError, paymentsError } from '../services/payments-errors.js';

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No route for ${req.method} ${req.originalUrl.split("?")[0]}` } });
};

/** Turns anything thrown into `{ error: { code, message, details } }`; hides internals of the unexpected. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details } });
    return;
  }
  if (isPaymentsError(err)) {
    console.error(`[payments] ${req.method} ${req.originalUrl.split('?')[0]}: ${describePaymentsError(err)}`);
    const answer = paymentsError();
    res.status(answer.status).json({ error: { code: answer.code, message: answer.message } });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    res.set('Retry-After', String(RETRY_AFTER_SECONDS));
    res.status(503).json({ error: { code: 'database_unavailable', message: 'We can’t reach our database right now. Please try again in a moment.' } });
    return;
  }
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status >= 400 && status < 500) {
    // body-parser and friends: bad JSON, body too large
    const code = err.type === 'entity.parse.failed' ? 'invalid_json' : err.type === 'entity.too.large' ? 'too_large' : 'bad_request';
    res.status(status).json({ error: { code, message: err.expose ? err.message : 'The request could not be read' } });
    return;
  }
  console.error(`[api] ${req.method} ${req.originalUrl} failed:`, err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Please try again.' } });
};
