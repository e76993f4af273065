import { missing } from './errors.js';
import { readInteger, readString, type Params } from './params.js';
import type { ApiList } from './types.js';

/** Parameters every list endpoint takes besides its own filters. */
export const LIST_PARAMS = ['limit', 'starting_after', 'ending_before', 'expand'] as const;

export function listOf<T>(data: T[], url: string, hasMore = false): ApiList<T> {
  return { object: 'list', data, has_more: hasMore, url };
}

/**
 * One page of `items` (already filtered, newest first): `limit` 1–100
 * (default 10), `starting_after` for the next page, `ending_before` for the
 * previous one.
 */
export function paginate<T extends { id: string }>(items: T[], params: Params, url: string, objectName: string): ApiList<T> {
  const limit = readInteger(params, 'limit', 'limit', { min: 1, max: 100 }) ?? 10;
  const startingAfter = readString(params, 'starting_after');
  const endingBefore = readString(params, 'ending_before');
  const indexOf = (id: string, param: string): number => {
    const index = items.findIndex((item) => item.id === id);
    if (index < 0) throw missing(objectName, id, param);
    return index;
  };
  if (startingAfter !== undefined) {
    const rest = items.slice(indexOf(startingAfter, 'starting_after') + 1);
    return listOf(rest.slice(0, limit), url, rest.length > limit);
  }
  if (endingBefore !== undefined) {
    const before = items.slice(0, indexOf(endingBefore, 'ending_before'));
    return listOf(before.slice(-limit), url, before.length > limit);
  }
  return listOf(items.slice(0, limit), url, items.length > limit);
}
