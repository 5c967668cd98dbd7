import { useId, useState, type FormEvent, type ReactNode } from 'react';
import type { FacetValue, SearchReply } from '@shared/schemas/search';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import { facetTitles } from '../utils/facet-titles';
import { centsToDollarText, parseDollars } from '../utils/format-money';
import {
  flagFacets,
  isFacetValueActive,
  toggleFacetValue,
  withPriceRange,
  withType,
  type MultiFacet,
  type SearchState,
} from '../utils/search-state';

// Sidebar order: what the restorer's vehicle needs first, then what they want of the item, then the deal.
const groupOrder: MultiFacet[] = ['vehicle', 'system', 'assembly', 'condition', 'originality', 'price', 'seller', 'shipsTo'];
const SHOWN_BEFORE_MORE = 8;

const countFormat = new Intl.NumberFormat('en-US');

type Props = {
  state: SearchState;
  facets: SearchReply['facets'] | undefined;
  estimated: boolean;
  onChange: (next: SearchState) => void;
};

/** A facet's values, plus any ticked value the reply left out (so it can still be unticked). */
function valuesWithActive(state: SearchState, facet: MultiFacet, values: FacetValue[]): FacetValue[] {
  const missing = state.filters[facet].filter((v) => !values.some((x) => x.value === v)).map((value) => ({ value, label: value, count: 0 }));
  return [...values, ...missing];
}

function Count({ n, estimated }: { n: number; estimated: boolean }) {
  return (
    <span className="ml-auto pt-px pl-2 text-xs text-ink-muted tabular-nums">
      {estimated ? '≈' : null}
      {countFormat.format(n)}
    </span>
  );
}

type GroupProps = { facet: MultiFacet; values: FacetValue[]; children?: ReactNode } & Omit<Props, 'facets'>;

function FacetGroup({ facet, values, state, estimated, onChange, children }: GroupProps) {
  const [showAll, setShowAll] = useState(false);
  const all = valuesWithActive(state, facet, values);
  if (all.length === 0 && !children) return null;
  // Ticked values always stay in view, even past the fold.
  const shown = showAll ? all : all.filter((v, i) => i < SHOWN_BEFORE_MORE || isFacetValueActive(state, facet, v.value));
  return (
    <fieldset className="min-w-0 border-t border-rule pt-3">
      <legend className="float-left mb-2 w-full text-label text-drab-700 uppercase">{facetTitles[facet]}</legend>
      <ul className="clear-both space-y-0.5">
        {shown.map((v) => {
          const checked = isFacetValueActive(state, facet, v.value);
          return (
            <li key={v.value}>
              <label
                className={cn(
                  'flex cursor-pointer items-start gap-2 rounded-tag px-1.5 py-1 text-sm hover:bg-paper-sunk',
                  checked ? 'font-semibold text-ink' : 'text-ink-soft',
                  v.count === 0 && !checked && 'opacity-60',
                )}
              >
                <input
                  type="checkbox"
                  checked={checked}
                  onChange={() => onChange(toggleFacetValue(state, facet, v.value))}
                  className="mt-0.5 size-4 shrink-0 accent-patina-600"
                />
                <span className="min-w-0 break-words">{v.label}</span>
                <Count n={v.count} estimated={estimated} />
              </label>
            </li>
          );
        })}
      </ul>
      {all.length > SHOWN_BEFORE_MORE ? (
        <button type="button" className="mt-1 px-1.5 text-sm font-medium text-patina-700 hover:underline" onClick={() => setShowAll((s) => !s)}>
          {showAll ? 'Show fewer' : `Show all ${all.length}`}
        </button>
      ) : null}
      {children}
    </fieldset>
  );
}

