import type { ListingCondition, PartSummary, RubberUse, SellerCard, UsedGrade, Listing } from '@shared/schemas/listing-replies';

/*
 * Reply shapes of the listings API as the client reads them: the listing, its photos, flags, part summary and
 * seller card are shared with the server (shared/schemas/listing-replies.ts); the page-level shapes follow.
 */

export type { Listing, ListingCondition, ListingFlag, ListingPhoto, PartSummary, RubberUse, SellerCard, UsedGrade } from '@shared/schemas/listing-replies';

export interface PartNumberGroup {
  kind: string;
  numbers: Array<{ id: string; printed: string; key: string }>;
}

export interface ChainEdge {
  id?: string;
  fromPartId: string;
  toPartId: string;
  interchange: 'two_way' | 'one_way' | 'conditional';
  note?: string | null;
  quantity: number;
}

export interface ListingPart {
  part: {
    id: string;
    name: string;
    description: string;
    category: string;
    weightGrams: number;
    lengthMm: number;
    widthMm: number;
    heightMm: number;
    safetyClass: string;
    restricted: boolean;
  };
  numbers: PartNumberGroup[];
  chain: { parts: PartSummary[]; edges: ChainEdge[]; current: string[] };
}

export interface ListingEvent {
  action: string;
  fromState: string | null;
  toState: string;
  message: string | null;
  actorId: string | null;
  at: string;
}

/** GET /api/listings/:id */
export interface ListingPage {
  listing: Listing;
  condition: {
    code: ListingCondition;
    label: string;
    shortLabel: string;
    explanation: string;
    grade: { code: UsedGrade; rank: number; label: string; explanation: string } | null;
    rubberUse: { code: RubberUse; label: string; explanation: string } | null;
  };
  seller: SellerCard;
  part: ListingPart | null;
  cautions: Array<{ code: string; text: string }>;
  shipping: { id: string; name: string; rules: Record<string, unknown> } | null;
  viewer: { isOwner: boolean; isAdmin: boolean; allowedActions: string[] };
  events?: ListingEvent[];
}

export interface ShippingProfileOption {
  id: string;
  name: string;
  isDefault: boolean;
}
