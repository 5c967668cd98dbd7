import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { alertKeys } from './garage-keys';
import { alertsReply, type WantedAlert } from './garage-schemas';

export async function getAlerts(signal?: AbortSignal): Promise<WantedAlert[]> {
  const reply = await api.get(apiPaths.alerts.list, { signal, schema: alertsReply });
  return reply.alerts;
}

export function alertsQueryOptions() {
  return queryOptions({ queryKey: alertKeys.list(), queryFn: ({ signal }) => getAlerts(signal) });
}

export function useAlerts() {
  return useQuery(alertsQueryOptions());
}
