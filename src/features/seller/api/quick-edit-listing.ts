import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys } from './seller-keys';
import type { DeskListing } from './seller-types';

/** Quantity and price only: changing them keeps a live listing live (no new review). */
export async function quickEditListing({ id, ...input }: { id: string; quantity?: number; priceCents?: number }): Promise<DeskListing> {
  return (await api.patch<{ listing: DeskListing }>(apiPaths.listings.one(id), input)).listing;
}

export function useQuickEditListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: quickEditListing,
    onSuccess: (listing) => Promise.all([queryClient.invalidateQueries({ queryKey: sellerKeys.listings() }), queryClient.invalidateQueries({ queryKey: ['listings', 'detail', listing.id] })]),
  });
}
