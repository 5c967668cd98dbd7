import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { catalogKeys } from './catalog-keys';
import { vehicleListReply, type VehicleSummary } from './catalog-schemas';

export async function getVehicles(signal?: AbortSignal): Promise<VehicleSummary[]> {
  const reply = await api.get(apiPaths.catalog.vehicles, { signal, schema: vehicleListReply });
  return reply.vehicles;
}

export function vehiclesQueryOptions() {
  return queryOptions({ queryKey: catalogKeys.vehicles(), queryFn: ({ signal }) => getVehicles(signal) });
}

export function useVehicles() {
  return useQuery(vehiclesQueryOptions());
}
