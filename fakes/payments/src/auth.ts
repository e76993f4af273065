import type { RequestHandler, Response } from 'express';
import { ApiError } from './errors.js';

const API_KEY = 'apiKey';

function keyFromHeader(header: string | undefined): string | null {
  if (!header) return null;
  const bearer = /^Bearer\s+(\S+)$/i.exec(header);
  if (bearer) return bearer[1] ?? null;
  const basic = /^Basic\s+(\S+)$/i.exec(header);
  if (basic) return Buffer.from(basic[1] ?? '', 'base64').toString('utf8').split(':')[0] || null;
  return null;
}

function masked(key: string): string {
  return key.length <= 8 ? key : `${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`;
}

/**
 * Accepts test secret keys only (`sk_test_…`, as a Bearer token or as the
 * Basic user name); anything else is 401.
 */
export const requireTestKey: RequestHandler = (req, res, next) => {
  const key = keyFromHeader(req.get('Authorization'));
  if (key === null) {
    throw new ApiError(401, {
      type: 'invalid_request_error',
      message: 'You did not provide an API key. Send your test secret key (sk_test_…) as a Bearer token in the Authorization header.',
    });
  }
  if (!key.startsWith('sk_test_')) {
    throw new ApiError(401, {
      type: 'invalid_request_error',
      code: 'api_key_invalid',
      message: `Invalid API Key provided: ${masked(key)}. The payments fake accepts test secret keys (sk_test_…) only.`,
    });
  }
  res.locals[API_KEY] = key;
  next();
};

export function apiKeyOf(res: Response): string {
  return String(res.locals[API_KEY]);
}
