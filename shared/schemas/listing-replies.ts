import type { descriptionFormats, listingConditionCodes, ListingStateCode, rubberUseCodes, usedGradeCodes } from './listings';

/*
 * Reply shapes of the listings API, shared by the server (server/services/listings.ts builds them) and the
 * client (which reads them). Types only: the server is ours and its integration tests pin the shapes.
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
  descriptionFormat: (typeof descriptionFormats)[number];
  descriptionHtml: string;
  photos: ListingPhoto[];
  submittedAt: string | null;
  approvedAt: string | null;
  createdAt: string;
  updatedAt: string;
  /** Only for the seller and administrators. */
  flags?: ListingFlag[];
}

/** What a shop says about itself (its profile), as buyers and the seller see it. */
export interface ShopFields {
  shopName: string;
  location: string;
  country: string;
  shipsTo: string[];
  pickupAtShows: boolean;
  showsNote: string;
  returnPolicy: string;
}

export interface SellerCard extends ShopFields {
  id: string;
  displayName: string;
  liveListings: number;
  memberSince: string;
}
