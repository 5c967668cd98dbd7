import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WantInput } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { resolveReply, wantReply } from './garage-schemas';

export async function addWant({ vehicleId, input }: { vehicleId: string; input: WantInput }) {
  const reply = await api.post(apiPaths.garage.wants(vehicleId), input, { schema: wantReply });
  return reply.want;
}

/** The catalog part a typed number names: exact matches first, else O/0 and I/1 look-alikes. */
export async function resolvePartNumber(number: string) {
  const reply = await api.get(apiPaths.catalog.resolve(number), { schema: resolveReply });
  const exact = reply.matches.filter((m) => m.matchedBy === 'exact');
  const direct = exact.length ? exact : reply.matches.filter((m) => m.matchedBy === 'alternate_number');
  const ids = [...new Set(direct.map((m) => m.partId))];
  return ids.map((id) => reply.parts.find((p) => p.id === id)).filter((p) => p !== undefined);
}

export function useAddWant(vehicleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: WantInput) => addWant({ vehicleId, input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: garageKeys.needs(vehicleId) }),
  });
}
