import { useSearchParams } from 'react-router-dom';
import type { Destination } from '@shared/schemas/orders';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { CartPage } from '@/features/cart/components/cart-page';
import { destinationFromParam, destinationToParam, SHIP_PARAM } from '@/features/cart/utils/destination';

export function CartRoute() {
  const me = useMe();
  const [params, setParams] = useSearchParams();
  const destination = destinationFromParam(params.get(SHIP_PARAM));
  const onDestinationChange = (d: Destination) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        next.set(SHIP_PARAM, destinationToParam(d));
        return next;
      },
      { replace: true },
    );
  const here = `${paths.cart.getHref()}?${SHIP_PARAM}=${destinationToParam(destination)}`;

  return (
    <ContentLayout
      title="Cart"
      eyebrow="Buying"
      description="Everything you mean to buy, grouped by seller. One payment covers every seller; each ships their own part."
    >
      {me.isPending ? (
        <PageSkeleton label="Loading your cart" />
      ) : (
        <CartPage userId={me.data?.id ?? null} destination={destination} onDestinationChange={onDestinationChange} signInHref={paths.auth.signIn.getHref(here)} />
      )}
    </ContentLayout>
  );
}
