import { Package } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { OrderSummary } from '@shared/schemas/orders';
import { buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { formatCents } from '../utils/money';
import { orderRef } from '../utils/order-ref';
import { OrderStateBadge } from './order-state-badge';

/** The buyer's orders, newest first. */
export function OrdersList({ orders }: { orders: OrderSummary[] }) {
  if (orders.length === 0) {
    return (
      <Card className="flex flex-col items-center gap-3 py-12 text-center">
        <Package aria-hidden="true" className="size-10 text-drab-500" />
        <h2 className="text-xl font-semibold text-ink">No orders yet</h2>
        <p className="max-w-md text-ink-soft">When you pay for a cart, its order shows here with each seller&rsquo;s shipment.</p>
        <Link to={paths.cart.getHref()} className={buttonClasses('secondary', 'sm')}>
          Go to your cart
        </Link>
      </Card>
    );
  }
  return (
    <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
      <table className="w-full min-w-[40rem] border-collapse text-left text-sm">
        <caption className="sr-only">Your orders</caption>
        <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
          <tr>
            <th scope="col" className="px-4 py-2.5">Order</th>
            <th scope="col" className="px-4 py-2.5">Placed</th>
            <th scope="col" className="px-4 py-2.5">Sellers</th>
            <th scope="col" className="px-4 py-2.5 text-right">Items</th>
            <th scope="col" className="px-4 py-2.5 text-right">Total</th>
            <th scope="col" className="px-4 py-2.5">State</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {orders.map((o) => (
            <tr key={o.id}>
              <td className="px-4 py-3">
                <Link to={paths.order.getHref(o.id)} className={`${textLinkClasses} font-mono`}>
                  {orderRef(o.id)}
                </Link>
              </td>
              <td className="px-4 py-3 whitespace-nowrap">{formatDate(o.createdAt)}</td>
              <td className="px-4 py-3 tabular-nums">{o.sellerCount}</td>
              <td className="px-4 py-3 text-right tabular-nums">{o.itemCount}</td>
              <td className="px-4 py-3 text-right font-medium tabular-nums">{formatCents(o.totalCents)}</td>
              <td className="px-4 py-3">
                <OrderStateBadge state={o.state} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
