import type { ErrorRequestHandler, Request, RequestHandler } from 'express';
import { AppError } from '../lib/app-error.js';
import { logger } from '../lib/logger.js';

/** Every error body's details carry the request id, so a report can be matched to its log line. */
function detailsWithId(req: Request, details?: unknown): Record<string, unknown> {
  const base = details && typeof details === 'object' && !Array.isArray(details) ? (details as Record<string, unknown>) : details === undefined ? {} : { value: details };
  return { ...base, requestId: String(req.id ?? '') };
}

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No route for ${req.method} ${req.originalUrl.split('?')[0]}`, details: detailsWithId(req) } });
};

/** Turns anything thrown into `{ error: { code, message, details } }`; hides internals of the unexpected. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, details: detailsWithId(req, err.details) } });
    return;
  }
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status >= 400 && status < 500) {
    // body-parser and friends: bad JSON, body too large
    const code = err.type === 'entity.parse.failed' ? 'invalid_json' : err.type === 'entity.too.large' ? 'too_large' : 'bad_request';
    res.status(status).json({ error: { code, message: err.expose ? err.message : 'The request could not be read', details: detailsWithId(req) } });
    return;
  }
  (req.log ?? logger).error({ err }, 'request failed');
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Please try again.', details: detailsWithId(req) } });
};
