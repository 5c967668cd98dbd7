import type { ListingStateCode } from '@shared/schemas/listings';
import type { ListingCondition, RubberUse, UsedGrade } from '../api/listing-types';

/*
 * Labels for the listing form, copied word for word from server/domain/conditions.ts (client code must not
 * import server/). The condition terms are the trade's (source: /work/shared/DOMAIN.md, "Condition and
 * originality"); the five used-original grades are Drabyard's own scale. Keep both files identical.
 */

export const conditionLabels: Record<ListingCondition, { label: string; shortLabel: string; hint: string }> = {
  nos: { label: 'New old stock (NOS)', shortLabel: 'NOS', hint: 'Original maker, period made, never fitted.' },
  nors: { label: 'New old replacement stock (NORS)', shortLabel: 'NORS', hint: 'Period made by another maker as a replacement, never fitted.' },
  used_original: { label: 'Used original', shortLabel: 'Used', hint: 'Removed from a vehicle; give it a grade and show its marks.' },
  rebuilt: { label: 'Rebuilt original', shortLabel: 'Rebuilt', hint: 'An original unit refurbished; say what was renewed.' },
  reproduction: { label: 'Reproduction', shortLabel: 'Repro', hint: 'New manufacture today.' },
  core: { label: 'Core (for rebuilding)', shortLabel: 'Core', hint: 'Sold to be rebuilt, not fitted as it is.' },
};

export const usedGradeLabels: Record<UsedGrade, { rank: number; label: string; explanation: string }> = {
  ready: { rank: 1, label: 'Ready', explanation: 'Clean, complete and working; wear is light and cosmetic only.' },
  honest: { rank: 2, label: 'Honest', explanation: 'Complete and usable, showing its age; a light refurbish makes it look right.' },
  weathered: { rank: 3, label: 'Weathered', explanation: 'Needs refurbishing before use; the main body is sound.' },
  hard_used: { rank: 4, label: 'Hard-used', explanation: 'Heavily worn or damaged, needing real repair work.' },
  donor: { rank: 5, label: 'Donor', explanation: 'Not usable as a whole; sold for sub-parts, markings or as a pattern.' },
};

export const rubberUseLabels: Record<RubberUse, string> = {
  serviceable: 'For use on a vehicle',
  display_only: 'Display / authenticity only',
};

export const listingStateLabels: Record<ListingStateCode, string> = {
  draft: 'Draft',
  submitted: 'In review',
  approved: 'Live',
  changes_requested: 'Changes requested',
  rejected: 'Rejected',
  sold_out: 'Sold out',
  withdrawn: 'Withdrawn',
};
