import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { adminCatalogKeys } from './admin-catalog-keys';
import { resolveReply, type ResolveReply } from './admin-catalog-schemas';

export function resolveNumber(number: string, signal?: AbortSignal): Promise<ResolveReply> {
  return api.get(apiPaths.catalog.resolve(number), { signal, schema: resolveReply });
}

export function resolveNumberQueryOptions(number: string) {
  return queryOptions({ queryKey: adminCatalogKeys.resolve(number), queryFn: ({ signal }) => resolveNumber(number, signal), enabled: number !== '' });
}

export function useResolveNumber(number: string) {
  return useQuery(resolveNumberQueryOptions(number));
}
