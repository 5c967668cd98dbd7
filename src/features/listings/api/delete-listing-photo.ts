import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { Listing } from './listing-types';

export async function deleteListingPhoto({ id, photoId }: { id: string; photoId: string }): Promise<Listing> {
  return (await api.delete<{ listing: Listing }>(apiPaths.listings.photo(id, photoId))).listing;
}

export function useDeleteListingPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteListingPhoto,
    onSuccess: (_l, { id }) => queryClient.invalidateQueries({ queryKey: listingKeys.detail(id) }),
  });
}
