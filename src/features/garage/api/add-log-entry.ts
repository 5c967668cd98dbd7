import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LogEntryInput } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { logEntryReply, type LogEntry } from './garage-schemas';

export async function addLogEntry({ vehicleId, input }: { vehicleId: string; input: LogEntryInput }): Promise<LogEntry> {
  const reply = await api.post(apiPaths.garage.log(vehicleId), input, { schema: logEntryReply });
  return reply.entry;
}

export function useAddLogEntry(vehicleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: LogEntryInput) => addLogEntry({ vehicleId, input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: garageKeys.log(vehicleId) }),
  });
}
