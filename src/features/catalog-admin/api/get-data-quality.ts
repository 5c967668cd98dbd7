import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { adminCatalogKeys } from './admin-catalog-keys';
import { dataQualityReply, type DataQuality } from './admin-catalog-schemas';

export function getDataQuality(signal?: AbortSignal): Promise<DataQuality> {
  return api.get(apiPaths.adminCatalog.dataQuality, { signal, schema: dataQualityReply });
}

export function dataQualityQueryOptions() {
  return queryOptions({ queryKey: adminCatalogKeys.dataQuality(), queryFn: ({ signal }) => getDataQuality(signal) });
}

export function useDataQuality() {
  return useQuery(dataQualityQueryOptions());
}
