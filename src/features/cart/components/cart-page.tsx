import { CreditCard, LockKeyhole, ShoppingCart } from 'lucide-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { CartReply, Destination } from '@shared/schemas/orders';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button, buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormAlert, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useCart } from '../api/get-cart';
import { useCancelCheckout, useOpenCheckouts } from '../api/open-checkouts';
import { useRemoveCartItem } from '../api/remove-cart-item';
import { useStartCheckout } from '../api/start-checkout';
import { useUpdateCartItem } from '../api/update-cart-item';
import { formatCents } from '@/lib/money';
import { CartGroupCard } from './cart-group-card';
import { DestinationPicker } from './destination-picker';

type Props = {
  /** The signed-in user's id, or null for an anonymous visitor (whose cart lives behind a cookie). */
  userId: string | null;
  destination: Destination;
  onDestinationChange: (d: Destination) => void;
  /** Where "Sign in to check out" leads (back here after sign-in, where the carts merge). */
  signInHref: string;
  /** Replaced in tests; by default a full navigation to the payment page. */
  redirect?: (url: string) => void;
};

const timeFormat = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });

function OpenCheckoutNotice() {
  const open = useOpenCheckouts(true);
  const cancel = useCancelCheckout();
  const order = open.data?.[0];
  if (!order) return null;
  return (
    <Notice tone="info" title="A checkout you started is still open">
      <p>
        Its items are held for you until {timeFormat.format(new Date(order.expiresAt))} on {formatDate(order.expiresAt)}, so the cart shows them as taken.
        Checking out again replaces it; or let it go now.
      </p>
      <Button size="sm" variant="secondary" className="mt-2" isLoading={cancel.isPending} onClick={() => cancel.mutate(order.id)}>
        Release the held items
      </Button>
    </Notice>
  );
}

function Summary({ cart, destination, onDestinationChange, userId, signInHref, redirect, busy }: Props & { cart: CartReply; busy: boolean }) {
  const checkout = useStartCheckout({ redirect });
  const [problem, setProblem] = useState<string | null>(null);
  const pay = () => {
    setProblem(null);
    checkout.mutate(destination, { onError: (e) => setProblem(e.message) });
  };
  const quoted = cart.groups.every((g) => g.shipping.ok);
  return (
    <Card className="space-y-5 lg:sticky lg:top-6">
      <h2 className="text-lg font-semibold text-ink">Summary</h2>
      <DestinationPicker value={destination} onChange={onDestinationChange} disabled={busy || checkout.isPending} />
      <dl className="space-y-2 text-sm" aria-label="Cart totals">
        <div className="flex justify-between gap-4">
          <dt className="text-ink-soft">Items</dt>
          <dd className="font-medium tabular-nums">{formatCents(cart.itemsCents)}</dd>
        </div>
        <div className="flex justify-between gap-4">
          <dt className="text-ink-soft">Shipping{cart.groups.length > 1 ? ` (${cart.groups.length} sellers)` : ''}</dt>
          <dd className="font-medium tabular-nums">{quoted ? formatCents(cart.shippingCents) : 'Not quoted'}</dd>
        </div>
        <div className="flex justify-between gap-4 border-t border-rule pt-3 text-base">
          <dt className="font-semibold text-ink">Total</dt>
          <dd className="font-bold text-ink tabular-nums" data-testid="cart-total">
            {formatCents(cart.totalCents)}
          </dd>
        </div>
      </dl>
      <FormAlert message={problem} />
      {userId ? (
        <Button className="w-full" icon={<CreditCard aria-hidden="true" className="size-4" />} disabled={!cart.canCheckout || busy} isLoading={checkout.isPending} onClick={pay}>
          Check out
        </Button>
      ) : (
        <Link to={signInHref} className={buttonClasses('primary', 'md', 'w-full')}>
          Sign in to check out
        </Link>
      )}
      {!cart.canCheckout && cart.groups.length > 0 ? <p className="text-xs text-warn">Fix what is marked above to check out.</p> : null}
      <p className="flex gap-2 text-xs text-ink-muted">
        <LockKeyhole aria-hidden="true" className="mt-0.5 size-3.5 shrink-0" />
        One payment for every seller, in US dollars, on the secure payment page. Each seller ships their own part.
      </p>
    </Card>
  );
}

/** The cart: grouped by seller, quantities capped by stock, price changes shown, totals from the server. */
export function CartPage(props: Props) {
  const { userId, destination } = props;
  const owner = userId ?? 'anonymous';
  const cart = useCart(owner, destination);
  const update = useUpdateCartItem(owner, destination);
  const remove = useRemoveCartItem(owner, destination);
  const [problem, setProblem] = useState<string | null>(null);

  if (cart.isPending) return <PageSkeleton label="Loading your cart" />;
  if (cart.isError) return <Notice tone="danger" role="alert" title="The cart could not be loaded">{cart.error.message}</Notice>;

  const data = cart.data;
  const busyListingId = update.isPending ? (update.variables?.listingId ?? null) : remove.isPending ? (remove.variables ?? null) : null;
  const onQuantity = (listingId: string, quantity: number) => {
    setProblem(null);
    update.mutate({ listingId, quantity }, { onError: (e) => setProblem(e.message) });
  };
  const onRemove = (listingId: string) => {
    setProblem(null);
    remove.mutate(listingId, { onError: (e) => setProblem(e.message) });
  };

  if (data.groups.length === 0) {
    return (
      <div className="space-y-6">
        {userId ? <OpenCheckoutNotice /> : null}
        <Card className="flex flex-col items-center gap-3 py-12 text-center">
          <ShoppingCart aria-hidden="true" className="size-10 text-drab-500" />
          <h2 className="text-xl font-semibold text-ink">Your cart is empty</h2>
          <p className="max-w-md text-ink-soft">Find a part by its number or browse the catalog, then add listings from as many sellers as you need.</p>
          <div className="flex gap-2">
            <Link to={paths.search.getHref()} className={buttonClasses('primary', 'sm')}>
              Search parts
            </Link>
            <Link to={paths.catalog.getHref()} className={buttonClasses('secondary', 'sm')}>
              Browse the catalog
            </Link>
          </div>
        </Card>
      </div>
    );
  }

  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="space-y-5">
        {userId ? <OpenCheckoutNotice /> : null}
        <FormAlert message={problem} />
        {data.warnings.length > 0 ? (
          <Notice tone="warn" role="status" title="Since you added these items">
            <ul className="list-disc space-y-0.5 pl-4">
              {data.warnings.map((w, i) => (
                <li key={`${w.code}-${w.listingId ?? w.sellerId ?? i}`}>{w.message}</li>
              ))}
            </ul>
          </Notice>
        ) : null}
        {data.groups.map((group) => (
          <CartGroupCard key={group.seller.id} group={group} busyListingId={busyListingId} onQuantity={onQuantity} onRemove={onRemove} />
        ))}
      </div>
      <Summary {...props} cart={data} busy={update.isPending || remove.isPending || cart.isFetching} />
    </div>
  );
}
