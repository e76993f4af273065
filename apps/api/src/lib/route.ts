import type { Request, RequestHandler, Response, Router } from 'express';
import type { BodyOf, Endpoint, ParamsOf, QueryOf, ResponseOf } from '@fryline/schemas';
import { validate } from '../middleware/validate.js';
import { AppError } from './app-error.js';

/** What a handler gets: the parsed request parts, the request's clock reading, and req/res for headers. */
export interface RouteInput<E extends Endpoint> {
  params: ParamsOf<E>;
  query: QueryOf<E>;
  body: BodyOf<E>;
  now: Date;
  req: Request;
  res: Response;
}

export type RouteHandler<E extends Endpoint> = (input: RouteInput<E>) => Promise<ResponseOf<E>> | ResponseOf<E>;

export interface RouteOptions<E extends Endpoint> {
  /** Answers that must never be cached (they change by the second). */
  noStore?: boolean;
  /** For an answer that is not JSON (a calendar file): writes the result itself. */
  send?: (res: Response, result: ResponseOf<E>) => void;
}

let checkResponses = false;

/** Outside production every answer is checked against its response schema, so the contract can't drift unnoticed. */
export function checkResponsesAgainstContract(on: boolean): void {
  checkResponses = on;
}

/**
 * Mounts one endpoint of the contract: guards (auth) → validation of params,
 * query and body with the endpoint's schemas (kept on res.locals.valid) →
 * the handler, typed from the same schemas → the JSON answer with the
 * endpoint's status, or 204 when the handler returns nothing.
 */
export function route<E extends Endpoint>(router: Router, endpoint: E, guards: RequestHandler[], handler: RouteHandler<E>, options: RouteOptions<E> = {}): void {
  const validators: RequestHandler[] = [];
  if (endpoint.params) validators.push(validate('params', endpoint.params));
  if (endpoint.query) validators.push(validate('query', endpoint.query));
  if (endpoint.body) validators.push(validate('body', endpoint.body));
  const respond: RequestHandler = async (req, res) => {
    const parts = (res.locals.valid ?? {}) as Partial<RouteInput<E>>;
    const result = await handler({
      params: parts.params ?? ({} as ParamsOf<E>),
      query: parts.query ?? ({} as QueryOf<E>),
      body: parts.body as BodyOf<E>,
      now: res.locals.now,
      req,
      res,
    });
    if (options.noStore) res.set('Cache-Control', 'no-store');
    if (result === undefined) {
      res.status(204).end();
      return;
    }
    if (checkResponses) {
      const checked = endpoint.response.safeParse(result);
      if (!checked.success) {
        throw new AppError('contract', `${endpoint.method.toUpperCase()} ${endpoint.path} answered outside its schema: ${checked.error.message}`, 500);
      }
    }
    res.status(endpoint.status ?? 200);
    if (options.send) options.send(res, result);
    else res.json(result);
  };
  router[endpoint.method](endpoint.path, ...guards, ...validators, respond);
}
