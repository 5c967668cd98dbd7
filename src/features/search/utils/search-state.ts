import { priceBands, searchConditions, searchHitTypes, searchOriginalities, searchSorts, type FacetName } from '@shared/schemas/search';

/**
 * The search page's state, read from and written to the URL's search params, so a link shares the exact view
 * and the back button steps through earlier ones. The URL uses the API's own parameter names (cents for
 * prices) plus `after`, the stack of cursors of the pages walked through: its last entry is the page shown.
 */

export type SearchSort = (typeof searchSorts)[number];
export type HitType = (typeof searchHitTypes)[number];

/** Facets a restorer can tick several values of (`?condition=nos&condition=nors`). */
export const multiFacets = ['vehicle', 'system', 'assembly', 'condition', 'originality', 'seller', 'price', 'shipsTo'] as const;
export type MultiFacet = (typeof multiFacets)[number];

/** Yes-or-absent facets: ticked means `=true`; the API's `false` is never needed from the sidebar. */
export const flagFacets = ['inStock', 'hasPhotos', 'pickup'] as const;
export type FlagFacet = (typeof flagFacets)[number];

export type SearchState = {
  q: string;
  type: HitType | null;
  filters: Record<MultiFacet, string[]>;
  flags: Record<FlagFacet, boolean>;
  priceMin: number | null;
  priceMax: number | null;
  sort: SearchSort;
  /** Cursors of the pages after the first, oldest first; empty on page one. */
  cursors: string[];
};

const CURSOR_PARAM = 'after';
const MAX_VALUES = 20;
const MAX_PAGES = 50;

// Values the server would refuse are dropped when read, so a hand-edited link still opens a page.
const allowed: Partial<Record<MultiFacet, readonly string[]>> = {
  condition: searchConditions,
  originality: searchOriginalities,
  price: priceBands,
};

export function isMultiFacet(name: string): name is MultiFacet {
  return (multiFacets as readonly string[]).includes(name);
}

export function isFlagFacet(name: string): name is FlagFacet {
  return (flagFacets as readonly string[]).includes(name);
}

export function emptySearchState(q = ''): SearchState {
  return {
    q,
    type: null,
    filters: { vehicle: [], system: [], assembly: [], condition: [], originality: [], seller: [], price: [], shipsTo: [] },
    flags: { inStock: false, hasPhotos: false, pickup: false },
    priceMin: null,
    priceMax: null,
    sort: 'relevance',
    cursors: [],
  };
}

function readCents(value: string | null): number | null {
  if (value === null || !/^\d{1,9}$/.test(value)) return null;
  return Number(value);
}

export function readSearchState(params: URLSearchParams): SearchState {
  const state = emptySearchState((params.get('q') ?? '').trim());
  const type = params.get('type');
  state.type = (searchHitTypes as readonly string[]).includes(type ?? '') ? (type as HitType) : null;
  for (const facet of multiFacets) {
    const ok = allowed[facet];
    const values = params.getAll(facet).filter((v) => v !== '' && (!ok || ok.includes(v)));
    state.filters[facet] = [...new Set(values)].slice(0, MAX_VALUES);
  }
  for (const flag of flagFacets) state.flags[flag] = params.get(flag) === 'true';
  state.priceMin = readCents(params.get('priceMin'));
  state.priceMax = readCents(params.get('priceMax'));
  if (state.priceMin !== null && state.priceMax !== null && state.priceMin > state.priceMax) {
    [state.priceMin, state.priceMax] = [state.priceMax, state.priceMin];
  }
  const sort = params.get('sort');
  state.sort = (searchSorts as readonly string[]).includes(sort ?? '') ? (sort as SearchSort) : 'relevance';
  // Catalog parts have no price; the server refuses a price sort on them.
  if (state.type === 'part' && (state.sort === 'price_asc' || state.sort === 'price_desc')) state.sort = 'relevance';
  state.cursors = params.getAll(CURSOR_PARAM).filter((c) => c !== '').slice(0, MAX_PAGES);
  return state;
}

/** The filters of a state, in a fixed order, as API parameters (no cursor). */
function filterParams(state: SearchState): URLSearchParams {
  const params = new URLSearchParams();
  if (state.q) params.set('q', state.q);
  if (state.type) params.set('type', state.type);
  for (const facet of multiFacets) for (const value of state.filters[facet]) params.append(facet, value);
  for (const flag of flagFacets) if (state.flags[flag]) params.set(flag, 'true');
  if (state.priceMin !== null) params.set('priceMin', String(state.priceMin));
  if (state.priceMax !== null) params.set('priceMax', String(state.priceMax));
  if (state.sort !== 'relevance') params.set('sort', state.sort);
  return params;
}

/** The page's URL params: canonical order, defaults left out. */
export function writeSearchState(state: SearchState): URLSearchParams {
  const params = filterParams(state);
  for (const cursor of state.cursors) params.append(CURSOR_PARAM, cursor);
  return params;
}

/** What GET /api/search is asked: the filters and the cursor of the page shown. */
export function toApiParams(state: SearchState): URLSearchParams {
  const params = filterParams(state);
  const cursor = state.cursors.at(-1);
  if (cursor) params.set('cursor', cursor);
  return params;
}

/** Any change of what is searched starts again on page one: an old cursor belongs to the old result set. */
function firstPage(state: SearchState): SearchState {
  return { ...state, cursors: [] };
}

export function toggleFacetValue(state: SearchState, facet: FacetName, value: string): SearchState {
  if (facet === 'type') return withType(state, state.type === value ? null : (value as HitType));
  if (isFlagFacet(facet)) return firstPage({ ...state, flags: { ...state.flags, [facet]: !state.flags[facet] } });
  const current = state.filters[facet];
  const next = current.includes(value) ? current.filter((v) => v !== value) : [...current, value];
  return firstPage({ ...state, filters: { ...state.filters, [facet]: next } });
}

export function isFacetValueActive(state: SearchState, facet: FacetName, value: string): boolean {
  if (facet === 'type') return state.type === value;
  if (isFlagFacet(facet)) return state.flags[facet] && value === 'true';
  return state.filters[facet].includes(value);
}

export function withType(state: SearchState, type: HitType | null): SearchState {
  const sort = type === 'part' && state.sort.startsWith('price') ? 'relevance' : state.sort;
  return firstPage({ ...state, type, sort });
}

export function withSort(state: SearchState, sort: SearchSort): SearchState {
  return firstPage({ ...state, sort });
}

export function withPriceRange(state: SearchState, priceMin: number | null, priceMax: number | null): SearchState {
  return firstPage({ ...state, priceMin, priceMax });
}

export function withNextPage(state: SearchState, cursor: string): SearchState {
  return { ...state, cursors: [...state.cursors, cursor] };
}

export function withPreviousPage(state: SearchState): SearchState {
  return { ...state, cursors: state.cursors.slice(0, -1) };
}

/** Drops every filter and the page, keeping the words and the sort. */
export function withoutFilters(state: SearchState): SearchState {
  return { ...emptySearchState(state.q), sort: state.sort };
}

export function activeFilterCount(state: SearchState): number {
  let n = state.type ? 1 : 0;
  for (const facet of multiFacets) n += state.filters[facet].length;
  for (const flag of flagFacets) if (state.flags[flag]) n += 1;
  if (state.priceMin !== null || state.priceMax !== null) n += 1;
  return n;
}
