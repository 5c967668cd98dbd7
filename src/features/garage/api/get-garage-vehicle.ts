import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { vehicleDetailReply, type GarageVehicleDetail } from './garage-schemas';

export async function getGarageVehicle(id: string, signal?: AbortSignal): Promise<GarageVehicleDetail> {
  return api.get(apiPaths.garage.vehicle(id), { signal, schema: vehicleDetailReply });
}

export function garageVehicleQueryOptions(id: string) {
  return queryOptions({ queryKey: garageKeys.vehicleDetail(id), queryFn: ({ signal }) => getGarageVehicle(id, signal) });
}

export function useGarageVehicle(id: string) {
  return useQuery(garageVehicleQueryOptions(id));
}
