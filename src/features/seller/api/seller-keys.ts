import type { ListingStateCode } from '@shared/schemas/listings';

export interface MyListingsQuery {
  state?: ListingStateCode;
  q?: string;
  sort?: string;
  page?: number;
  pageSize?: number;
}

// ['me', 'listings'] is also invalidated by the listings feature after it saves a listing.
export const sellerKeys = {
  all: ['me'] as const,
  listings: () => [...sellerKeys.all, 'listings'] as const,
  listingsPage: (q: MyListingsQuery) => [...sellerKeys.listings(), q] as const,
  shop: () => [...sellerKeys.all, 'shop'] as const,
  shippingProfiles: () => [...sellerKeys.all, 'shipping-profiles'] as const,
};
