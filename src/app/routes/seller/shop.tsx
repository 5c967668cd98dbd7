import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useShippingProfiles } from '@/features/seller/api/get-shipping-profiles';
import { useShop } from '@/features/seller/api/get-shop';
import { ShippingProfilesEditor } from '@/features/seller/components/shipping-profiles-editor';
import { ShopForm } from '@/features/seller/components/shop-form';

export function SellerShopRoute() {
  const shop = useShop();
  const profiles = useShippingProfiles();
  return (
    <ContentLayout
      title="Shop and shipping"
      eyebrow="Seller desk"
      description="What buyers see beside your listings, and the rules checkout charges shipping by."
      actions={
        <Link to={paths.seller.getHref()} className={buttonClasses('ghost', 'sm')}>
          Back to the desk
        </Link>
      }
    >
      {shop.isPending || profiles.isPending ? (
        <PageSkeleton label="Loading your shop" />
      ) : shop.isError || profiles.isError ? (
        <Notice tone="danger" role="alert" title="We could not load your shop">
          {(shop.error ?? profiles.error)?.message}
        </Notice>
      ) : (
        <div className="grid gap-6 lg:grid-cols-2">
          <Card>
            <h2 className="mb-4 text-xl font-bold text-ink">Shop profile</h2>
            <ShopForm shop={shop.data} />
          </Card>
          <Card>
            <h2 className="mb-4 text-xl font-bold text-ink">Shipping profiles</h2>
            <ShippingProfilesEditor profiles={profiles.data} />
          </Card>
        </div>
      )}
    </ContentLayout>
  );
}
