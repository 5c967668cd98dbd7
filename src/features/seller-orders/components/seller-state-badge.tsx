import type { SellerSubOrderDto } from '@shared/schemas/orders';
import { Badge } from '@/components/ui/badge';
import { sellerStateLabel, sellerStateTones } from '../utils/seller-states';

export function SellerStateBadge({ state, pickup }: { state: SellerSubOrderDto['state']; pickup: boolean }) {
  return <Badge tone={sellerStateTones[state]}>{sellerStateLabel(state, pickup)}</Badge>;
}
