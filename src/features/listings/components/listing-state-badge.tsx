import type { ListingStateCode } from '@shared/schemas/listings';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { listingStateLabels } from '../utils/condition-labels';

const tones: Record<ListingStateCode, BadgeTone> = {
  draft: 'neutral',
  submitted: 'accent',
  approved: 'ok',
  changes_requested: 'warn',
  rejected: 'danger',
  sold_out: 'drab',
  withdrawn: 'neutral',
};

export function ListingStateBadge({ state }: { state: ListingStateCode }) {
  return <Badge tone={tones[state]}>{listingStateLabels[state]}</Badge>;
}
