import type { ListingStateCode } from '@shared/schemas/listings';
import type { BadgeTone } from '@/components/ui/badge';

// The same words as the listings feature's state badge; kept here because features do not share internals.
export const stateLabels: Record<ListingStateCode, string> = {
  draft: 'Draft',
  submitted: 'In review',
  approved: 'Live',
  changes_requested: 'Changes requested',
  rejected: 'Rejected',
  sold_out: 'Sold out',
  withdrawn: 'Withdrawn',
};

export const stateTones: Record<ListingStateCode, BadgeTone> = {
  draft: 'neutral',
  submitted: 'accent',
  approved: 'ok',
  changes_requested: 'warn',
  rejected: 'danger',
  sold_out: 'drab',
  withdrawn: 'neutral',
};

export { formatCents } from '@/lib/money';

/** Dollars typed by a seller -> exact cents (text arithmetic, no floating point); null when not an amount. */
export function dollarsToCents(text: string): number | null {
  const m = text.replace(/[\s,]/g, '').replace(/^\$/, '').match(/^(\d{1,9})(?:\.(\d{0,2}))?$/);
  return m ? Number(m[1]) * 100 + Number((m[2] ?? '').padEnd(2, '0')) : null;
}

export const centsToDollars = (cents: number) => `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
