import { BellRing } from 'lucide-react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Skeleton } from '@/components/ui/skeleton';
import { cn } from '@/lib/cn';
import { useNotices } from '../api/get-notices';
import { useMarkAllNoticesRead, useMarkNoticeRead } from '../api/mark-notices-read';
import { formatDateTime } from '../utils/garage-format';

/** In-app notices, newest first; following a notice's link marks it read. */
export function NoticesList() {
  const notices = useNotices();
  const markOne = useMarkNoticeRead();
  const markAll = useMarkAllNoticesRead();
  if (notices.isPending) return <Skeleton className="h-32" />;
  if (notices.isError) return <Notice tone="danger" role="alert" title="We could not load your notices">{notices.error.message}</Notice>;
  const { notices: list, unreadCount } = notices.data;
  const read = (id: string) => markOne.mutate(id, { onError: (e) => toast.error(e.message) });
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-soft">{unreadCount ? `${unreadCount} unread` : list.length ? 'All read' : ''}</p>
        {unreadCount ? (
          <Button variant="secondary" size="sm" isLoading={markAll.isPending} onClick={() => markAll.mutate(undefined, { onError: (e) => toast.error(e.message) })}>
            Mark all read
          </Button>
        ) : null}
      </div>
      {list.length === 0 ? (
        <p className="text-ink-soft">No notices yet. When a part you watch is listed, you hear it here.</p>
      ) : (
        <ul aria-label="Notices" className="divide-y divide-rule rounded-card border border-rule bg-paper-raised shadow-card">
          {list.map((n) => (
            <li key={n.id} className={cn('flex gap-3 px-4 py-3', !n.read && 'bg-patina-50/70')}>
              <BellRing aria-hidden="true" className={cn('mt-0.5 size-4 shrink-0', n.read ? 'text-ink-muted' : 'text-patina-600')} />
              <div className="min-w-0 flex-1">
                <p className={cn('text-sm text-ink', !n.read && 'font-semibold')}>
                  {n.link ? (
                    <Link to={n.link} onClick={() => (n.read ? undefined : read(n.id))} className="hover:underline">
                      {n.title}
                    </Link>
                  ) : (
                    n.title
                  )}
                  {!n.read ? <span className="sr-only"> (unread)</span> : null}
                </p>
                {n.body ? <p className="text-sm text-ink-soft">{n.body}</p> : null}
                <time dateTime={n.createdAt} className="text-xs text-ink-muted">
                  {formatDateTime(n.createdAt)}
                </time>
              </div>
              {!n.read ? (
                <Button variant="ghost" size="sm" onClick={() => read(n.id)} aria-label={`Mark read: ${n.title}`}>
                  Mark read
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
