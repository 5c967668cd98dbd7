import { useParams } from 'react-router-dom';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { AddToCartButton } from '@/features/cart/components/add-to-cart-button';
import { useListing } from '@/features/listings/api/get-listing';
import { ListingView } from '@/features/listings/components/listing-view';
import { isApiError } from '@/lib/api-client';

export function ListingRoute() {
  const { id = '' } = useParams();
  const page = useListing(id);
  if (page.isPending) return <PageSkeleton label="Loading the listing" />;
  if (page.isError) {
    const missing = isApiError(page.error) && (page.error.status === 404 || page.error.status === 400);
    return (
      <div className="mx-auto max-w-lg">
        <title>{`${missing ? 'Listing not found' : 'Listing unavailable'} · Drabyard`}</title>
        <h1 className="mb-4 text-2xl font-bold text-ink">{missing ? 'Listing not found' : 'Listing unavailable'}</h1>
        <Notice tone={missing ? 'info' : 'danger'} role="alert" title={missing ? 'It may have been withdrawn or sold out.' : page.error.message} />
      </div>
    );
  }
  return (
    <>
      <title>{`${page.data.listing.title} · Drabyard`}</title>
      <ListingView
        page={page.data}
        buySlot={<AddToCartButton listingId={page.data.listing.id} available={page.data.listing.state === 'approved' ? page.data.listing.quantity : 0} />}
      />
    </>
  );
}
