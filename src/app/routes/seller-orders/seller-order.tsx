import { Link, useParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { useSellerOrder } from '@/features/seller-orders/api/get-seller-order';
import { SellerOrderDetail } from '@/features/seller-orders/components/seller-order-detail';
import { orderRef } from '@/features/seller-orders/utils/seller-states';
import { isApiError } from '@/lib/api-client';

export function SellerOrderRoute() {
  const { id = '' } = useParams();
  const order = useSellerOrder(id);
  const back = (
    <Link to={paths.sellerOrders.list.getHref()} className={textLinkClasses}>
      All orders
    </Link>
  );
  if (order.isPending) return <PageSkeleton label="Loading the order" />;
  if (order.isError) {
    const missing = isApiError(order.error) && (order.error.status === 404 || order.error.status === 400);
    return (
      <ContentLayout title={missing ? 'Order not found' : 'Order unavailable'} eyebrow="Seller desk" actions={back}>
        <Notice tone={missing ? 'info' : 'danger'} role="alert" title={missing ? 'No paid order of your shop has this address.' : order.error.message} />
      </ContentLayout>
    );
  }
  return (
    <ContentLayout title={`Order ${orderRef(order.data.orderId)}`} eyebrow="Seller desk · order" description={`From ${order.data.buyer.name}`} actions={back}>
      <SellerOrderDetail subOrder={order.data} />
    </ContentLayout>
  );
}
