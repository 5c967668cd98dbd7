import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { ListingPage } from './listing-types';

export function getListing(id: string, signal?: AbortSignal): Promise<ListingPage> {
  return api.get<ListingPage>(apiPaths.listings.one(id), { signal });
}

export function listingQueryOptions(id: string) {
  return queryOptions({ queryKey: listingKeys.detail(id), queryFn: ({ signal }) => getListing(id, signal) });
}

export function useListing(id: string) {
  return useQuery(listingQueryOptions(id));
}
