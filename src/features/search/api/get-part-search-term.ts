import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { searchKeys } from './search-keys';

// Only what search needs of GET /api/parts/:id: the part's headline number (the first of its first kind).
const partNumbersReply = z.object({
  part: z.object({ id: z.string(), name: z.string() }),
  numbers: z.array(z.object({ numbers: z.array(z.object({ printed: z.string() })) })),
});

export type PartSearchTerm = { partId: string; name: string; number: string | null };

export async function getPartSearchTerm(partId: string, signal?: AbortSignal): Promise<PartSearchTerm> {
  const reply = await api.get(apiPaths.catalog.part(partId), { signal, schema: partNumbersReply });
  return { partId: reply.part.id, name: reply.part.name, number: reply.numbers[0]?.numbers[0]?.printed ?? null };
}

export function partSearchTermQueryOptions(partId: string) {
  return queryOptions({ queryKey: [...searchKeys.all, 'part-term', partId], queryFn: ({ signal }) => getPartSearchTerm(partId, signal) });
}

export function usePartSearchTerm(partId: string) {
  return useQuery(partSearchTermQueryOptions(partId));
}
