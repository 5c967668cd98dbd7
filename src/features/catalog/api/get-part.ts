import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { catalogKeys } from './catalog-keys';
import { partReply, type PartDetail } from './catalog-schemas';

export function getPart(id: string, signal?: AbortSignal): Promise<PartDetail> {
  return api.get(apiPaths.catalog.part(id), { signal, schema: partReply });
}

export function partQueryOptions(id: string) {
  return queryOptions({ queryKey: catalogKeys.part(id), queryFn: ({ signal }) => getPart(id, signal) });
}

export function usePart(id: string) {
  return useQuery(partQueryOptions(id));
}
