import type { ErrorRequestHandler, RequestHandler, Response } from 'express';
import { newId } from './ids.js';

export type ErrorType =
  | 'invalid_request_error'
  | 'idempotency_error'
  | 'card_error'
  | 'api_error'
  | 'authentication_error';

export interface ErrorBody {
  type: ErrorType;
  message: string;
  code?: string;
  decline_code?: string;
  param?: string;
}

/**
 * An error answered in the service's shape: `{ error: { type, code,
 * decline_code, message, param } }` with the HTTP status the SDK maps to its
 * error classes (400/404 invalid request, 401 authentication, 402 card, 409
 * conflict, 5xx API error).
 */
export class ApiError extends Error {
  readonly status: number;
  readonly body: ErrorBody;
  /**
   * Parameter validation failures never reached an endpoint, so they are not
   * stored against an idempotency key (a corrected retry may reuse the key).
   */
  readonly beforeExecution: boolean;

  constructor(status: number, body: ErrorBody, beforeExecution = false) {
    super(body.message);
    this.status = status;
    this.body = body;
    this.beforeExecution = beforeExecution;
  }
}

/** A bad or missing parameter (400, not kept for idempotent replay). */
export function paramError(message: string, param?: string, code = 'parameter_invalid'): ApiError {
  return new ApiError(400, { type: 'invalid_request_error', code, message, ...(param ? { param } : {}) }, true);
}

/** A request that is well-formed but not allowed in the object's current state (400). */
export function stateError(message: string, code?: string, param?: string): ApiError {
  return new ApiError(400, {
    type: 'invalid_request_error',
    message,
    ...(code ? { code } : {}),
    ...(param ? { param } : {}),
  });
}

/** 404 for an id the fake does not know, worded like the service. */
export function missing(objectName: string, id: string, param = 'id'): ApiError {
  return new ApiError(404, {
    type: 'invalid_request_error',
    code: 'resource_missing',
    message: `No such ${objectName}: '${id}'`,
    param,
  });
}

export const API_REQUEST_ID = 'requestId';

/** Every API answer carries a `Request-Id`, as the SDK exposes it on errors and responses. */
export const assignRequestId: RequestHandler = (_req, res, next) => {
  const id = newId('req_', 14);
  res.locals[API_REQUEST_ID] = id;
  res.set('Request-Id', id);
  next();
};

export function requestIdOf(res: Response): string {
  return String(res.locals[API_REQUEST_ID]);
}

export function sendApiError(res: Response, err: ApiError): void {
  res.locals.apiError = err;
  res.status(err.status).json({ error: err.body });
}

/** Turns anything thrown inside the API into the service's error body. */
export const apiErrorHandler: ErrorRequestHandler = (err: unknown, _req, res, _next) => {
  if (err instanceof ApiError) {
    sendApiError(res, err);
    return;
  }
  const parserError = err as { type?: string; status?: number; message?: string };
  if (typeof parserError?.type === 'string' && typeof parserError.status === 'number' && parserError.status < 500) {
    // Body parser failures: the request body could not be read as a form.
    sendApiError(res, paramError(`Invalid request body: ${parserError.message ?? parserError.type}`));
    return;
  }
  console.error('[payments fake] unexpected error', err);
  sendApiError(
    res,
    new ApiError(500, { type: 'api_error', message: 'An unexpected error occurred inside the payments fake.' }),
  );
};
