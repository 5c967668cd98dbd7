import { useState, type FormEvent } from 'react';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/skeleton';
import { cn } from '@/lib/cn';
import { useAddLogEntry } from '../api/add-log-entry';
import { useLog } from '../api/get-log';
import { formatDateTime } from '../utils/garage-format';

/** The dated log of the teardown: status changes written by the server, plus notes written here. */
export function TeardownLog({ vehicleId, limit, compact = false }: { vehicleId: string; limit?: number; compact?: boolean }) {
  const log = useLog(vehicleId);
  const add = useAddLogEntry(vehicleId);
  const [text, setText] = useState('');
  const [showAll, setShowAll] = useState(false);

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    if (!text.trim()) return;
    add.mutate({ text: text.trim() }, { onSuccess: () => setText(''), onError: (err) => toast.error(err.message) });
  };

  const entries = log.data ?? [];
  const shown = limit && !showAll ? entries.slice(0, limit) : entries;
  return (
    <section aria-labelledby="log-title" className="rounded-card border border-rule bg-paper-raised p-4 shadow-card">
      <h2 id="log-title" className="text-lg font-semibold text-ink">
        Teardown log
      </h2>
      <form onSubmit={onSubmit} className={cn('mt-3 flex flex-col gap-2', !compact && 'sm:flex-row sm:items-start')}>
        <label htmlFor="log-text" className="sr-only">
          New log note
        </label>
        <textarea
          id="log-text"
          rows={2}
          value={text}
          maxLength={4000}
          onChange={(e) => setText(e.target.value)}
          placeholder="What you found today, what you ordered, what to check next…"
          className="block min-w-0 flex-1 rounded-tag border border-rule-strong bg-paper px-3 py-2 text-sm text-ink placeholder:text-ink-muted"
        />
        <Button type="submit" variant="secondary" className={compact ? 'self-start' : undefined} isLoading={add.isPending} disabled={!text.trim()}>
          Add to log
        </Button>
      </form>
      {log.isPending ? (
        <Skeleton className="mt-4 h-16" />
      ) : log.isError ? (
        <p className="mt-4 text-sm text-danger">{log.error.message}</p>
      ) : entries.length === 0 ? (
        <p className="mt-4 text-sm text-ink-muted">No entries yet. Status changes are written here as you go.</p>
      ) : (
        <ol aria-label="Log entries" className="mt-4 divide-y divide-rule border-t border-rule">
          {shown.map((e) => (
            <li key={e.id} className={cn('grid gap-x-4 py-2', !compact && 'sm:grid-cols-[11rem_minmax(0,1fr)]')}>
              <time dateTime={e.at} className="text-xs text-ink-muted tabular-nums">
                {formatDateTime(e.at)}
              </time>
              <p className="text-sm whitespace-pre-line text-ink">{e.text}</p>
            </li>
          ))}
        </ol>
      )}
      {limit && entries.length > limit ? (
        <Button variant="ghost" size="sm" className="mt-2" onClick={() => setShowAll((v) => !v)}>
          {showAll ? 'Show fewer' : `Show all ${entries.length} entries`}
        </Button>
      ) : null}
    </section>
  );
}
