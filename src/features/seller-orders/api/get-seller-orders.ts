import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sellerSubOrderSchema, type SellerSubOrderDto } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerOrderKeys } from './seller-order-keys';

const reply = z.object({ subOrders: z.array(sellerSubOrderSchema) });

export async function getSellerOrders(state: SellerSubOrderDto['state'] | undefined, signal?: AbortSignal): Promise<SellerSubOrderDto[]> {
  return (await api.get(apiPaths.sellerOrders.list(state), { signal, schema: reply })).subOrders;
}

export function sellerOrdersQueryOptions(state: SellerSubOrderDto['state'] | undefined) {
  return queryOptions({
    queryKey: sellerOrderKeys.list(state),
    queryFn: ({ signal }) => getSellerOrders(state, signal),
    staleTime: 10_000,
    placeholderData: keepPreviousData,
  });
}

export function useSellerOrders(state: SellerSubOrderDto['state'] | undefined) {
  return useQuery(sellerOrdersQueryOptions(state));
}
