import { useSearchParams } from 'react-router-dom';
import { PartListingsRedirect } from '@/features/search/components/part-listings-redirect';
import { SearchPage } from '@/features/search/components/search-page';

export function SearchRoute() {
  const [params] = useSearchParams();
  const partId = params.get('part');
  // The part page links here with ?part=<id>: that becomes a search for the part's number.
  if (partId && !params.get('q')) return <PartListingsRedirect key={partId} partId={partId} />;
  return <SearchPage />;
}
