import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cartReply, type CartReply, type Destination } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeys } from './cart-keys';

export type UpdateCartItemVars = { listingId: string; quantity: number };

/** Sets a line's quantity (capped by stock on the server); the reply is the whole cart priced for `destination`. */
export function updateCartItem(vars: UpdateCartItemVars, destination: Destination | null): Promise<CartReply> {
  return api.patch(apiPaths.cart.item(vars.listingId, destination), { quantity: vars.quantity }, { schema: cartReply });
}

export function useUpdateCartItem(owner: string, destination: Destination | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (vars: UpdateCartItemVars) => updateCartItem(vars, destination),
    onSuccess: (reply) => {
      queryClient.setQueryData(cartKeys.view(owner, destination), reply);
    },
  });
}
