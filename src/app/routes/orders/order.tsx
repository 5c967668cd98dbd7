import { Link, useParams, useSearchParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { useOrder } from '@/features/orders/api/get-order';
import { OrderDetail } from '@/features/orders/components/order-detail';
import { orderRef } from '@/features/orders/utils/order-ref';
import { isApiError } from '@/lib/api-client';

export function OrderRoute() {
  const { id = '' } = useParams();
  const [params] = useSearchParams();
  // The payment page sends the buyer back with ?paid=1, usually before its webhook has reached us.
  const awaitingPayment = params.get('paid') === '1';
  const order = useOrder(id, { awaitingPayment });

  if (order.isPending) return <PageSkeleton label="Loading the order" />;
  if (order.isError) {
    const missing = isApiError(order.error) && (order.error.status === 404 || order.error.status === 400);
    return (
      <ContentLayout title={missing ? 'Order not found' : 'Order unavailable'} eyebrow="Order">
        <Notice tone={missing ? 'info' : 'danger'} role="alert" title={missing ? 'There is no order of yours with this address.' : order.error.message}>
          <Link to={paths.orders.getHref()} className={textLinkClasses}>
            All your orders
          </Link>
        </Notice>
      </ContentLayout>
    );
  }
  return (
    <ContentLayout
      title={`Order ${orderRef(order.data.id)}`}
      eyebrow="Order"
      actions={
        <Link to={paths.orders.getHref()} className={textLinkClasses}>
          All orders
        </Link>
      }
    >
      <OrderDetail order={order.data} awaitingPayment={awaitingPayment} />
    </ContentLayout>
  );
}
