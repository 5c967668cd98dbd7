import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateListingInput } from '@shared/schemas/listings';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { Listing } from './listing-types';

export async function updateListing({ id, ...input }: { id: string } & UpdateListingInput): Promise<Listing> {
  return (await api.patch<{ listing: Listing }>(apiPaths.listings.one(id), input)).listing;
}

export function useUpdateListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateListing,
    onSuccess: (listing) =>
      Promise.all([queryClient.invalidateQueries({ queryKey: listingKeys.detail(listing.id) }), queryClient.invalidateQueries({ queryKey: ['me', 'listings'] })]),
  });
}
