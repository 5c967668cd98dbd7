import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { vehicleListReply, type GarageVehicleWithProgress } from './garage-schemas';

export async function getGarageVehicles(signal?: AbortSignal): Promise<GarageVehicleWithProgress[]> {
  const reply = await api.get(apiPaths.garage.vehicles, { signal, schema: vehicleListReply });
  return reply.vehicles;
}

export function garageVehiclesQueryOptions() {
  return queryOptions({ queryKey: garageKeys.vehicles(), queryFn: ({ signal }) => getGarageVehicles(signal) });
}

export function useGarageVehicles() {
  return useQuery(garageVehiclesQueryOptions());
}
