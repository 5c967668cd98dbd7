import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { catalogKeys } from './catalog-keys';
import { vehicleReply, type VehicleDetail } from './catalog-schemas';

export function getVehicle(slug: string, signal?: AbortSignal): Promise<VehicleDetail> {
  return api.get(apiPaths.catalog.vehicle(slug), { signal, schema: vehicleReply });
}

export function vehicleQueryOptions(slug: string) {
  return queryOptions({ queryKey: catalogKeys.vehicle(slug), queryFn: ({ signal }) => getVehicle(slug, signal) });
}

export function useVehicle(slug: string) {
  return useQuery(vehicleQueryOptions(slug));
}
