import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { sellerSubOrderSchema, type SellerSubOrderDto } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerOrderKeys } from './seller-order-keys';

export const sellerSubOrderReply = z.object({ subOrder: sellerSubOrderSchema });

export async function getSellerOrder(id: string, signal?: AbortSignal): Promise<SellerSubOrderDto> {
  return (await api.get(apiPaths.sellerOrders.one(id), { signal, schema: sellerSubOrderReply })).subOrder;
}

export function sellerOrderQueryOptions(id: string) {
  return queryOptions({ queryKey: sellerOrderKeys.detail(id), queryFn: ({ signal }) => getSellerOrder(id, signal), staleTime: 5_000 });
}

export function useSellerOrder(id: string) {
  return useQuery(sellerOrderQueryOptions(id));
}
