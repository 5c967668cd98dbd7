import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { Listing } from './listing-types';

export type SellerListingAction = 'submit' | 'withdraw' | 'reopen';

/** POST /api/listings/:id/{submit,withdraw,reopen}: the seller's own moves in the listing's life. */
export async function changeListingState({ id, action }: { id: string; action: SellerListingAction }): Promise<Listing> {
  return (await api.post<{ listing: Listing }>(apiPaths.listings.action(id, action))).listing;
}

export function useChangeListingState() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeListingState,
    onSuccess: (listing) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: listingKeys.detail(listing.id) }), queryClient.invalidateQueries({ queryKey: ['me', 'listings'] })]),
  });
}
