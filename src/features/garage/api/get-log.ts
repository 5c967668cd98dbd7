import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { logReply, type LogEntry } from './garage-schemas';

export async function getLog(id: string, signal?: AbortSignal): Promise<LogEntry[]> {
  const reply = await api.get(apiPaths.garage.log(id), { signal, schema: logReply });
  return reply.entries;
}

export function logQueryOptions(id: string) {
  return queryOptions({ queryKey: garageKeys.log(id), queryFn: ({ signal }) => getLog(id, signal) });
}

export function useLog(id: string) {
  return useQuery(logQueryOptions(id));
}
