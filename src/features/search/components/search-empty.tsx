import { SearchX } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { SearchReply } from '@shared/schemas/search';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';

type Props = {
  q: string;
  didYouMean: SearchReply['didYouMean'];
  filtersActive: boolean;
  onClearFilters: () => void;
};

/** Nothing found: propose the catalog's close numbers, and say when the filters are what hides the hits. */
export function SearchEmpty({ q, didYouMean, filtersActive, onClearFilters }: Props) {
  return (
    <div className="rounded-card border border-dashed border-rule-strong bg-paper-raised p-6">
      <div className="flex gap-4">
        <SearchX aria-hidden="true" className="size-7 shrink-0 text-drab-500" />
        <div className="min-w-0 space-y-3">
          <h2 className="text-lg font-semibold text-ink">{q ? `Nothing matches “${q}”` : 'Nothing matches these filters'}</h2>
          {didYouMean.length > 0 ? (
            <div>
              <p className="text-ink-soft">Close numbers in the catalog:</p>
              <ul aria-label="Close numbers" className="mt-2 flex flex-wrap gap-2">
                {didYouMean.map((d) => (
                  <li key={`${d.partId}-${d.number}`}>
                    <Link
                      to={paths.search.getHref(d.number)}
                      className="inline-flex h-8 items-center rounded-tag border border-patina-300 bg-patina-50 px-2.5 font-mono text-sm text-patina-800 hover:bg-patina-100"
                    >
                      {d.number}
                    </Link>
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
          <p className="text-sm text-ink-soft">
            Numbers match with or without hyphens, spaces and leading zeros. Check it against the data plate or the parts
            list, try fewer words, or browse the assembly in the{' '}
            <Link to={paths.catalog.getHref()} className="font-medium text-patina-700 underline underline-offset-3">
              catalog
            </Link>
            .
          </p>
          {filtersActive ? (
            <Button variant="secondary" size="sm" onClick={onClearFilters}>
              Clear all filters
            </Button>
          ) : null}
        </div>
      </div>
    </div>
  );
}
