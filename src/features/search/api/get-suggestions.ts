import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { SuggestReply } from '@shared/schemas/search';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { searchKeys } from './search-keys';

/** Fewer characters than this match too much to be worth suggesting. */
export const SUGGEST_MIN_LENGTH = 2;

export function getSuggestions(q: string, signal?: AbortSignal): Promise<SuggestReply> {
  return api.get<SuggestReply>(apiPaths.search.suggest(q), { signal });
}

export function suggestionsQueryOptions(q: string) {
  return queryOptions({
    queryKey: searchKeys.suggest(q),
    queryFn: ({ signal }) => getSuggestions(q, signal),
    staleTime: 5 * 60_000,
  });
}

/** Suggestions for what is typed (already debounced by the caller); idle below the minimum length. */
export function useSuggestions(q: string) {
  return useQuery({ ...suggestionsQueryOptions(q), enabled: q.length >= SUGGEST_MIN_LENGTH, placeholderData: keepPreviousData });
}
