import { Router, type Request, type Response } from 'express';
import { missing, requestIdOf } from '../errors.js';
import { expandList, expandObject } from '../expand.js';
import { LIST_PARAMS, paginate } from '../lists.js';
import { inRange, readExpand, readRange, readString, rejectUnknown, type Params } from '../params.js';
import type { Collection, PaymentsStore } from '../state.js';
import type { EventRequest } from '../types.js';

export function bodyOf(req: Request): Params {
  return (req.body ?? {}) as Params;
}

export function queryOf(req: Request): Params {
  return req.query as Params;
}

/** The `request` block of events caused by this API call. */
export function eventRequestOf(req: Request, res: Response): EventRequest {
  return { id: requestIdOf(res), idempotency_key: req.get('Idempotency-Key') ?? null };
}

export function found<T extends { id: string }>(collection: Collection<T>, id: string, objectName: string): T {
  const item = collection.get(id);
  if (!item) throw missing(objectName, id);
  return item;
}

/** Answers with the object, expanded as the request's `expand[]` asks. */
export function sendObject(store: PaymentsStore, res: Response, object: unknown, params: Params): void {
  res.json(expandObject(store, object, readExpand(params)));
}

/** `GET <path>/:id` with `expand[]`. */
function retrieveRoute<T extends { id: string }>(
  router: Router,
  store: PaymentsStore,
  collection: Collection<T>,
  objectName: string,
): void {
  router.get('/:id', (req, res) => {
    const params = queryOf(req);
    rejectUnknown(params, ['expand']);
    sendObject(store, res, found(collection, req.params.id, objectName), params);
  });
}

export interface ListSpec<T extends { id: string }> {
  url: string;
  objectName: string;
  collection: Collection<T>;
  /** Fields a list can be filtered on by equality (`?payment_intent=pi_…`); `created` ranges always work. */
  fields?: readonly (keyof T & string)[];
  /** Further filters and the test each item must pass. */
  extraFilters?: readonly string[];
  keep?: (item: T, params: Params) => boolean;
}

function matches<T extends { created: number }>(item: T, params: Params, fields: readonly (keyof T & string)[]): boolean {
  for (const field of fields) {
    const wanted = readString(params, field);
    if (wanted !== undefined && item[field] !== wanted) return false;
  }
  return inRange(item.created, readRange(params, 'created'));
}

/** `GET <path>` as a paged list, newest first. */
function listRoute<T extends { id: string; created: number }>(router: Router, store: PaymentsStore, spec: ListSpec<T>): void {
  const fields = spec.fields ?? [];
  router.get('/', (req, res) => {
    const params = queryOf(req);
    rejectUnknown(params, [...LIST_PARAMS, 'created', ...fields, ...(spec.extraFilters ?? [])]);
    const items = spec.collection
      .newestFirst()
      .filter((item) => matches(item, params, fields) && (spec.keep ? spec.keep(item, params) : true));
    res.json(expandList(store, paginate(items, params, spec.url, spec.objectName), readExpand(params)));
  });
}

/** A router with `GET /` (list) and `GET /:id` (retrieve); callers add their writes. */
export function resourceRouter<T extends { id: string; created: number }>(store: PaymentsStore, spec: ListSpec<T>): Router {
  const router = Router();
  listRoute(router, store, spec);
  retrieveRoute(router, store, spec.collection, spec.objectName);
  return router;
}
