import { StripeFakeError } from './stripe-error';

export interface ListPage<T> {
  object: 'list';
  data: T[];
  has_more: boolean;
  url: string;
}

export interface ListParams {
  limit?: number;
  starting_after?: string;
  ending_before?: string;
}

/**
 * Cursor pagination as Stripe does it: newest first, `starting_after` / `ending_before` are ids
 * of items in the list, default page size 10.
 */
export function paginate<T extends { id: string }>(
  itemsOldestFirst: readonly T[],
  given: object,
  url: string,
  noun: string,
  order: 'newest_first' | 'as_given' = 'newest_first',
): ListPage<T> {
  // Handlers pass their whole checked parameter object; only the cursor fields matter here.
  const params = given as ListParams;
  const items = order === 'newest_first' ? [...itemsOldestFirst].reverse() : [...itemsOldestFirst];
  const limit = params.limit ?? 10;
  if (params.starting_after !== undefined && params.ending_before !== undefined) {
    throw StripeFakeError.invalidRequest('You may only specify one of these parameters: ending_before, starting_after.');
  }
  if (params.starting_after !== undefined) {
    const at = items.findIndex((item) => item.id === params.starting_after);
    if (at < 0) throw StripeFakeError.noSuchReferenced(noun, params.starting_after, 'starting_after');
    const rest = items.slice(at + 1);
    return { object: 'list', data: rest.slice(0, limit), has_more: rest.length > limit, url };
  }
  if (params.ending_before !== undefined) {
    const at = items.findIndex((item) => item.id === params.ending_before);
    if (at < 0) throw StripeFakeError.noSuchReferenced(noun, params.ending_before, 'ending_before');
    const before = items.slice(0, at);
    const page = before.slice(Math.max(0, before.length - limit));
    return { object: 'list', data: page, has_more: before.length > limit, url };
  }
  return { object: 'list', data: items.slice(0, limit), has_more: items.length > limit, url };
}
