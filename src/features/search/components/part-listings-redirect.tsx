import { Navigate } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { usePartSearchTerm } from '../api/get-part-search-term';
import { emptySearchState, writeSearchState } from '../utils/search-state';

/**
 * `/search?part=<id>` (the part page's "live listings" link): searches the part's headline number, listings
 * only, so the listings of every interchangeable number show too, each with its fit note. Replaces the URL,
 * so Back returns to the part page.
 */
export function PartListingsRedirect({ partId }: { partId: string }) {
  const term = usePartSearchTerm(partId);
  const data = term.data;
  if (data) {
    const q = data.number ?? data.name;
    const params = writeSearchState({ ...emptySearchState(q), type: 'listing' });
    return <Navigate replace to={`${paths.search.path}?${params.toString()}`} />;
  }
  if (term.isError) {
    return (
      <ContentLayout title="Search" eyebrow="Search">
        <Notice tone="warn" role="alert" title="We could not find that part">
          <p>Type its number in the search box above instead.</p>
        </Notice>
      </ContentLayout>
    );
  }
  return <PageSkeleton label="Finding the part's listings" />;
}
