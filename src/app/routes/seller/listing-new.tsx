import { useNavigate } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { paths } from '@/config/paths';
import { useCreateListing } from '@/features/listings/api/create-listing';
import { ListingForm } from '@/features/listings/components/listing-form';
import { useShippingProfiles } from '@/features/seller/api/get-shipping-profiles';

export function SellerListingNewRoute() {
  const navigate = useNavigate();
  const profiles = useShippingProfiles();
  const create = useCreateListing();
  return (
    <ContentLayout title="New listing" eyebrow="Seller desk · step 1 of 2" description="The details first. Photos come next, then you submit it for review.">
      {profiles.isPending ? (
        <PageSkeleton label="Loading the form" />
      ) : (
        <ListingForm
          mode="create"
          shippingProfiles={profiles.data ?? []}
          submitLabel="Save draft and add photos"
          isPending={create.isPending}
          onSubmit={async (input) => {
            const listing = await create.mutateAsync(input);
            navigate(paths.sellerListings.edit.getHref(listing.id));
          }}
        />
      )}
    </ContentLayout>
  );
}
