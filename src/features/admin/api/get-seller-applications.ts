import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sellerApplicationSchema, sellerApplicationStates, type SellerApplication } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';

export type SellerApplicationState = (typeof sellerApplicationStates)[number];

export const adminSellerApplicationKeys = {
  all: ['admin', 'seller-applications'] as const,
  list: (state: SellerApplicationState) => [...adminSellerApplicationKeys.all, 'list', { state }] as const,
};

const listReply = z.object({ applications: z.array(sellerApplicationSchema) });

export async function getSellerApplications(state: SellerApplicationState, signal?: AbortSignal): Promise<SellerApplication[]> {
  const reply = await api.get(apiPaths.admin.sellerApplications(state), { signal, schema: listReply });
  return reply.applications;
}

export function sellerApplicationsQueryOptions(state: SellerApplicationState = 'pending') {
  return queryOptions({
    queryKey: adminSellerApplicationKeys.list(state),
    queryFn: ({ signal }) => getSellerApplications(state, signal),
  });
}

export function useSellerApplications(state: SellerApplicationState = 'pending') {
  return useQuery(sellerApplicationsQueryOptions(state));
}
