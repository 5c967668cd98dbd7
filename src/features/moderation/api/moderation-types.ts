import type { ListingStateCode } from '@shared/schemas/listings';

/** One listing in the review queue (server/services/listing-moderation.ts reviewQueue). */
export interface QueueListing {
  id: string;
  state: ListingStateCode;
  sellerId: string;
  part: { id: string; name: string; primaryNumber: string | null; safetyClass: string } | null;
  title: string;
  conditionLabel: string;
  rubberUse: string | null;
  makersMarks: boolean;
  quantity: number;
  priceCents: number;
  currency: string;
  description: string;
  descriptionHtml: string;
  photos: Array<{ id: string; width: number; height: number; placeholderColor: string; urls: { thumb: string; medium: string; large: string } }>;
  flags: Array<{ code: string; severity: 'block' | 'review'; message: string }>;
  seller: { id: string; displayName: string; email: string; shopName: string };
  waitingHours: number;
  submittedAt: string | null;
}

export interface QueueFilters {
  flag?: string;
  sellerId?: string;
  minAgeHours?: number;
  sort?: 'oldest' | 'newest';
}
