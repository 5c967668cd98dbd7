import { Bell, X } from 'lucide-react';
import { toast } from 'sonner';
import { conditionPolicyLabels, teardownStatusLabels } from '@shared/schemas/garage';
import { Button } from '@/components/ui/button';
import { useCreateAlert } from '../api/create-alert';
import { useDeleteWant } from '../api/delete-want';
import type { NeedsList } from '../api/garage-schemas';

/** The needs list: what to buy, why, in which condition, with the arithmetic of each teardown line. */
export function NeedsTable({ vehicleId, list }: { vehicleId: string; list: NeedsList }) {
  const removeWant = useDeleteWant(vehicleId);
  const watch = useCreateAlert();
  const parts = new Set(list.needs.map((n) => n.part.id)).size;
  return (
    <div>
      <p className="mb-3 text-sm text-ink-soft" aria-live="polite">
        <span className="font-semibold text-ink">{list.totalUnits}</span> unit{list.totalUnits === 1 ? '' : 's'} of{' '}
        <span className="font-semibold text-ink">{parts}</span> part{parts === 1 ? '' : 's'} to find for serial {list.serial}.
      </p>
      <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card print:overflow-visible print:border-ink print:shadow-none">
        <table className="w-full min-w-[44rem] text-left text-sm print:min-w-0">
          <caption className="sr-only">Needs list</caption>
          <thead className="border-b border-rule bg-paper-sunk/60 text-label text-ink-soft uppercase print:bg-transparent">
            <tr>
              <th scope="col" className="px-3 py-2">
                Part number
              </th>
              <th scope="col" className="px-3 py-2">
                Part
              </th>
              <th scope="col" className="px-3 py-2">
                Condition
              </th>
              <th scope="col" className="px-3 py-2">
                From
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Needed
              </th>
              <th scope="col" className="px-3 py-2 print:hidden">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {list.needs.map((n) => (
              <tr key={n.needId} className="align-top break-inside-avoid">
                <td className="px-3 py-2 font-mono font-semibold whitespace-nowrap text-ink">{n.part.primaryNumber ?? '—'}</td>
                <td className="px-3 py-2 text-ink">{n.part.name}</td>
                <td className="px-3 py-2 text-ink-soft">{conditionPolicyLabels[n.policy]}</td>
                <td className="px-3 py-2">
                  <ul className="space-y-0.5 text-ink-soft">
                    {n.sources.map((s) =>
                      s.kind === 'teardown' ? (
                        <li key={s.bomLineId}>
                          {s.assembly.name} #{s.callout}: {teardownStatusLabels[s.status].toLowerCase()}, {s.quantity}
                          {s.note ? <span className="block text-xs text-ink-muted">{s.note}</span> : null}
                        </li>
                      ) : (
                        <li key={s.wantId} className="flex items-start gap-1">
                          <span>
                            Added by hand, {s.quantity}
                            {s.note ? <span className="block text-xs text-ink-muted">{s.note}</span> : null}
                          </span>
                          <button
                            type="button"
                            className="rounded-tag p-0.5 text-ink-muted hover:bg-danger-soft hover:text-danger print:hidden"
                            aria-label={`Remove the want for ${n.part.primaryNumber ?? n.part.name}`}
                            onClick={() => removeWant.mutate(s.wantId, { onError: (e) => toast.error(e.message) })}
                          >
                            <X aria-hidden="true" className="size-3.5" />
                          </button>
                        </li>
                      ),
                    )}
                  </ul>
                </td>
                <td className="px-3 py-2 text-right font-mono text-base font-semibold text-ink">{n.quantity}</td>
                <td className="px-3 py-2 text-right print:hidden">
                  <Button
                    variant="ghost"
                    size="sm"
                    icon={<Bell aria-hidden="true" className="size-4" />}
                    aria-label={`Watch ${n.part.primaryNumber ?? n.part.name}`}
                    onClick={() =>
                      watch.mutate(
                        { partId: n.part.id, policy: n.policy },
                        { onSuccess: () => toast.success(`Watching ${n.part.primaryNumber ?? n.part.name}`), onError: (e) => toast.error(e.message) },
                      )
                    }
                  >
                    Watch
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
