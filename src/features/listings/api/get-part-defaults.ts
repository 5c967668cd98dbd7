import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { ListingPart } from './listing-types';

/** The picked part's catalog weight and size: a listing takes them when the seller leaves the fields empty. */
export function partDefaultsQueryOptions(partId: string | null) {
  return queryOptions({
    queryKey: [...listingKeys.all, 'part-defaults', partId ?? ''] as const,
    queryFn: ({ signal }) => api.get<ListingPart>(apiPaths.catalog.part(partId!), { signal }),
    enabled: !!partId,
    staleTime: 10 * 60_000,
  });
}

export function usePartDefaults(partId: string | null) {
  return useQuery(partDefaultsQueryOptions(partId));
}
