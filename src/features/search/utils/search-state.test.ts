import { describe, expect, it } from 'vitest';
import {
  activeFilterCount,
  emptySearchState,
  readSearchState,
  toApiParams,
  toggleFacetValue,
  withNextPage,
  withoutFilters,
  withPreviousPage,
  withSort,
  withType,
  writeSearchState,
} from './search-state';

describe('search state in the URL', () => {
  it('when a full state is written and read back, then it is the same state', () => {
    const state = {
      ...emptySearchState('FV-20417'),
      type: 'listing' as const,
      filters: { ...emptySearchState().filters, condition: ['nos', 'used_original'], vehicle: ['fv-4'], shipsTo: ['CA'] },
      flags: { inStock: true, hasPhotos: false, pickup: true },
      priceMin: 1000,
      priceMax: 25050,
      sort: 'price_asc' as const,
      cursors: ['abc.def', 'ghi.jkl'],
    };
    const params = writeSearchState(state);
    expect(readSearchState(new URLSearchParams(params.toString()))).toEqual(state);
    expect(params.toString()).toBe(
      'q=FV-20417&type=listing&vehicle=fv-4&condition=nos&condition=used_original&shipsTo=CA&inStock=true&pickup=true&priceMin=1000&priceMax=25050&sort=price_asc&after=abc.def&after=ghi.jkl',
    );
  });

  it('when a link carries unknown values, a reversed price range or a price sort on parts, then they are dropped or mended', () => {
    const state = readSearchState(new URLSearchParams('q=+bolt+&condition=mint&condition=nos&condition=nos&type=part&sort=price_desc&priceMin=900&priceMax=100&hasPhotos=yes&other=1'));
    expect(state.q).toBe('bolt');
    expect(state.filters.condition).toEqual(['nos']);
    expect(state.sort).toBe('relevance');
    expect([state.priceMin, state.priceMax]).toEqual([100, 900]);
    expect(state.flags.hasPhotos).toBe(false);
    expect(writeSearchState(state).toString()).toBe('q=bolt&type=part&condition=nos&priceMin=100&priceMax=900');
  });

  it('when the page is the second one, then the API gets its cursor and the URL keeps the stack', () => {
    const state = withNextPage(withNextPage(emptySearchState('clamp'), 'p2.x'), 'p3.y');
    expect(toApiParams(state).toString()).toBe('q=clamp&cursor=p3.y');
    expect(toApiParams(withPreviousPage(state)).toString()).toBe('q=clamp&cursor=p2.x');
    expect(toApiParams(withPreviousPage(withPreviousPage(state))).toString()).toBe('q=clamp');
  });
});

describe('facet toggling', () => {
  it('when condition values are ticked and one unticked, then the API query repeats the rest and starts on page one', () => {
    let state = withNextPage(emptySearchState('FV-20417'), 'p2.x');
    state = toggleFacetValue(state, 'condition', 'nos');
    expect(state.cursors).toEqual([]);
    state = toggleFacetValue(state, 'condition', 'used_original');
    expect(toApiParams(state).getAll('condition')).toEqual(['nos', 'used_original']);
    state = toggleFacetValue(state, 'condition', 'nos');
    expect(toApiParams(state).toString()).toBe('q=FV-20417&condition=used_original');
  });

  it('when a yes-only facet or the type is toggled, then it is set and unset as one value', () => {
    let state = toggleFacetValue(emptySearchState(), 'inStock', 'true');
    expect(toApiParams(state).toString()).toBe('inStock=true');
    state = toggleFacetValue(state, 'inStock', 'true');
    expect(toApiParams(state).toString()).toBe('');
    state = toggleFacetValue(withSort(state, 'price_desc'), 'type', 'part');
    // Parts have no price: the price sort gives way.
    expect(toApiParams(state).toString()).toBe('type=part');
    expect(toApiParams(withType(state, null)).toString()).toBe('');
  });

  it('when filters are cleared, then the words and sort stay and nothing else', () => {
    let state = withSort(emptySearchState('hose'), 'newest');
    state = toggleFacetValue(toggleFacetValue(state, 'system', 'brakes'), 'hasPhotos', 'true');
    expect(activeFilterCount(state)).toBe(2);
    expect(writeSearchState(withoutFilters(state)).toString()).toBe('q=hose&sort=newest');
  });
});
