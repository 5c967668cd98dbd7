import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { noticeKeys } from './garage-keys';
import { noticeReply, type Notice } from './garage-schemas';

export async function markNoticeRead(id: string): Promise<Notice> {
  const reply = await api.post(apiPaths.notices.read(id), undefined, { schema: noticeReply });
  return reply.notice;
}

export async function markAllNoticesRead(): Promise<number> {
  const reply = await api.post(apiPaths.notices.readAll, undefined, { schema: z.object({ marked: z.number() }) });
  return reply.marked;
}

export function useMarkNoticeRead() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: markNoticeRead, onSuccess: () => queryClient.invalidateQueries({ queryKey: noticeKeys.all }) });
}

export function useMarkAllNoticesRead() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: markAllNoticesRead, onSuccess: () => queryClient.invalidateQueries({ queryKey: noticeKeys.all }) });
}
