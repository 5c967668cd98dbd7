import type { SellerSubOrderDto } from '@shared/schemas/orders';
import type { BadgeTone } from '@/components/ui/badge';

type State = SellerSubOrderDto['state'];

/** What the state asks of the seller. */
export function sellerStateLabel(state: State, pickup: boolean): string {
  switch (state) {
    case 'paid':
      return pickup ? 'To hand over' : 'To ship';
    case 'shipped':
      return 'Shipped';
    case 'delivered':
      return pickup ? 'Handed over' : 'Delivered';
    case 'refunded':
      return 'Refunded';
    case 'cancelled':
      return 'Cancelled';
    case 'expired':
      return 'Expired';
    case 'pending_payment':
      return 'Awaiting payment';
  }
}

export const sellerStateTones: Record<State, BadgeTone> = {
  pending_payment: 'warn',
  paid: 'warn',
  shipped: 'drab',
  delivered: 'ok',
  refunded: 'danger',
  cancelled: 'neutral',
  expired: 'neutral',
};

export const transferStateLabels: Record<NonNullable<SellerSubOrderDto['transfer']>['state'], string> = {
  pending: 'Being sent',
  paid: 'Sent to your account',
  waiting_for_onboarding: 'Waiting for payout setup',
  failed: 'Failed: contact support',
};

/** The filter tabs of the seller's order list (undefined: everything they can act on or look back at). */
export const sellerOrderFilters: ReadonlyArray<{ state: State | undefined; label: string }> = [
  { state: undefined, label: 'All' },
  { state: 'paid', label: 'To ship' },
  { state: 'shipped', label: 'Shipped' },
  { state: 'delivered', label: 'Delivered' },
  { state: 'refunded', label: 'Refunded' },
];

/** A short, readable reference for an order id. */
export function orderRef(id: string): string {
  return id.replaceAll('-', '').slice(0, 8).toUpperCase();
}
