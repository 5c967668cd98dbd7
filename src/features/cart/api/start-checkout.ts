import { useMutation, useQueryClient } from '@tanstack/react-query';
import { checkoutReply, type Destination } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { cartKeys } from './cart-keys';

export type CheckoutStarted = { orderId: string; url: string };

/** Reserves the cart's stock and opens the hosted payment page's session. */
export function startCheckout(destination: Destination): Promise<CheckoutStarted> {
  return api.post(apiPaths.checkout, { destination }, { schema: checkoutReply });
}

/** Leaves the app for the payment page (a full navigation: the page is on another origin). */
export function goToPaymentPage(url: string): void {
  window.location.assign(url);
}

export function useStartCheckout(options: { redirect?: (url: string) => void } = {}) {
  const queryClient = useQueryClient();
  const redirect = options.redirect ?? goToPaymentPage;
  return useMutation({
    mutationFn: startCheckout,
    onSuccess: (started) => redirect(started.url),
    // Out of stock or shipping refused: the cart shows the new truth.
    onError: () => queryClient.invalidateQueries({ queryKey: cartKeys.all }),
  });
}
