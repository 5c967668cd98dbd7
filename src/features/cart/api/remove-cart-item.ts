import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cartReply, type CartReply, type Destination } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeys } from './cart-keys';

export function removeCartItem(listingId: string, destination: Destination | null): Promise<CartReply> {
  return api.delete(apiPaths.cart.item(listingId, destination), { schema: cartReply });
}

export function useRemoveCartItem(owner: string, destination: Destination | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (listingId: string) => removeCartItem(listingId, destination),
    onSuccess: (reply) => {
      queryClient.setQueryData(cartKeys.view(owner, destination), reply);
    },
  });
}
