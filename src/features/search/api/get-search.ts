import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { SearchReply } from '@shared/schemas/search';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { toApiParams, type SearchState } from '../utils/search-state';
import { searchKeys } from './search-keys';

export function getSearch(params: URLSearchParams, signal?: AbortSignal): Promise<SearchReply> {
  return api.get<SearchReply>(apiPaths.search.results(params), { signal });
}

export function searchQueryOptions(state: SearchState) {
  const params = toApiParams(state);
  return queryOptions({
    // The canonical query string is the key: the same filters in any URL order share one cache entry.
    queryKey: searchKeys.results(params.toString()),
    queryFn: ({ signal }) => getSearch(params, signal),
    staleTime: 30_000,
  });
}

/** Results of the page's state; the previous reply stays on screen while a changed filter loads. */
export function useSearch(state: SearchState) {
  return useQuery({ ...searchQueryOptions(state), placeholderData: keepPreviousData });
}
