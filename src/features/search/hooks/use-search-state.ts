import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { readSearchState, writeSearchState, type SearchState } from '../utils/search-state';

export type UpdateSearchState = (next: SearchState, options?: { keepScroll?: boolean }) => void;

/**
 * The search page's state, kept in the URL. Every change is a new history entry, so Back returns to the
 * previous filters or page.
 */
export function useSearchState(): [SearchState, UpdateSearchState] {
  const [params, setParams] = useSearchParams();
  const key = params.toString();
  // Keyed by the params' text, so an unchanged URL keeps the same state object.
  const state = useMemo(() => readSearchState(new URLSearchParams(key)), [key]);
  const update = useCallback<UpdateSearchState>(
    // Ticking a facet keeps the reader where they are; a new page scrolls back to the top.
    (next, options = {}) => setParams(writeSearchState(next), { preventScrollReset: options.keepScroll ?? false }),
    [setParams],
  );
  return [state, update];
}
