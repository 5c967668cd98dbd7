import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { listingKeys } from './listing-keys';

/** Only a draft that was never submitted can be deleted (the server says so otherwise). */
export function deleteListing(id: string): Promise<void> {
  return api.delete<void>(apiPaths.listings.one(id));
}

export function useDeleteListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteListing,
    onSuccess: (_r, id) => {
      queryClient.removeQueries({ queryKey: listingKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: ['me', 'listings'] });
    },
  });
}
