import type { ShopFields } from '@shared/schemas/listing-replies';
import type { ListingStateCode } from '@shared/schemas/listings';

/*
 * Reply shapes of the seller's endpoints (server/services/listings.ts, seller-profiles.ts, listing-import.ts).
 * The desk reads a narrow slice of a listing, declared here rather than taken from the listings feature.
 */

export interface DeskListing {
  id: string;
  state: ListingStateCode;
  partId: string | null;
  part: { id: string; name: string; primaryNumber: string | null } | null;
  title: string;
  condition: string;
  conditionLabel: string;
  quantity: number;
  priceCents: number;
  currency: string;
  photos: Array<{ id: string; placeholderColor: string; urls: { thumb: string } }>;
  flags?: Array<{ code: string; severity: 'block' | 'review'; message: string }>;
  updatedAt: string;
}

export interface MyListingsReply {
  listings: DeskListing[];
  counts: Record<ListingStateCode, number>;
  total: number;
  page: number;
  pageSize: number;
}

export interface Shop extends ShopFields {
  payoutsEnabled: boolean;
  updatedAt: string;
}

export type ShippingRules =
  | { kind: 'flat_per_order'; amountCents: number; freeAboveCents?: number | null; shipsTo: string[]; pickupAvailable?: boolean }
  | { kind: 'per_item'; firstItemCents: number; additionalItemCents: number; freeAboveCents?: number | null; shipsTo: string[]; pickupAvailable?: boolean }
  | {
      kind: 'weight_bands';
      bands: Array<{ upToGrams: number; amountCents: number }>;
      overMaxCents?: number | null;
      freeAboveCents?: number | null;
      shipsTo: string[];
      pickupAvailable?: boolean;
    }
  | { kind: 'pickup_only'; shipsTo: string[]; pickupAvailable?: boolean };

export interface ShippingProfile {
  id: string;
  name: string;
  rules: ShippingRules;
  isDefault: boolean;
  createdAt: string;
}

export interface ImportFieldInfo {
  name: string;
  label: string;
  required: boolean;
}

export interface ImportPreviewRow {
  row: number;
  values: Record<string, string>;
  part: { id: string; name: string } | null;
  errors: Array<{ field: string; message: string }>;
}

export interface ImportPreview {
  headers: string[];
  mapping: Record<string, string | null>;
  fields: ImportFieldInfo[];
  rows: ImportPreviewRow[];
  summary: { total: number; valid: number; invalid: number };
}

export interface ImportResult {
  created: number;
  listingIds: string[];
  as: 'draft' | 'submitted';
  skipped: Array<{ row: number; errors: Array<{ field: string; message: string }> }>;
}
