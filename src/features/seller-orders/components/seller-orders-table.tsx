import { Inbox } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { SellerSubOrderDto } from '@shared/schemas/orders';
import { Card } from '@/components/ui/card';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { formatCents } from '@/lib/money';
import { orderRef } from '../utils/seller-states';
import { SellerStateBadge } from './seller-state-badge';

function shipTo(s: SellerSubOrderDto): string {
  return 'pickup' in s.destination ? 'Pickup' : s.destination.country;
}

function itemsText(s: SellerSubOrderDto): string {
  const units = s.lines.reduce((a, l) => a + l.quantity, 0);
  const first = s.lines[0]?.title ?? '';
  return s.lines.length > 1 ? `${first} and ${s.lines.length - 1} more (${units} units)` : `${first}${units > 1 ? ` × ${units}` : ''}`;
}

/** The seller's sub-orders, newest payment first. */
export function SellerOrdersTable({ subOrders, emptyText }: { subOrders: SellerSubOrderDto[]; emptyText: string }) {
  if (subOrders.length === 0) {
    return (
      <Card className="flex flex-col items-center gap-2 py-10 text-center">
        <Inbox aria-hidden="true" className="size-9 text-drab-500" />
        <p className="text-ink-soft">{emptyText}</p>
      </Card>
    );
  }
  return (
    <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
      <table className="w-full min-w-[48rem] border-collapse text-left text-sm">
        <caption className="sr-only">Your orders</caption>
        <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
          <tr>
            <th scope="col" className="px-4 py-2.5">Order</th>
            <th scope="col" className="px-4 py-2.5">Paid</th>
            <th scope="col" className="px-4 py-2.5">Buyer</th>
            <th scope="col" className="px-4 py-2.5">Items</th>
            <th scope="col" className="px-4 py-2.5">Ship to</th>
            <th scope="col" className="px-4 py-2.5 text-right">Your share</th>
            <th scope="col" className="px-4 py-2.5">State</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {subOrders.map((s) => (
            <tr key={s.id} data-sub-order-id={s.id}>
              <td className="px-4 py-3">
                <Link to={paths.sellerOrders.detail.getHref(s.id)} className={`${textLinkClasses} font-mono`} aria-label={`Open order ${orderRef(s.orderId)}`}>
                  {orderRef(s.orderId)}
                </Link>
              </td>
              <td className="px-4 py-3 whitespace-nowrap">{s.paidAt ? formatDate(s.paidAt) : '—'}</td>
              <td className="px-4 py-3">{s.buyer.name}</td>
              <td className="max-w-72 truncate px-4 py-3" title={itemsText(s)}>
                {itemsText(s)}
              </td>
              <td className="px-4 py-3">{shipTo(s)}</td>
              <td className="px-4 py-3 text-right font-medium tabular-nums">{formatCents(s.shareCents)}</td>
              <td className="px-4 py-3">
                <SellerStateBadge state={s.state} pickup={s.pickup} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
