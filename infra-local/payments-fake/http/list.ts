import { invalidRequest, noSuchParam } from '../errors';
import type { Params } from '../params';
import type { ListObject } from '../types';

/** Parameters every list endpoint accepts. */
export const LIST_PARAMS = ['limit', 'starting_after', 'ending_before'] as const;

/**
 * Stripe's cursor pagination over items ordered newest first: `limit` (1–100, default 10),
 * `starting_after` (the page after an id) or `ending_before` (the page before an id).
 */
export function paginate<T extends { id: string }>(
  newestFirst: readonly T[],
  params: Params,
  url: string,
  kind: string,
): ListObject<T> {
  const limit = params.int('limit') ?? 10;
  if (limit < 1 || limit > 100) {
    throw invalidRequest('Invalid limit: must be between 1 and 100', { param: 'limit' });
  }
  const startingAfter = params.string('starting_after');
  const endingBefore = params.string('ending_before');
  if (startingAfter !== undefined && endingBefore !== undefined) {
    throw invalidRequest('You may only specify one of these parameters: ending_before, starting_after.', {
      code: 'parameters_exclusive',
      param: 'ending_before',
    });
  }
  const indexOf = (id: string, param: string): number => {
    const index = newestFirst.findIndex((item) => item.id === id);
    if (index < 0) throw noSuchParam(kind, id, param);
    return index;
  };
  if (endingBefore !== undefined) {
    const end = indexOf(endingBefore, 'ending_before');
    const start = Math.max(0, end - limit);
    return { object: 'list', data: newestFirst.slice(start, end), has_more: start > 0, url };
  }
  const start = startingAfter !== undefined ? indexOf(startingAfter, 'starting_after') + 1 : 0;
  return {
    object: 'list',
    data: newestFirst.slice(start, start + limit),
    has_more: start + limit < newestFirst.length,
    url,
  };
}

/** Stored objects are kept in insertion order; lists are newest first. */
export function newestFirst<T>(records: Record<string, T>): T[] {
  return Object.values(records).reverse();
}
