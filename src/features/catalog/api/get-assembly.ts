import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { catalogKeys } from './catalog-keys';
import { assemblyReply, type AssemblyDetail } from './catalog-schemas';

export type AssemblyFilter = { serial: string | null };

export function getAssembly(id: string, filter: AssemblyFilter, signal?: AbortSignal): Promise<AssemblyDetail> {
  return api.get(apiPaths.catalog.assembly(id, filter), { signal, schema: assemblyReply });
}

export function assemblyQueryOptions(id: string, filter: AssemblyFilter) {
  return queryOptions({
    queryKey: catalogKeys.assembly(id, filter),
    queryFn: ({ signal }) => getAssembly(id, filter, signal),
    // Changing the serial keeps the page (diagram, zoom) on screen while the filtered list loads; another
    // assembly starts from a blank page instead.
    placeholderData: (previous) => (previous?.assembly.id === id ? previous : undefined),
  });
}

export function useAssembly(id: string, filter: AssemblyFilter) {
  return useQuery(assemblyQueryOptions(id, filter));
}
