import { X } from 'lucide-react';
import type { FacetName, SearchReply } from '@shared/schemas/search';
import { facetTitles } from '../utils/facet-titles';
import { formatCents } from '../utils/format-money';
import {
  flagFacets,
  multiFacets,
  toggleFacetValue,
  withoutFilters,
  withPriceRange,
  withType,
  type SearchState,
} from '../utils/search-state';

type Chip = { key: string; label: string; remove: (s: SearchState) => SearchState };

function labelOf(facets: SearchReply['facets'] | undefined, facet: FacetName, value: string): string {
  return facets?.[facet]?.find((v) => v.value === value)?.label ?? value;
}

function priceLabel(min: number | null, max: number | null): string {
  if (min !== null && max !== null) return `${formatCents(min)} to ${formatCents(max)}`;
  if (min !== null) return `${formatCents(min)} and over`;
  return `Up to ${formatCents(max ?? 0)}`;
}

export function filterChips(state: SearchState, facets: SearchReply['facets'] | undefined): Chip[] {
  const chips: Chip[] = [];
  if (state.type) chips.push({ key: 'type', label: labelOf(facets, 'type', state.type), remove: (s) => withType(s, null) });
  for (const facet of multiFacets) {
    for (const value of state.filters[facet]) {
      chips.push({ key: `${facet}:${value}`, label: `${facetTitles[facet]}: ${labelOf(facets, facet, value)}`, remove: (s) => toggleFacetValue(s, facet, value) });
    }
  }
  for (const flag of flagFacets) {
    if (state.flags[flag]) chips.push({ key: flag, label: labelOf(facets, flag, 'true'), remove: (s) => toggleFacetValue(s, flag, 'true') });
  }
  if (state.priceMin !== null || state.priceMax !== null) {
    chips.push({ key: 'priceRange', label: priceLabel(state.priceMin, state.priceMax), remove: (s) => withPriceRange(s, null, null) });
  }
  return chips;
}

/** The filters in force, each removable; "Clear all" when there are two or more. */
export function ActiveFilters({ state, facets, onChange }: { state: SearchState; facets: SearchReply['facets'] | undefined; onChange: (next: SearchState) => void }) {
  const chips = filterChips(state, facets);
  if (chips.length === 0) return null;
  return (
    <ul aria-label="Active filters" className="flex flex-wrap items-center gap-2">
      {chips.map((chip) => (
        <li key={chip.key}>
          <button
            type="button"
            onClick={() => onChange(chip.remove(state))}
            aria-label={`Remove filter ${chip.label}`}
            className="inline-flex h-7 items-center gap-1 rounded-tag border border-patina-300 bg-patina-50 pr-1.5 pl-2.5 text-xs font-medium text-patina-800 hover:bg-patina-100"
          >
            {chip.label}
            <X aria-hidden="true" className="size-3.5" />
          </button>
        </li>
      ))}
      {chips.length > 1 ? (
        <li>
          <button type="button" onClick={() => onChange(withoutFilters(state))} className="h-7 px-1.5 text-xs font-medium text-ink-soft underline underline-offset-3 hover:text-ink">
            Clear all
          </button>
        </li>
      ) : null}
    </ul>
  );
}
