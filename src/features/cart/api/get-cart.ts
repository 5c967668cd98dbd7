import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { cartReply, type CartReply, type Destination } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeys } from './cart-keys';

export function getCart(destination: Destination | null, signal?: AbortSignal): Promise<CartReply> {
  return api.get(apiPaths.cart.view(destination), { signal, schema: cartReply });
}

export function cartQueryOptions(owner: string, destination: Destination | null) {
  return queryOptions({
    queryKey: cartKeys.view(owner, destination),
    queryFn: ({ signal }) => getCart(destination, signal),
    // Prices and stock move under the buyer's feet: always ask again when the cart is opened.
    staleTime: 0,
    // Another destination re-prices shipping; the cart stays on screen meanwhile.
    placeholderData: keepPreviousData,
  });
}

export function useCart(owner: string, destination: Destination | null) {
  return useQuery(cartQueryOptions(owner, destination));
}
