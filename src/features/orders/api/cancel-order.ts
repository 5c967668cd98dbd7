import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { orderSchema, type OrderDto } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { orderKeys } from './order-keys';

const orderReply = z.object({ order: orderSchema });

/** Gives up an unpaid checkout: the payment page stops accepting it and the held stock goes back. */
export async function cancelOrder(id: string): Promise<OrderDto> {
  return (await api.post(apiPaths.orders.cancel(id), undefined, { schema: orderReply })).order;
}

export function useCancelOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelOrder,
    onSuccess: async (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      await queryClient.invalidateQueries({ queryKey: orderKeys.list() });
      // The released units show again in the cart.
      await queryClient.invalidateQueries({ queryKey: ['cart'] });
    },
  });
}
