import { MapPin, PackageCheck, Truck, User } from 'lucide-react';
import { useState } from 'react';
import type { SellerSubOrderDto } from '@shared/schemas/orders';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormAlert, Notice } from '@/components/ui/notice';
import { OrderLinesTable } from '@/components/orders/order-lines-table';
import { PostalAddress } from '@/components/ui/postal-address';
import { formatDate } from '@/lib/format';
import { useDeliverSubOrder } from '../api/ship-sub-order';
import { formatCents } from '@/lib/money';
import { transferStateLabels } from '../utils/seller-states';
import { SellerStateBadge } from './seller-state-badge';
import { ShipForm } from './ship-form';

function NextStep({ subOrder }: { subOrder: SellerSubOrderDto }) {
  const deliver = useDeliverSubOrder(subOrder.id);
  const [problem, setProblem] = useState<string | null>(null);
  const markDelivered = () => {
    setProblem(null);
    deliver.mutate(undefined, { onError: (e) => setProblem(e.message) });
  };

  if (subOrder.state === 'paid' && !subOrder.pickup) {
    return (
      <Card className="space-y-3">
        <h2 className="text-lg font-semibold text-ink">Ship it</h2>
        <p className="text-sm text-ink-soft">Pack the parts, send them, and enter the carrier and tracking number. The buyer gets an e-mail.</p>
        <ShipForm subOrderId={subOrder.id} />
      </Card>
    );
  }
  if (subOrder.state === 'shipped' || (subOrder.state === 'paid' && subOrder.pickup)) {
    return (
      <Card className="space-y-3">
        <h2 className="text-lg font-semibold text-ink">{subOrder.pickup ? 'Hand it over' : 'On its way'}</h2>
        {subOrder.state === 'shipped' ? (
          <p className="flex items-center gap-2 text-sm text-ink-soft">
            <Truck aria-hidden="true" className="size-4 text-drab-700" /> {subOrder.carrier}, tracking <span className="font-mono text-ink">{subOrder.tracking}</span>
            {subOrder.shippedAt ? `, shipped ${formatDate(subOrder.shippedAt)}` : ''}
          </p>
        ) : (
          <p className="text-sm text-ink-soft">The buyer collects the parts. Mark it when they have them.</p>
        )}
        <FormAlert message={problem} />
        <Button variant="secondary" isLoading={deliver.isPending} icon={<PackageCheck aria-hidden="true" className="size-4" />} onClick={markDelivered}>
          {subOrder.pickup ? 'Mark as handed over' : 'Mark as delivered'}
        </Button>
      </Card>
    );
  }
  if (subOrder.state === 'delivered') {
    return <Notice tone="ok" title={`${subOrder.pickup ? 'Handed over' : 'Delivered'}${subOrder.deliveredAt ? ` ${formatDate(subOrder.deliveredAt)}` : ''}`} />;
  }
  if (subOrder.state === 'refunded') return <Notice tone="danger" title="Refunded in full">An administrator refunded this sale; nothing is left to ship.</Notice>;
  return null;
}

/** One sub-order as its seller sees it: who bought what, the money, and the next step. */
export function SellerOrderDetail({ subOrder }: { subOrder: SellerSubOrderDto }) {
  const dest = 'pickup' in subOrder.destination ? 'Pickup (the buyer collects)' : `Ship to ${subOrder.destination.country}`;
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="space-y-5">
        <NextStep subOrder={subOrder} />
        <Card className="space-y-3">
          <h2 className="text-lg font-semibold text-ink">Items</h2>
          <OrderLinesTable lines={subOrder.lines} caption="Items in this order" />
          <p className="text-xs text-ink-muted">Shipping charged: {subOrder.shippingExplanation}</p>
        </Card>
      </div>
      <div className="space-y-5">
        <Card className="space-y-3">
          <div className="flex items-center justify-between gap-2">
            <h2 className="text-lg font-semibold text-ink">Buyer</h2>
            <SellerStateBadge state={subOrder.state} pickup={subOrder.pickup} />
          </div>
          <p className="flex items-center gap-2 text-sm">
            <User aria-hidden="true" className="size-4 text-drab-700" /> {subOrder.buyer.name}
          </p>
          <p className="text-sm text-ink-soft">{subOrder.buyer.email}</p>
          {subOrder.shipTo && !subOrder.pickup ? (
            <PostalAddress label="Ship to" address={subOrder.shipTo} />
          ) : (
            <p className="flex items-center gap-2 text-sm text-ink-soft">
              <MapPin aria-hidden="true" className="size-4 text-drab-700" /> {dest}
            </p>
          )}
          {subOrder.paidAt ? <p className="text-xs text-ink-muted">Paid {formatDate(subOrder.paidAt)}</p> : null}
        </Card>
        <Card className="space-y-3">
          <h2 className="text-lg font-semibold text-ink">Money</h2>
          <dl className="space-y-1.5 text-sm">
            <div className="flex justify-between gap-4">
              <dt className="text-ink-soft">Items</dt>
              <dd className="tabular-nums">{formatCents(subOrder.itemsCents)}</dd>
            </div>
            <div className="flex justify-between gap-4">
              <dt className="text-ink-soft">Shipping</dt>
              <dd className="tabular-nums">{formatCents(subOrder.shippingCents)}</dd>
            </div>
            <div className="flex justify-between gap-4">
              <dt className="text-ink-soft">Platform fee</dt>
              <dd className="tabular-nums">−{formatCents(subOrder.feeCents)}</dd>
            </div>
            {subOrder.refundedCents > 0 ? (
              <div className="flex justify-between gap-4 text-danger">
                <dt>Refunded to the buyer</dt>
                <dd className="tabular-nums">−{formatCents(subOrder.refundedCents)}</dd>
              </div>
            ) : null}
            <div className="flex justify-between gap-4 border-t border-rule pt-2 text-base">
              <dt className="font-semibold">Your share</dt>
              <dd className="font-bold tabular-nums">{formatCents(subOrder.shareCents)}</dd>
            </div>
          </dl>
          <p className="text-xs text-ink-muted">
            Payout: {subOrder.transfer ? `${transferStateLabels[subOrder.transfer.state]} (${formatCents(subOrder.transfer.amountCents)})` : 'not yet scheduled'}
          </p>
        </Card>
      </div>
    </div>
  );
}
