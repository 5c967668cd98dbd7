import { listingStateCodes, type ListingStateCode } from '@shared/schemas/listings';
import { cn } from '@/lib/cn';
import { stateLabels } from '../utils/desk-format';

type Props = {
  counts: Record<ListingStateCode, number>;
  active: ListingStateCode | undefined;
  onSelect: (state: ListingStateCode | undefined) => void;
};

/** Counts by state; each is also the table's state filter. */
export function StateCounts({ counts, active, onSelect }: Props) {
  const total = listingStateCodes.reduce((n, s) => n + (counts[s] ?? 0), 0);
  const tiles: Array<[ListingStateCode | undefined, string, number]> = [[undefined, 'All', total], ...listingStateCodes.map((s) => [s, stateLabels[s], counts[s] ?? 0] as [ListingStateCode, string, number])];
  return (
    <ul aria-label="Listings by state" className="grid grid-cols-2 gap-2 sm:grid-cols-4 lg:grid-cols-8">
      {tiles.map(([state, label, n]) => (
        <li key={label}>
          <button
            type="button"
            aria-pressed={active === state}
            onClick={() => onSelect(state)}
            className={cn(
              'flex w-full flex-col items-start rounded-card border px-3 py-2 text-left shadow-card',
              active === state ? 'border-patina-500 bg-patina-50' : 'border-rule bg-paper-raised hover:border-patina-300',
            )}
          >
            <span className="text-2xl font-bold text-ink tabular-nums">{n}</span>
            <span className="text-label text-ink-muted uppercase">{label}</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
