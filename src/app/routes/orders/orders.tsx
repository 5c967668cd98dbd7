import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { useOrders } from '@/features/orders/api/get-orders';
import { OrdersList } from '@/features/orders/components/orders-list';

export function OrdersRoute() {
  const orders = useOrders();
  return (
    <ContentLayout title="Orders" eyebrow="Buying" description="Every checkout you paid, with each seller's part and where it stands.">
      {orders.isPending ? (
        <PageSkeleton label="Loading your orders" />
      ) : orders.isError ? (
        <Notice tone="danger" role="alert" title="Your orders could not be loaded">
          {orders.error.message}
        </Notice>
      ) : (
        <OrdersList orders={orders.data} />
      )}
    </ContentLayout>
  );
}
