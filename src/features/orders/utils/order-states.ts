import type { BadgeTone } from '@/components/ui/badge';
import type { OrderDto, SubOrderDto } from '@shared/schemas/orders';

type OrderState = OrderDto['state'];
type SubOrderState = SubOrderDto['state'];

export const orderStateLabels: Record<OrderState, string> = {
  pending_payment: 'Awaiting payment',
  paid: 'Paid',
  expired: 'Expired',
  cancelled: 'Cancelled',
  partially_refunded: 'Partly refunded',
  refunded: 'Refunded',
};

export const orderStateTones: Record<OrderState, BadgeTone> = {
  pending_payment: 'warn',
  paid: 'ok',
  expired: 'neutral',
  cancelled: 'neutral',
  partially_refunded: 'accent',
  refunded: 'danger',
};

export const subOrderStateLabels: Record<SubOrderState, string> = {
  pending_payment: 'Awaiting payment',
  paid: 'Paid',
  shipped: 'Shipped',
  delivered: 'Delivered',
  cancelled: 'Cancelled',
  refunded: 'Refunded',
  expired: 'Expired',
};

export const subOrderStateTones: Record<SubOrderState, BadgeTone> = {
  pending_payment: 'warn',
  paid: 'accent',
  shipped: 'drab',
  delivered: 'ok',
  cancelled: 'neutral',
  refunded: 'danger',
  expired: 'neutral',
};

export type ProgressStep = { key: string; label: string; status: 'done' | 'current' | 'upcoming' | 'stopped'; detail?: string };

/**
 * The steps of one seller's part: paid -> shipped -> delivered (pickup: paid -> handed over), or a stop at
 * cancelled / refunded / expired after whatever had happened by then.
 */
export function subOrderSteps(s: Pick<SubOrderDto, 'state' | 'pickup' | 'shippedAt' | 'deliveredAt' | 'carrier' | 'tracking'>): ProgressStep[] {
  const paidOnce = s.state !== 'pending_payment' && s.state !== 'expired' && s.state !== 'cancelled';
  const shipped = s.state === 'shipped' || s.state === 'delivered' || s.shippedAt !== null;
  const delivered = s.state === 'delivered' || s.deliveredAt !== null;
  const stopped = s.state === 'cancelled' || s.state === 'refunded' || s.state === 'expired';

  const raw: Array<{ key: string; label: string; done: boolean; detail?: string }> = [
    { key: 'paid', label: s.state === 'pending_payment' ? 'Awaiting payment' : paidOnce ? 'Paid' : 'Not paid', done: paidOnce },
    ...(s.pickup
      ? []
      : [{ key: 'shipped', label: 'Shipped', done: shipped, detail: shipped && s.carrier ? `${s.carrier} · ${s.tracking ?? ''}`.trim() : undefined }]),
    { key: 'delivered', label: s.pickup ? 'Handed over' : 'Delivered', done: delivered },
  ];
  // Where things stand is the last step reached (the first one while still awaiting payment), or the stop.
  const lastDone = raw.map((r) => r.done).lastIndexOf(true);
  const here = stopped ? -1 : Math.max(lastDone, 0);
  const steps: ProgressStep[] = raw.map((r, i) => ({
    key: r.key,
    label: r.label,
    detail: r.detail,
    status: i === here ? 'current' : r.done ? 'done' : 'upcoming',
  }));
  if (stopped) steps.push({ key: s.state, label: subOrderStateLabels[s.state], status: 'stopped' });
  return steps;
}
