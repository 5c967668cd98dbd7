import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';

/** The parts a typed number may mean (server/services/catalog.ts resolveNumber); only what the link form shows. */
export interface ResolvedParts {
  matches: Array<{ partId: string; matchedBy: string }>;
  parts: Array<{ id: string; name: string; primaryNumber: string | null }>;
}

// Kept apart from moderationKeys.all so linking a listing does not ask the catalog again.
export const partResolveKey = (number: string) => ['admin', 'part-resolve', number] as const;

export function resolvePartNumber(number: string, signal?: AbortSignal): Promise<ResolvedParts> {
  return api.get<ResolvedParts>(apiPaths.catalog.resolve(number), { signal });
}

export function resolvePartNumberQueryOptions(number: string) {
  return queryOptions({ queryKey: partResolveKey(number), queryFn: ({ signal }) => resolvePartNumber(number, signal), enabled: number !== '' });
}

export function useResolvePartNumber(number: string) {
  return useQuery(resolvePartNumberQueryOptions(number));
}
