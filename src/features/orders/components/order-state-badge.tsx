import type { OrderDto, SubOrderDto } from '@shared/schemas/orders';
import { Badge } from '@/components/ui/badge';
import { orderStateLabels, orderStateTones, subOrderStateLabels, subOrderStateTones } from '../utils/order-states';

export function OrderStateBadge({ state }: { state: OrderDto['state'] }) {
  return <Badge tone={orderStateTones[state]}>{orderStateLabels[state]}</Badge>;
}

export function SubOrderStateBadge({ state }: { state: SubOrderDto['state'] }) {
  return <Badge tone={subOrderStateTones[state]}>{subOrderStateLabels[state]}</Badge>;
}
