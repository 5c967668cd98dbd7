import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { checklistReply, type Checklist } from './garage-schemas';

export async function getChecklist(id: string, assemblyId: string, signal?: AbortSignal): Promise<Checklist> {
  return api.get(apiPaths.garage.checklist(id, assemblyId), { signal, schema: checklistReply });
}

export function checklistQueryOptions(id: string, assemblyId: string) {
  return queryOptions({ queryKey: garageKeys.checklist(id, assemblyId), queryFn: ({ signal }) => getChecklist(id, assemblyId, signal) });
}

export function useChecklist(id: string, assemblyId: string) {
  return useQuery(checklistQueryOptions(id, assemblyId));
}
