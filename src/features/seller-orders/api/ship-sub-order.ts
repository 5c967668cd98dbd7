import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SellerSubOrderDto, ShipInput } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerSubOrderReply } from './get-seller-order';
import { sellerOrderKeys } from './seller-order-keys';

/** paid -> shipped with carrier and tracking; the buyer is told by e-mail. */
export async function shipSubOrder(id: string, input: ShipInput): Promise<SellerSubOrderDto> {
  return (await api.post(apiPaths.sellerOrders.ship(id), input, { schema: sellerSubOrderReply })).subOrder;
}

/** shipped -> delivered, or paid -> delivered for a pickup handed over. */
export async function deliverSubOrder(id: string): Promise<SellerSubOrderDto> {
  return (await api.post(apiPaths.sellerOrders.deliver(id), undefined, { schema: sellerSubOrderReply })).subOrder;
}

function useAfterMove() {
  const queryClient = useQueryClient();
  return async (subOrder: SellerSubOrderDto) => {
    queryClient.setQueryData(sellerOrderKeys.detail(subOrder.id), subOrder);
    await queryClient.invalidateQueries({ queryKey: sellerOrderKeys.lists() });
  };
}

export function useShipSubOrder(id: string) {
  const after = useAfterMove();
  return useMutation({ mutationFn: (input: ShipInput) => shipSubOrder(id, input), onSuccess: after });
}

export function useDeliverSubOrder(id: string) {
  const after = useAfterMove();
  return useMutation({ mutationFn: () => deliverSubOrder(id), onSuccess: after });
}
