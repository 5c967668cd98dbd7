import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sellerApplicationSchema, type SellerApplication } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';

export const sellerApplicationKeys = {
  all: ['seller-applications'] as const,
  mine: () => [...sellerApplicationKeys.all, 'mine'] as const,
};

const mineReply = z.object({ application: sellerApplicationSchema.nullable() });

export async function getMySellerApplication(signal?: AbortSignal): Promise<SellerApplication | null> {
  const reply = await api.get(apiPaths.sellerApplications.mine, { signal, schema: mineReply });
  return reply.application;
}

export function mySellerApplicationQueryOptions() {
  return queryOptions({
    queryKey: sellerApplicationKeys.mine(),
    queryFn: ({ signal }) => getMySellerApplication(signal),
  });
}

export function useMySellerApplication() {
  return useQuery(mySellerApplicationQueryOptions());
}
