import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';
import type { ListingPhoto } from './listing-types';

/** The first id becomes the cover photo. */
export async function reorderListingPhotos({ id, photoIds }: { id: string; photoIds: string[] }): Promise<ListingPhoto[]> {
  return (await api.put<{ photos: ListingPhoto[] }>(apiPaths.listings.photoOrder(id), { photoIds })).photos;
}

export function useReorderListingPhotos() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reorderListingPhotos,
    onSuccess: (_photos, { id }) => queryClient.invalidateQueries({ queryKey: listingKeys.detail(id) }),
  });
}
