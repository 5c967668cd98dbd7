import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { adminCatalogKeys } from './admin-catalog-keys';
import { partRecordReply, type PartRecord } from './admin-catalog-schemas';

export function getPartRecord(id: string, signal?: AbortSignal): Promise<PartRecord> {
  return api.get(apiPaths.catalog.part(id), { signal, schema: partRecordReply });
}

export function partRecordQueryOptions(id: string) {
  return queryOptions({ queryKey: adminCatalogKeys.part(id), queryFn: ({ signal }) => getPartRecord(id, signal) });
}

export function usePartRecord(id: string) {
  return useQuery(partRecordQueryOptions(id));
}
