import { LoaderCircle, MapPin, PackageCheck, Store, Truck } from 'lucide-react';
import type { OrderDto, SubOrderDto } from '@shared/schemas/orders';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormAlert, Notice } from '@/components/ui/notice';
import { OrderLinesTable } from '@/components/orders/order-lines-table';
import { PostalAddress } from '@/components/ui/postal-address';
import { useMe } from '@/features/auth/api/get-me';
import { hasRole } from '@/lib/authorization';
import { formatDate } from '@/lib/format';
import { useCancelOrder } from '../api/cancel-order';
import { formatCents } from '../utils/money';
import { SubOrderStateBadge, OrderStateBadge } from './order-state-badge';
import { canRefund, RefundForm } from './refund-form';
import { SubOrderProgress } from './sub-order-progress';

function destinationText(order: OrderDto): string {
  return 'pickup' in order.destination ? 'Pickup from each seller' : `Shipping to ${order.destination.country}`;
}

function SubOrderCard({ order, subOrder, isAdmin }: { order: OrderDto; subOrder: SubOrderDto; isAdmin: boolean }) {
  const headingId = `sub-order-${subOrder.id}`;
  return (
    <Card>
      <section aria-labelledby={headingId} className="space-y-4">
        <header className="flex flex-wrap items-center justify-between gap-3 border-b border-rule pb-3">
          <h3 id={headingId} className="flex items-center gap-2 text-lg font-semibold text-ink">
            <Store aria-hidden="true" className="size-5 text-drab-700" /> {subOrder.seller.name}
          </h3>
          <SubOrderStateBadge state={subOrder.state} />
        </header>
        <SubOrderProgress subOrder={subOrder} label={`Progress of the part from ${subOrder.seller.name}`} />
        {subOrder.state === 'shipped' && subOrder.carrier ? (
          <p className="flex items-center gap-2 text-sm text-ink-soft">
            <Truck aria-hidden="true" className="size-4 text-drab-700" />
            On its way with {subOrder.carrier}, tracking number <span className="font-mono text-ink">{subOrder.tracking}</span>
            {subOrder.shippedAt ? ` (shipped ${formatDate(subOrder.shippedAt)})` : ''}
          </p>
        ) : null}
        {subOrder.state === 'delivered' && subOrder.deliveredAt ? (
          <p className="flex items-center gap-2 text-sm text-ink-soft">
            <PackageCheck aria-hidden="true" className="size-4 text-ok" />
            {subOrder.pickup ? 'Handed over' : 'Delivered'} {formatDate(subOrder.deliveredAt)}
          </p>
        ) : null}
        <OrderLinesTable
          lines={subOrder.lines}
          caption={`Items from ${subOrder.seller.name}`}
          linkToListings
          footer={
            <>
              <tr>
                <th scope="row" colSpan={3} className="pt-2 text-right font-normal">
                  {subOrder.pickup ? 'Pickup' : 'Shipping'}
                </th>
                <td className="pt-2 text-right tabular-nums">{formatCents(subOrder.shippingCents)}</td>
              </tr>
              {subOrder.refundedCents > 0 ? (
                <tr className="text-danger">
                  <th scope="row" colSpan={3} className="text-right font-normal">
                    Refunded
                  </th>
                  <td className="text-right tabular-nums">−{formatCents(subOrder.refundedCents)}</td>
                </tr>
              ) : null}
            </>
          }
        />
        <p className="text-xs text-ink-muted">{subOrder.shippingExplanation}</p>
        {isAdmin && canRefund(order, subOrder) ? <RefundForm order={order} subOrder={subOrder} /> : null}
      </section>
    </Card>
  );
}

function PendingNotice({ order, awaitingPayment }: { order: OrderDto; awaitingPayment: boolean }) {
  const cancel = useCancelOrder();
  if (awaitingPayment) {
    return (
      <Notice tone="info" role="status" title={<span className="inline-flex items-center gap-2"><LoaderCircle aria-hidden="true" className="size-4 animate-spin" /> Confirming your payment…</span>}>
        <p>This takes a few seconds. The page updates by itself.</p>
      </Notice>
    );
  }
  return (
    <Notice tone="warn" title="This order is not paid yet">
      <p>The items are held for you until {formatDate(order.expiresAt)}; after that the checkout lapses and nothing is charged.</p>
      <FormAlert message={cancel.error?.message} />
      <Button size="sm" variant="secondary" className="mt-2" isLoading={cancel.isPending} onClick={() => cancel.mutate(order.id)}>
        Cancel this checkout
      </Button>
    </Notice>
  );
}

