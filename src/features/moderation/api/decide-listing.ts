import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListingDecisionInput } from '@shared/schemas/listings';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { moderationKeys } from './get-review-queue';

export async function decideListing({ id, ...input }: { id: string } & ListingDecisionInput): Promise<{ id: string; state: string; title: string }> {
  return (await api.post<{ listing: { id: string; state: string; title: string } }>(apiPaths.adminListings.decision(id), input)).listing;
}

export function useDecideListing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decideListing,
    onSuccess: (l) => Promise.all([queryClient.invalidateQueries({ queryKey: moderationKeys.all }), queryClient.invalidateQueries({ queryKey: ['listings', 'detail', l.id] })]),
  });
}
