import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cartReply, type AddCartItemInput, type CartReply } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeys } from './cart-keys';

/** Adds units on top of what the cart holds; the server caps the total by stock and says so in `warnings`. */
export function addCartItem(input: AddCartItemInput): Promise<CartReply> {
  return api.post(apiPaths.cart.items(null), input, { schema: cartReply });
}

export function useAddCartItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addCartItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cartKeys.all }),
  });
}
