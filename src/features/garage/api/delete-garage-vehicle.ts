import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';

export async function deleteGarageVehicle(id: string): Promise<void> {
  await api.delete(apiPaths.garage.vehicle(id));
}

export function useDeleteGarageVehicle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteGarageVehicle,
    onSuccess: (_data, id) => {
      queryClient.removeQueries({ queryKey: garageKeys.vehicle(id) });
      return queryClient.invalidateQueries({ queryKey: garageKeys.vehicles() });
    },
  });
}
