import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateGarageVehicleInput } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { vehicleReply, type GarageVehicle } from './garage-schemas';

export async function updateGarageVehicle({ id, input }: { id: string; input: UpdateGarageVehicleInput }): Promise<GarageVehicle> {
  const reply = await api.patch(apiPaths.garage.vehicle(id), input, { schema: vehicleReply });
  return reply.vehicle;
}

export function useUpdateGarageVehicle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateGarageVehicle,
    // A new serial or build date changes which lines apply: refresh everything under the vehicle.
    onSuccess: (_v, { id }) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: garageKeys.vehicle(id) }), queryClient.invalidateQueries({ queryKey: garageKeys.vehicles() })]),
  });
}