function TypeGroup({ facets, state, estimated, onChange }: Props) {
  const name = useId();
  const values = facets?.type ?? [];
  const options: Array<{ value: 'part' | 'listing' | null; label: string; count: number | null }> = [
    { value: null, label: 'Everything', count: null },
    ...(['listing', 'part'] as const).map((t) => {
      const v = values.find((x) => x.value === t);
      return { value: t, label: v?.label ?? (t === 'part' ? 'Catalog parts' : 'Listings'), count: v?.count ?? 0 };
    }),
  ];
  return (
    <fieldset className="min-w-0">
      <legend className="float-left mb-2 w-full text-label text-drab-700 uppercase">{facetTitles.type}</legend>
      <ul className="clear-both space-y-0.5">
        {options.map((o) => (
          <li key={o.value ?? 'all'}>
            <label className={cn('flex cursor-pointer items-center gap-2 rounded-tag px-1.5 py-1 text-sm hover:bg-paper-sunk', state.type === o.value ? 'font-semibold text-ink' : 'text-ink-soft')}>
              <input
                type="radio"
                name={name}
                checked={state.type === o.value}
                onChange={() => onChange(withType(state, o.value))}
                className="size-4 shrink-0 accent-patina-600"
              />
              <span>{o.label}</span>
              {o.count !== null ? <Count n={o.count} estimated={estimated} /> : null}
            </label>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}

/** Yes-only switches (in stock, with photos, pickup at shows): the reply's `true` value and its count. */
function FlagGroup({ facets, state, estimated, onChange }: Props) {
  const flags = flagFacets
    .map((facet) => ({ facet, v: facets?.[facet]?.find((x) => x.value === 'true') }))
    .filter(({ facet, v }) => v !== undefined || state.flags[facet]);
  if (flags.length === 0) return null;
  return (
    <fieldset className="min-w-0 border-t border-rule pt-3">
      <legend className="float-left mb-2 w-full text-label text-drab-700 uppercase">Availability</legend>
      <ul className="clear-both space-y-0.5">
        {flags.map(({ facet, v }) => (
          <li key={facet}>
            <label className={cn('flex cursor-pointer items-center gap-2 rounded-tag px-1.5 py-1 text-sm hover:bg-paper-sunk', state.flags[facet] ? 'font-semibold text-ink' : 'text-ink-soft')}>
              <input
                type="checkbox"
                checked={state.flags[facet]}
                onChange={() => onChange(toggleFacetValue(state, facet, 'true'))}
                className="size-4 shrink-0 accent-patina-600"
              />
              <span>{v?.label ?? facetTitles[facet]}</span>
              <Count n={v?.count ?? 0} estimated={estimated} />
            </label>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}

function PriceRange({ state, onChange }: Pick<Props, 'state' | 'onChange'>) {
  const id = useId();
  const [min, setMin] = useState(centsToDollarText(state.priceMin));
  const [max, setMax] = useState(centsToDollarText(state.priceMax));
  const [error, setError] = useState<string | null>(null);
  // Follow the URL when it changes under us (Back, Clear all).
  const [seen, setSeen] = useState([state.priceMin, state.priceMax]);
  if (seen[0] !== state.priceMin || seen[1] !== state.priceMax) {
    setSeen([state.priceMin, state.priceMax]);
    setMin(centsToDollarText(state.priceMin));
    setMax(centsToDollarText(state.priceMax));
  }

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const lo = min.trim() === '' ? null : parseDollars(min);
    const hi = max.trim() === '' ? null : parseDollars(max);
    if ((min.trim() !== '' && lo === null) || (max.trim() !== '' && hi === null)) return setError('Give prices in dollars, like 25 or 12.50.');
    if (lo !== null && hi !== null && lo > hi) return setError('The lowest price is above the highest.');
    setError(null);
    onChange(withPriceRange(state, lo, hi));
  };

  return (
    <form onSubmit={submit} aria-label="Price range" className="mt-2 flex flex-wrap items-end gap-2 px-1.5" noValidate>
      <label className="w-20 text-xs text-ink-muted">
        Min $
        <input
          id={`${id}-min`}
          inputMode="decimal"
          value={min}
          onChange={(e) => setMin(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="mt-0.5 h-8 w-full rounded-tag border border-rule-strong bg-paper-raised px-2 text-sm text-ink"
        />
      </label>
      <label className="w-20 text-xs text-ink-muted">
        Max $
        <input
          id={`${id}-max`}
          inputMode="decimal"
          value={max}
          onChange={(e) => setMax(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="mt-0.5 h-8 w-full rounded-tag border border-rule-strong bg-paper-raised px-2 text-sm text-ink"
        />
      </label>
      <Button type="submit" variant="secondary" size="sm">
        Apply
      </Button>
      <p id={`${id}-error`} aria-live="polite" className="w-full text-xs font-medium text-danger empty:hidden">
        {error}
      </p>
    </form>
  );
}

/** Facets with counts; every count already follows the other active filters (the server computes them so). */
export function FacetSidebar({ state, facets, estimated, onChange }: Props) {
  return (
    <div className="space-y-4">
      <TypeGroup state={state} facets={facets} estimated={estimated} onChange={onChange} />
      {groupOrder.map((facet) => (
        <FacetGroup key={facet} facet={facet} values={facets?.[facet] ?? []} state={state} estimated={estimated} onChange={onChange}>
          {/* Catalog parts have no price, so the range only makes sense when listings can show. */}
          {facet === 'price' && state.type !== 'part' ? <PriceRange state={state} onChange={onChange} /> : null}
        </FacetGroup>
      ))}
      <FlagGroup state={state} facets={facets} estimated={estimated} onChange={onChange} />
      {estimated ? <p className="text-xs text-ink-muted">Counts marked ≈ are estimated from a sample of a very large result set.</p> : null}
    </div>
  );
}
