import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { noticeKeys } from './garage-keys';
import { noticesReply, type NoticesList } from './garage-schemas';

export async function getNotices(signal?: AbortSignal): Promise<NoticesList> {
  return api.get(apiPaths.notices.list({ limit: 100 }), { signal, schema: noticesReply });
}

export function noticesQueryOptions() {
  return queryOptions({ queryKey: noticeKeys.list(), queryFn: ({ signal }) => getNotices(signal) });
}

export function useNotices() {
  return useQuery(noticesQueryOptions());
}

/** Only the unread count (one notice fetched), polled gently so a new wanted-part notice shows up. */
export function useUnreadNoticeCount() {
  return useQuery({
    queryKey: noticeKeys.unreadCount(),
    queryFn: async ({ signal }) => (await api.get(apiPaths.notices.list({ unread: true, limit: 1 }), { signal, schema: noticesReply })).unreadCount,
    refetchInterval: 60_000,
  });
}