/** The buyer's order: one payment, one part per seller, each with its own progress. */
export function OrderDetail({ order, awaitingPayment = false }: { order: OrderDto; awaitingPayment?: boolean }) {
  const justPaid = awaitingPayment && order.state === 'paid';
  // Admins read any order here; the refund forms are theirs alone (the server checks the role again).
  const isAdmin = hasRole(useMe().data, 'admin');
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <div className="space-y-5">
        {order.state === 'pending_payment' ? <PendingNotice order={order} awaitingPayment={awaitingPayment} /> : null}
        {justPaid ? (
          <Notice tone="ok" role="status" title="Thank you: your payment is in">
            <p>
              {order.subOrders.length === 1 ? 'The seller has' : `Each of the ${order.subOrders.length} sellers has`} been told to send your parts. We sent a
              confirmation by e-mail.
            </p>
          </Notice>
        ) : null}
        {order.state === 'expired' ? <Notice tone="info" title="This checkout lapsed before it was paid. Nothing was charged." /> : null}
        {order.state === 'cancelled' ? <Notice tone="info" title="This checkout was cancelled. Nothing was charged." /> : null}
        <h2 className="text-xl font-semibold text-ink">
          {order.subOrders.length === 1 ? 'From one seller' : `From ${order.subOrders.length} sellers`}
        </h2>
        {order.subOrders.map((s) => (
          <SubOrderCard key={s.id} order={order} subOrder={s} isAdmin={isAdmin} />
        ))}
      </div>
      <Card className="space-y-4">
        <div className="flex items-center justify-between gap-2">
          <h2 className="text-lg font-semibold text-ink">Payment</h2>
          <OrderStateBadge state={order.state} />
        </div>
        <dl className="space-y-2 text-sm">
          <div className="flex justify-between gap-4">
            <dt className="text-ink-soft">Items</dt>
            <dd className="tabular-nums">{formatCents(order.itemsCents)}</dd>
          </div>
          <div className="flex justify-between gap-4">
            <dt className="text-ink-soft">Shipping</dt>
            <dd className="tabular-nums">{formatCents(order.shippingCents)}</dd>
          </div>
          <div className="flex justify-between gap-4 border-t border-rule pt-2 text-base">
            <dt className="font-semibold">Total</dt>
            <dd className="font-bold tabular-nums" data-testid="order-total">
              {formatCents(order.totalCents)}
            </dd>
          </div>
          {order.refundedCents > 0 ? (
            <div className="flex justify-between gap-4 text-danger">
              <dt>Refunded</dt>
              <dd className="tabular-nums">−{formatCents(order.refundedCents)}</dd>
            </div>
          ) : null}
        </dl>
        {order.shipTo && !('pickup' in order.destination) ? (
          <PostalAddress label="Shipping to" address={order.shipTo} />
        ) : (
          <p className="flex items-center gap-2 text-sm text-ink-soft">
            <MapPin aria-hidden="true" className="size-4 text-drab-700" /> {destinationText(order)}
          </p>
        )}
        <p className="text-xs text-ink-muted">
          Placed {formatDate(order.createdAt)}
          {order.paidAt ? ` · paid ${formatDate(order.paidAt)}` : ''}
        </p>
        {order.refunds.length > 0 ? (
          <div className="border-t border-rule pt-3">
            <h3 className="mb-1 text-sm font-semibold">Refunds</h3>
            <ul className="space-y-1 text-xs text-ink-soft">
              {order.refunds.map((r) => (
                <li key={r.id}>
                  {formatDate(r.createdAt)}: {formatCents(r.amountCents)} ({r.reason})
                </li>
              ))}
            </ul>
          </div>
        ) : null}
      </Card>
    </div>
  );
}
