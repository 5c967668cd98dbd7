import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanDestination } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeyPrefix } from './garage-keys';
import { toCartReply, type ToCartResult } from './garage-schemas';

/** The server computes the plan again (a client's copy is never trusted) and tops the cart up to it. */
export async function planToCart({ vehicleId, destination }: { vehicleId: string; destination: PlanDestination }): Promise<ToCartResult> {
  return api.post(apiPaths.garage.planToCart(vehicleId), { destination }, { schema: toCartReply });
}

export function usePlanToCart(vehicleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (destination: PlanDestination) => planToCart({ vehicleId, destination }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cartKeyPrefix }),
  });
}
