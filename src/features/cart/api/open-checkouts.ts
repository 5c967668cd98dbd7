import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { orderSummarySchema, type OrderSummary } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeys } from './cart-keys';

/*
 * A checkout left on the payment page (the buyer came back without paying) holds its stock until it expires,
 * so the cart shows those units as taken. The cart offers to give that hold up.
 */

const ordersReply = z.object({ orders: z.array(orderSummarySchema) });

export async function getOpenCheckouts(signal?: AbortSignal): Promise<OrderSummary[]> {
  const reply = await api.get(apiPaths.orders.list, { signal, schema: ordersReply });
  const now = Date.now();
  return reply.orders.filter((o) => o.state === 'pending_payment' && new Date(o.expiresAt).getTime() > now);
}

export function openCheckoutsQueryOptions() {
  return queryOptions({ queryKey: cartKeys.openCheckouts(), queryFn: ({ signal }) => getOpenCheckouts(signal), staleTime: 0 });
}

export function useOpenCheckouts(enabled: boolean) {
  return useQuery({ ...openCheckoutsQueryOptions(), enabled });
}

export function cancelCheckout(orderId: string): Promise<unknown> {
  return api.post(apiPaths.orders.cancel(orderId));
}

export function useCancelCheckout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelCheckout,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: cartKeys.all });
      await queryClient.invalidateQueries({ queryKey: ['orders'] });
    },
  });
}
