import crypto from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { pinoHttp } from 'pino-http';
import { logger } from '../lib/logger.js';

// Express keeps the full URL in originalUrl; a mounted router rewrites req.url.
const urlOf = (req: IncomingMessage & { originalUrl?: string }) => req.originalUrl ?? req.url;

const REQUEST_ID = /^[A-Za-z0-9._:-]{8,64}$/;

/** A path safe to log: no query string (sign-in codes, return addresses), no claim token. */
export function safePath(url: string | undefined): string {
  const path = (url ?? '').split('?')[0]!;
  return path.replace(/(\/claims?\/)[^/]+/g, '$1[redacted]');
}

/**
 * One JSON line per request, with a request id: the caller's X-Request-Id
 * when it looks like one, else a new UUID. The id goes back in the
 * X-Request-Id header and into every error body (details.requestId).
 */
export const requestLog = pinoHttp({
  logger,
  genReqId(req: IncomingMessage, res: ServerResponse) {
    const given = req.headers['x-request-id'];
    const id = typeof given === 'string' && REQUEST_ID.test(given) ? given : crypto.randomUUID();
    res.setHeader('X-Request-Id', id);
    return id;
  },
  serializers: {
    req: (req: { id: string; method: string; url: string }) => ({ id: req.id, method: req.method, path: safePath(req.url) }),
    res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
  },
  customLogLevel(_req, res, err) {
    if (err || res.statusCode >= 500) return 'error';
    if (res.statusCode >= 400) return 'warn';
    return 'info';
  },
  customSuccessMessage: (req, res) => `${req.method} ${safePath(urlOf(req))} ${res.statusCode}`,
  customErrorMessage: (req, res) => `${req.method} ${safePath(urlOf(req))} ${res.statusCode}`,
});
