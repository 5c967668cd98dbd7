import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateGarageVehicleInput } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { vehicleReply, type GarageVehicle } from './garage-schemas';

export async function createGarageVehicle(input: CreateGarageVehicleInput): Promise<GarageVehicle> {
  const reply = await api.post(apiPaths.garage.vehicles, input, { schema: vehicleReply });
  return reply.vehicle;
}

export function useCreateGarageVehicle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createGarageVehicle,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: garageKeys.vehicles() }),
  });
}
