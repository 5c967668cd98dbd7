import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { adminCatalogKeys } from './admin-catalog-keys';
import { assemblyRecordReply, type AssemblyRecord } from './admin-catalog-schemas';

export function getAssemblyRecord(id: string, signal?: AbortSignal): Promise<AssemblyRecord> {
  return api.get(apiPaths.catalog.assembly(id), { signal, schema: assemblyRecordReply });
}

export function assemblyRecordQueryOptions(id: string) {
  return queryOptions({ queryKey: adminCatalogKeys.assembly(id), queryFn: ({ signal }) => getAssemblyRecord(id, signal), enabled: id !== '' });
}

export function useAssemblyRecord(id: string) {
  return useQuery(assemblyRecordQueryOptions(id));
}
