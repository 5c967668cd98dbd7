import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { moderationKeys } from './get-review-queue';

export interface ApproveManyReply {
  approved: string[];
  skipped: Array<{ id: string; reason: 'not_found' | 'not_submitted' | 'flagged' | string }>;
}

/** Approves the named listings that carry no flag; the server reports the rest back. */
export function approveMany(ids: string[]): Promise<ApproveManyReply> {
  return api.post<ApproveManyReply>(apiPaths.adminListings.approveMany, { ids });
}

export function useApproveMany() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: approveMany, onSuccess: () => queryClient.invalidateQueries({ queryKey: moderationKeys.all }) });
}
