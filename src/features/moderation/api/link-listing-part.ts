import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { moderationKeys } from './get-review-queue';

// Not in apiPaths yet (src/config is outside this feature); move it there when convenient.
const linkPartPath = (id: string) => `/api/admin/listings/${encodeURIComponent(id)}/part`;

/** Names the catalog part an unidentified listing is for. */
export async function linkListingPart({ id, partId }: { id: string; partId: string }): Promise<{ id: string }> {
  return (await api.post<{ listing: { id: string } }>(linkPartPath(id), { partId })).listing;
}

export function useLinkListingPart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: linkListingPart,
    onSuccess: (l) => Promise.all([queryClient.invalidateQueries({ queryKey: moderationKeys.all }), queryClient.invalidateQueries({ queryKey: ['listings', 'detail', l.id] })]),
  });
}
