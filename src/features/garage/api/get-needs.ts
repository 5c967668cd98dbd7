import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { needsReply, type NeedsList } from './garage-schemas';

export async function getNeeds(id: string, signal?: AbortSignal): Promise<NeedsList> {
  return api.get(apiPaths.garage.needs(id), { signal, schema: needsReply });
}

export function needsQueryOptions(id: string) {
  return queryOptions({ queryKey: garageKeys.needs(id), queryFn: ({ signal }) => getNeeds(id, signal) });
}

export function useNeeds(id: string) {
  return useQuery(needsQueryOptions(id));
}
