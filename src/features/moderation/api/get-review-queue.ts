import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import type { QueueFilters, QueueListing } from './moderation-types';

export const moderationKeys = {
  all: ['admin', 'listings'] as const,
  queue: (f: QueueFilters) => [...moderationKeys.all, 'queue', f] as const,
};

export async function getReviewQueue(f: QueueFilters, signal?: AbortSignal): Promise<QueueListing[]> {
  const q = { state: 'submitted', flag: f.flag, sellerId: f.sellerId, minAgeHours: f.minAgeHours !== undefined ? String(f.minAgeHours) : undefined, sort: f.sort };
  return (await api.get<{ listings: QueueListing[] }>(apiPaths.adminListings.queue(q), { signal })).listings;
}

export function reviewQueueQueryOptions(f: QueueFilters) {
  return queryOptions({ queryKey: moderationKeys.queue(f), queryFn: ({ signal }) => getReviewQueue(f, signal), placeholderData: keepPreviousData });
}

export function useReviewQueue(f: QueueFilters) {
  return useQuery(reviewQueueQueryOptions(f));
}
