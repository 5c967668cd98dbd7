import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { orderSchema, type OrderDto } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { orderKeys } from './order-keys';

const orderReply = z.object({ order: orderSchema });

export async function getOrder(id: string, signal?: AbortSignal): Promise<OrderDto> {
  return (await api.get(apiPaths.orders.one(id), { signal, schema: orderReply })).order;
}

// While the payment webhook is on its way, ask again this often.
export const PAYMENT_POLL_MS = 1500;

/**
 * One order. With `awaitingPayment` (the buyer just came back from the payment page) the order is asked for
 * again until the payment is recorded, because the webhook and the buyer's browser race each other.
 */
export function orderQueryOptions(id: string, { awaitingPayment = false }: { awaitingPayment?: boolean } = {}) {
  return queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: ({ signal }) => getOrder(id, signal),
    staleTime: 5_000,
    refetchInterval: (query) => (awaitingPayment && query.state.data?.state === 'pending_payment' ? PAYMENT_POLL_MS : false),
  });
}

export function useOrder(id: string, options: { awaitingPayment?: boolean } = {}) {
  return useQuery(orderQueryOptions(id, options));
}
