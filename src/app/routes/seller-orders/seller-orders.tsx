import { Landmark } from 'lucide-react';
import { Link, useSearchParams } from 'react-router-dom';
import { subOrderStates, type SellerSubOrderDto } from '@shared/schemas/orders';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useSellerOrders } from '@/features/seller-orders/api/get-seller-orders';
import { SellerOrdersTable } from '@/features/seller-orders/components/seller-orders-table';
import { sellerOrderFilters } from '@/features/seller-orders/utils/seller-states';
import { cn } from '@/lib/cn';

type State = SellerSubOrderDto['state'];

export function SellerOrdersRoute() {
  const [params] = useSearchParams();
  const raw = params.get('state');
  const state = subOrderStates.includes(raw as State) ? (raw as State) : undefined;
  const orders = useSellerOrders(state);
  const filter = sellerOrderFilters.find((f) => f.state === state) ?? sellerOrderFilters[0];

  return (
    <ContentLayout
      title="Orders to fulfil"
      eyebrow="Seller desk"
      description="What buyers paid for from your shop. Ship each with a tracking number; the buyer is told by e-mail."
      actions={
        <>
          <Link to={paths.seller.getHref()} className={buttonClasses('ghost', 'sm')}>
            Seller desk
          </Link>
          <Link to={paths.sellerOrders.payouts.getHref()} className={buttonClasses('secondary', 'sm')}>
            <Landmark aria-hidden="true" className="size-4" /> Payouts and statements
          </Link>
        </>
      }
    >
      <nav aria-label="Filter orders" className="mb-5">
        <ul className="flex flex-wrap gap-1">
          {sellerOrderFilters.map((f) => {
            const active = f.state === state;
            return (
              <li key={f.label}>
                <Link
                  to={paths.sellerOrders.list.getHref(f.state)}
                  aria-current={active ? 'page' : undefined}
                  className={cn('inline-flex h-8 items-center rounded-tag px-3 text-sm font-medium', active ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink')}
                >
                  {f.label}
                </Link>
              </li>
            );
          })}
        </ul>
      </nav>
      {orders.isPending ? (
        <PageSkeleton label="Loading your orders" />
      ) : orders.isError ? (
        <Notice tone="danger" role="alert" title="Your orders could not be loaded">
          {orders.error.message}
        </Notice>
      ) : (
        <SellerOrdersTable subOrders={orders.data} emptyText={state ? `Nothing under "${filter.label}".` : 'No paid orders yet. They show here as soon as a buyer pays.'} />
      )}
    </ContentLayout>
  );
}
