import type { Router } from 'express';
import { readArray, readString, type Params } from '../params.js';
import type { PaymentsStore } from '../state.js';
import type { StripeEvent } from '../types.js';
import { resourceRouter } from './common.js';

/** `type=checkout.session.*` matches every type under that prefix. */
function typeMatches(pattern: string, type: string): boolean {
  return pattern.endsWith('.*') ? type.startsWith(pattern.slice(0, -1)) : pattern === type;
}

function keepEvent(event: StripeEvent, params: Params): boolean {
  const type = readString(params, 'type');
  if (type !== undefined && !typeMatches(type, event.type)) return false;
  const types = readArray(params, 'types');
  if (types !== undefined && !types.some((pattern) => typeof pattern === 'string' && typeMatches(pattern, event.type))) {
    return false;
  }
  return true;
}

/** `/v1/events`: every event the fake has emitted, newest first, for catching up after downtime. */
export function eventsRouter(store: PaymentsStore): Router {
  return resourceRouter(store, {
    url: '/v1/events',
    objectName: 'event',
    collection: store.events,
    extraFilters: ['type', 'types'],
    keep: keepEvent,
  });
}
