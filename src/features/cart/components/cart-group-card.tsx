import { Package, Store, TriangleAlert } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { CartGroup, CartItem } from '@shared/schemas/orders';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { textLinkClasses } from '@/components/ui/text-link';
import { formatCents } from '@/lib/money';
import { QuantityStepper } from './quantity-stepper';

type LineActions = {
  busyListingId: string | null;
  onQuantity: (listingId: string, quantity: number) => void;
  onRemove: (listingId: string) => void;
};

function PriceChange({ item }: { item: CartItem }) {
  const up = item.unitPriceCents > item.priceCentsAtAdd;
  return (
    <p className="flex flex-wrap items-center gap-2 text-xs">
      <Badge tone={up ? 'warn' : 'ok'}>{up ? 'Price went up' : 'Price went down'}</Badge>
      <span className="text-ink-soft">
        Was <s>{formatCents(item.priceCentsAtAdd)}</s> when you added it, now {formatCents(item.unitPriceCents)}
      </span>
    </p>
  );
}

function CartLine({ item, busyListingId, onQuantity, onRemove }: { item: CartItem } & LineActions) {
  const gone = item.available === 0;
  const over = !gone && item.quantity > item.available;
  const busy = busyListingId === item.listingId;
  return (
    <li className="flex gap-4 py-4 first:pt-0 last:pb-0" data-listing-id={item.listingId}>
      <span className="flex size-16 shrink-0 items-center justify-center overflow-hidden rounded-tag border border-rule bg-paper-sunk">
        {item.thumbnailUrl ? (
          <img src={item.thumbnailUrl} alt="" className="h-full w-full object-cover" loading="lazy" />
        ) : (
          <Package aria-hidden="true" className="size-6 text-drab-300" />
        )}
      </span>
      <div className="min-w-0 flex-1 space-y-2">
        <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-1">
          <div className="min-w-0">
            <Link to={paths.listing.getHref(item.listingId)} className={textLinkClasses}>
              {item.title}
            </Link>
            <p className="text-sm text-ink-muted tabular-nums">{formatCents(item.unitPriceCents)} each</p>
          </div>
          <p className="text-base font-semibold text-ink tabular-nums" aria-label={`Line total: ${formatCents(item.lineCents)}`}>
            {formatCents(item.lineCents)}
          </p>
        </div>
        {item.priceChanged ? <PriceChange item={item} /> : null}
        {gone ? (
          <p className="flex items-center gap-1.5 text-sm font-medium text-danger">
            <TriangleAlert aria-hidden="true" className="size-4" /> No longer available: remove it to check out.
          </p>
        ) : null}
        {over ? (
          <p className="flex flex-wrap items-center gap-2 text-sm font-medium text-warn">
            <TriangleAlert aria-hidden="true" className="size-4" /> Only {item.available} left, you have {item.quantity}.
            <Button size="sm" variant="secondary" disabled={busy} onClick={() => onQuantity(item.listingId, item.available)}>
              Keep {item.available}
            </Button>
          </p>
        ) : null}
        <div className="flex flex-wrap items-center justify-between gap-3">
          {gone ? <span /> : <QuantityStepper title={item.title} quantity={item.quantity} available={item.available} disabled={busy} onChange={(q) => onQuantity(item.listingId, q)} />}
          <Button size="sm" variant="ghost" disabled={busy} onClick={() => onRemove(item.listingId)} aria-label={`Remove ${item.title}`}>
            Remove
          </Button>
        </div>
      </div>
    </li>
  );
}

/** One seller's part of the cart: their items, their subtotal and their shipping quote. */
export function CartGroupCard({ group, ...actions }: { group: CartGroup } & LineActions) {
  const headingId = `cart-seller-${group.seller.id}`;
  return (
    <Card>
      <section aria-labelledby={headingId} className="space-y-4">
        <header className="flex items-center gap-2 border-b border-rule pb-3">
          <Store aria-hidden="true" className="size-5 text-drab-700" />
          <h2 id={headingId} className="text-lg font-semibold text-ink">
            {group.seller.name}
          </h2>
          <span className="text-label text-ink-muted uppercase">
            {group.items.length} {group.items.length === 1 ? 'item' : 'items'}
          </span>
        </header>
        <ul className="divide-y divide-rule">
          {group.items.map((item) => (
            <CartLine key={item.listingId} item={item} {...actions} />
          ))}
        </ul>
        <dl className="space-y-1 border-t border-rule pt-3 text-sm">
          <div className="flex justify-between gap-4">
            <dt className="text-ink-soft">Items from {group.seller.name}</dt>
            <dd className="font-medium text-ink tabular-nums">{formatCents(group.itemsCents)}</dd>
          </div>
          <div className="flex justify-between gap-4">
            <dt className="text-ink-soft">Shipping</dt>
            <dd className="text-right font-medium text-ink tabular-nums">
              {group.shipping.ok ? (group.shipping.amountCents === 0 ? 'Free' : formatCents(group.shipping.amountCents)) : '—'}
            </dd>
          </div>
        </dl>
        {/* Outside the list: a <dl> may hold only dt/dd groups. */}
        <p className={group.shipping.ok ? 'mt-1 text-xs text-ink-muted' : 'mt-1 text-sm font-medium text-warn'}>{group.shipping.explanation}</p>
      </section>
    </Card>
  );
}
