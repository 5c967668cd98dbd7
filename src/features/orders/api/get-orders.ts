import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { orderSummarySchema, type OrderSummary } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { orderKeys } from './order-keys';

const ordersReply = z.object({ orders: z.array(orderSummarySchema) });

export async function getOrders(signal?: AbortSignal): Promise<OrderSummary[]> {
  return (await api.get(apiPaths.orders.list, { signal, schema: ordersReply })).orders;
}

export function ordersQueryOptions() {
  return queryOptions({ queryKey: orderKeys.list(), queryFn: ({ signal }) => getOrders(signal), staleTime: 10_000 });
}

export function useOrders() {
  return useQuery(ordersQueryOptions());
}
