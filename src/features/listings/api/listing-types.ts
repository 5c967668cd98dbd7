import type { ListingStateCode, listingConditionCodes, rubberUseCodes, usedGradeCodes } from '@shared/schemas/listings';

/*
 * Reply shapes of the listings API (server/services/listings.ts), as the client reads them. Types only: the
 * server is ours and its integration tests pin the shapes; the client does not re-validate every reply.
 */

export type ListingCondition = (typeof listingConditionCodes)[number];
export type UsedGrade = (typeof usedGradeCodes)[number];
export type RubberUse = (typeof rubberUseCodes)[number];

export interface ListingPhoto {
  id: string;
  position: number;
  width: number;
  height: number;
  placeholderColor: string;
  urls: { thumb: string; medium: string; large: string };
}

export interface ListingFlag {
  code: string;
  severity: 'block' | 'review';
  message: string;
  details: unknown;
}

export interface PartSummary {
  id: string;
  name: string;
  category: string;
  safetyClass: string;
  primaryNumber: string | null;
}

export interface Listing {
  id: string;
  state: ListingStateCode;
  sellerId: string;
  partId: string | null;
  part: PartSummary | null;
  title: string;
  condition: ListingCondition;
  conditionLabel: string;
  usedGrade: UsedGrade | null;
  rubberUse: RubberUse | null;
  makersMarks: boolean;
  quantity: number;
  priceCents: number;
  currency: string;
  weightGrams: number;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  shippingProfileId: string | null;
  description: string;
  descriptionFormat: 'plain' | 'markdown';
  descriptionHtml: string;
  photos: ListingPhoto[];
  submittedAt: string | null;
  approvedAt: string | null;
  createdAt: string;
  updatedAt: string;
  flags?: ListingFlag[];
}

export interface SellerCard {
  id: string;
  displayName: string;
  shopName: string;
  location: string;
  country: string;
  shipsTo: string[];
  pickupAtShows: boolean;
  showsNote: string;
  returnPolicy: string;
  liveListings: number;
  memberSince: string;
}

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
