import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateListingInput } from '@shared/schemas/listings';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { Listing } from './listing-types';

export async function createListing(input: CreateListingInput): Promise<Listing> {
  return (await api.post<{ listing: Listing }>(apiPaths.listings.create, input)).listing;
}

export function useCreateListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createListing,
    // The seller's dashboard lists it too ('me', 'listings').
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: listingKeys.all }), queryClient.invalidateQueries({ queryKey: ['me', 'listings'] })]),
  });
}
