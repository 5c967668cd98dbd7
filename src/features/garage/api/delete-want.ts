import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';

export async function deleteWant({ vehicleId, wantId }: { vehicleId: string; wantId: string }): Promise<void> {
  await api.delete(apiPaths.garage.want(vehicleId, wantId));
}

export function useDeleteWant(vehicleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (wantId: string) => deleteWant({ vehicleId, wantId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: garageKeys.needs(vehicleId) }),
  });
}
