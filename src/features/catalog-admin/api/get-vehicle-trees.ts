import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { adminCatalogKeys } from './admin-catalog-keys';
import { vehiclesReply, vehicleTreeReply } from './admin-catalog-schemas';

// The editor's view of GET /api/vehicles and GET /api/vehicles/:slug: names and the assembly tree only.

export function vehicleNamesQueryOptions() {
  return queryOptions({
    queryKey: adminCatalogKeys.vehicles(),
    queryFn: async ({ signal }) => (await api.get(apiPaths.catalog.vehicles, { signal, schema: vehiclesReply })).vehicles,
  });
}

export function useVehicleNames() {
  return useQuery(vehicleNamesQueryOptions());
}

export function vehicleTreeQueryOptions(slug: string) {
  return queryOptions({
    queryKey: adminCatalogKeys.vehicle(slug),
    queryFn: ({ signal }) => api.get(apiPaths.catalog.vehicle(slug), { signal, schema: vehicleTreeReply }),
    enabled: slug !== '',
  });
}

export function useVehicleTree(slug: string) {
  return useQuery(vehicleTreeQueryOptions(slug));
}
