import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys, type MyListingsQuery } from './seller-keys';
import type { MyListingsReply } from './seller-types';

export function getMyListings(q: MyListingsQuery, signal?: AbortSignal): Promise<MyListingsReply> {
  const query = { state: q.state, q: q.q, sort: q.sort, page: q.page ? String(q.page) : undefined, pageSize: q.pageSize ? String(q.pageSize) : undefined };
  return api.get<MyListingsReply>(apiPaths.listings.mine(query), { signal });
}

export function myListingsQueryOptions(q: MyListingsQuery) {
  return queryOptions({
    queryKey: sellerKeys.listingsPage(q),
    queryFn: ({ signal }) => getMyListings(q, signal),
    // Changing a filter or sort keeps the old rows on screen until the new ones arrive.
    placeholderData: keepPreviousData,
  });
}

export function useMyListings(q: MyListingsQuery) {
  return useQuery(myListingsQueryOptions(q));
}
