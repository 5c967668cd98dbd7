import { ChevronLeft, ChevronRight, SlidersHorizontal } from 'lucide-react';
import { useId, useState } from 'react';
import type { SearchReply } from '@shared/schemas/search';
import { ContentLayout } from '@/components/layouts/content-layout';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Skeleton } from '@/components/ui/skeleton';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { useSearch } from '../api/get-search';
import { useSearchState } from '../hooks/use-search-state';
import { activeFilterCount, withNextPage, withoutFilters, withPreviousPage, withSort, type SearchSort, type SearchState } from '../utils/search-state';
import { ActiveFilters } from './active-filters';
import { FacetSidebar } from './facet-sidebar';
import { ResultCard } from './result-card';
import { SearchEmpty } from './search-empty';

const countFormat = new Intl.NumberFormat('en-US');

const sortOptions: Array<{ value: SearchSort; label: string; needsPrice?: boolean }> = [
  { value: 'relevance', label: 'Best match' },
  { value: 'price_asc', label: 'Price, low to high', needsPrice: true },
  { value: 'price_desc', label: 'Price, high to low', needsPrice: true },
  { value: 'newest', label: 'Newest' },
];

function resultSummary(reply: SearchReply): string {
  const n = countFormat.format(reply.total);
  if (reply.totalIsEstimate) return `About ${n} results`;
  return reply.total === 1 ? '1 result' : `${n} results`;
}

