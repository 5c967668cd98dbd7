import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { payoutStateSchema } from '@shared/schemas/orders';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerOrderKeys } from './seller-order-keys';

// The reply of GET /api/seller/payouts; the transfer rows have no shared schema yet, so their shape is checked here.
export const payoutsReply = z.object({
  payouts: payoutStateSchema,
  recentTransfers: z.array(
    z.object({
      id: z.string(),
      subOrderId: z.string(),
      orderId: z.string(),
      amountCents: z.number().int(),
      state: z.enum(['pending', 'paid', 'waiting_for_onboarding', 'failed']),
      createdAt: z.string(),
    }),
  ),
});
export type PayoutsReply = z.infer<typeof payoutsReply>;

export function getPayouts(signal?: AbortSignal): Promise<PayoutsReply> {
  return api.get(apiPaths.sellerOrders.payouts, { signal, schema: payoutsReply });
}

export function payoutsQueryOptions() {
  // The server asks Stripe again while onboarding is incomplete, so coming back from the onboarding page shows the new state.
  return queryOptions({ queryKey: sellerOrderKeys.payouts(), queryFn: ({ signal }) => getPayouts(signal), staleTime: 0 });
}

export function usePayouts() {
  return useQuery(payoutsQueryOptions());
}

export function startOnboarding(): Promise<{ url: string }> {
  return api.post(apiPaths.sellerOrders.onboarding, undefined, { schema: z.object({ url: z.string() }) });
}

/** Opens the payout onboarding page (on the payment provider's site, so a full navigation). */
export function useStartOnboarding(options: { redirect?: (url: string) => void } = {}) {
  const redirect = options.redirect ?? ((url: string) => window.location.assign(url));
  return useMutation({ mutationFn: startOnboarding, onSuccess: ({ url }) => redirect(url) });
}
