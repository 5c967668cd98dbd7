import { teardownStatuses, teardownStatusLabels } from '@shared/schemas/garage';
import { cn } from '@/lib/cn';
import type { Progress } from '../api/garage-schemas';
import { statusTone } from '../utils/garage-format';

/**
 * Teardown progress: the share of lines inspected, drawn as a bar split by what was decided for each line
 * (kept parts green and blue, parts to buy amber and red), so a glance shows how much shopping is coming.
 */
export function ProgressBar({ label, progress, size = 'md', showLegend = false }: { label: string; progress: Progress; size?: 'sm' | 'md'; showLegend?: boolean }) {
  const { lines, inspected, percent } = progress;
  const segments = teardownStatuses
    .filter((s) => s !== 'not_inspected')
    .map((s) => ({ status: s, count: progress.byStatus[s] ?? 0 }))
    .filter((s) => s.count > 0);
  return (
    <div className="min-w-0">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${inspected} of ${lines} lines inspected (${percent}%)`}
        className={cn('flex w-full overflow-hidden rounded-tag border border-rule bg-paper-sunk', size === 'sm' ? 'h-2' : 'h-3')}
      >
        {lines > 0
          ? segments.map((s) => (
              <div key={s.status} className={cn('h-full', statusTone[s.status].bar)} style={{ width: `${(s.count * 100) / lines}%` }} />
            ))
          : null}
      </div>
      <p className={cn('mt-1 text-ink-muted', size === 'sm' ? 'text-xs' : 'text-sm')}>
        {lines === 0 ? 'No lines apply' : size === 'sm' ? `${inspected}/${lines} · ${percent}%` : `${inspected} of ${lines} inspected · ${percent}%`}
      </p>
      {showLegend && segments.length > 0 ? (
        <ul aria-label="Lines by status" className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
          {segments.map((s) => (
            <li key={s.status} className="flex items-center gap-1.5">
              <span aria-hidden="true" className={cn('size-2.5 rounded-full', statusTone[s.status].dot)} />
              {teardownStatusLabels[s.status]}: {s.count}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
