import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { orderSchema, type OrderDto, type RefundInput } from '@shared/schemas/orders';
import { api } from '@/lib/api-client';
import { orderKeys } from './order-keys';

const orderReply = z.object({ order: orderSchema });

// Not in apiPaths yet (src/config is outside this feature); move it there when convenient.
const refundPath = (id: string) => `/api/admin/orders/${encodeURIComponent(id)}/refund`;

/** An administrator refunds all or part of a paid order; the reply is the order as it now stands. */
export async function refundOrder({ orderId, ...input }: { orderId: string } & RefundInput): Promise<OrderDto> {
  return (await api.post(refundPath(orderId), input, { schema: orderReply })).order;
}

export function useRefundOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: refundOrder,
    onSuccess: async (order) => {
      queryClient.setQueryData(orderKeys.detail(order.id), order);
      await queryClient.invalidateQueries({ queryKey: orderKeys.all });
    },
  });
}