function SortSelect({ state, onChange }: { state: SearchState; onChange: (s: SearchState) => void }) {
  const id = useId();
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="text-sm text-ink-soft">
        Sort
      </label>
      <select
        id={id}
        value={state.sort}
        onChange={(e) => onChange(withSort(state, e.target.value as SearchSort))}
        className="h-9 rounded-tag border border-rule-strong bg-paper-raised px-2 text-sm text-ink"
      >
        {sortOptions.map((o) => (
          // Catalog parts carry no price, and the server refuses a price sort on them.
          <option key={o.value} value={o.value} disabled={o.needsPrice && state.type === 'part'}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}

function ResultsSkeleton() {
  return (
    <div role="status" className="space-y-3">
      <span className="sr-only">Searching…</span>
      {[0, 1, 2, 3].map((i) => (
        <div key={i} className="flex gap-4 rounded-card border border-rule bg-paper-raised p-4">
          <Skeleton className="size-24 shrink-0" />
          <div className="flex-1 space-y-2">
            <Skeleton className="h-5 w-3/5" />
            <Skeleton className="h-4 w-2/5" />
            <Skeleton className="h-4 w-4/5" />
          </div>
        </div>
      ))}
    </div>
  );
}

function SearchProblem({ error, onRetry }: { error: Error; onRetry: () => void }) {
  if (isApiError(error) && error.status === 400) {
    return (
      <Notice tone="warn" role="alert" title="That search could not be run">
        <p>{error.message}</p>
      </Notice>
    );
  }
  return (
    <Notice tone="danger" role="alert" title="Search is not answering">
      <p>{error.message}</p>
      <Button variant="secondary" size="sm" className="mt-3" onClick={onRetry}>
        Try again
      </Button>
    </Notice>
  );
}

/** How the words were read: corrected spellings, or "some of the words" when no hit had them all. */
function QueryNotes({ reply }: { reply: SearchReply }) {
  if (reply.corrections.length === 0 && reply.matchMode !== 'any') return null;
  return (
    <Notice tone="info" className="mb-4">
      {reply.corrections.length > 0 ? (
        <p>
          Searched for{' '}
          {reply.corrections.map((c, i) => (
            <span key={c.from}>
              {i > 0 ? ', ' : null}
              <strong className="text-ink">{c.to}</strong> instead of <span className="line-through">{c.from}</span>
            </span>
          ))}
          .
        </p>
      ) : null}
      {reply.matchMode === 'any' ? <p>No result has every word you typed; these have some of them.</p> : null}
    </Notice>
  );
}

function Pager({ state, reply, onChange }: { state: SearchState; reply: SearchReply; onChange: (s: SearchState) => void }) {
  const page = state.cursors.length + 1;
  if (page === 1 && !reply.nextCursor) return null;
  return (
    <nav aria-label="Result pages" className="mt-6 flex items-center justify-between gap-3 border-t border-rule pt-4">
      <Button variant="secondary" size="sm" disabled={page === 1} onClick={() => onChange(withPreviousPage(state))} icon={<ChevronLeft aria-hidden="true" className="size-4" />}>
        Previous
      </Button>
      <span className="text-sm text-ink-muted" aria-current="page">
        Page {page}
      </span>
      <Button
        variant="secondary"
        size="sm"
        disabled={!reply.nextCursor}
        onClick={() => reply.nextCursor && onChange(withNextPage(state, reply.nextCursor))}
      >
        Next
        <ChevronRight aria-hidden="true" className="size-4" />
      </Button>
    </nav>
  );
}

/**
 * The search page: one query (from the header box), facets with counts, sort and pages, all kept in the URL.
 * The previous reply stays on screen, dimmed, while a changed filter loads.
 */
export function SearchPage() {
  const [state, setState] = useSearchState();
  const query = useSearch(state);
  const [filtersOpen, setFiltersOpen] = useState(false);
  const filtersId = useId();
  const reply = query.data;
  const nFilters = activeFilterCount(state);
  const keepScroll = (next: SearchState) => setState(next, { keepScroll: true });

  const title = state.q ? `Results for “${state.q}”` : 'Search parts and listings';
  return (
    <ContentLayout
      title={title}
      eyebrow="Search"
      description={state.q ? undefined : 'Type a part number in any shape, a stock number or a name in the box above, or narrow everything with the filters.'}
    >
      <div className="grid gap-6 lg:grid-cols-[15rem_minmax(0,1fr)] lg:gap-8">
        <aside aria-label="Filters" className="min-w-0">
          <Button
            variant="secondary"
            className="w-full lg:hidden"
            aria-expanded={filtersOpen}
            aria-controls={filtersId}
            onClick={() => setFiltersOpen((o) => !o)}
            icon={<SlidersHorizontal aria-hidden="true" className="size-4" />}
          >
            {filtersOpen ? 'Hide filters' : 'Show filters'}
            {nFilters > 0 ? <span className="rounded-full bg-patina-600 px-1.5 text-xs text-white">{nFilters}</span> : null}
          </Button>
          <div id={filtersId} className={cn(filtersOpen ? 'mt-4 block' : 'hidden', 'lg:mt-0 lg:block')}>
            <FacetSidebar state={state} facets={reply?.facets} estimated={reply?.facetsAreEstimates ?? false} onChange={keepScroll} />
          </div>
        </aside>

        <section aria-labelledby="results-heading" className="min-w-0">
          <h2 id="results-heading" className="sr-only">
            Results
          </h2>
          <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
            <p role="status" className="text-sm font-medium text-ink-soft">
              {reply ? resultSummary(reply) : query.isPending ? 'Searching…' : ''}
            </p>
            <SortSelect state={state} onChange={keepScroll} />
          </div>
          <div className="mb-4 empty:hidden">
            <ActiveFilters state={state} facets={reply?.facets} onChange={keepScroll} />
          </div>

          {query.isError && !reply ? (
            <SearchProblem error={query.error} onRetry={() => void query.refetch()} />
          ) : !reply ? (
            <ResultsSkeleton />
          ) : (
            <div aria-busy={query.isPlaceholderData || undefined} className={cn('transition-opacity', query.isPlaceholderData && 'opacity-60')}>
              {query.isError ? (
                <div className="mb-4">
                  <SearchProblem error={query.error} onRetry={() => void query.refetch()} />
                </div>
              ) : null}
              <QueryNotes reply={reply} />
              {reply.hits.length === 0 ? (
                <SearchEmpty q={state.q} didYouMean={reply.didYouMean} filtersActive={nFilters > 0} onClearFilters={() => keepScroll(withoutFilters(state))} />
              ) : (
                <>
                  <ol aria-label="Results" className="space-y-3">
                    {reply.hits.map((hit) => (
                      <li key={`${hit.type}-${hit.id}`}>
                        <ResultCard hit={hit} />
                      </li>
                    ))}
                  </ol>
                  <Pager state={state} reply={reply} onChange={setState} />
                </>
              )}
            </div>
          )}
        </section>
      </div>
    </ContentLayout>
  );
}
