import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TeardownUpdateInput } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { teardownUpdateReply, type Checklist, type TeardownUpdateReply } from './garage-schemas';

export type TeardownUpdateVars = { vehicleId: string; assemblyId: string; bomLineId: string; input: TeardownUpdateInput };

export async function updateTeardownItem({ vehicleId, bomLineId, input }: TeardownUpdateVars): Promise<TeardownUpdateReply> {
  return api.put(apiPaths.garage.teardown(vehicleId, bomLineId), input, { schema: teardownUpdateReply });
}

export function useUpdateTeardownItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTeardownItem,
    onSuccess: (reply, { vehicleId, assemblyId }) => {
      // Show the saved line at once; progress, needs and the log follow from the refetch.
      queryClient.setQueryData<Checklist>(garageKeys.checklist(vehicleId, assemblyId), (old) =>
        old ? { ...old, lines: old.lines.map((l) => (l.id === reply.bomLineId ? { ...l, teardown: reply.teardown, needed: reply.needed } : l)) } : old,
      );
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: garageKeys.vehicle(vehicleId) }),
        queryClient.invalidateQueries({ queryKey: garageKeys.vehicles() }),
      ]);
    },
  });
}
