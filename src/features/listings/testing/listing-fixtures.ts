// Fictional test data (invented parts, numbers and shops).
import type { Listing, ListingPage, ListingPhoto } from '../api/listing-types';

export const PART_ID = '11111111-1111-4111-8111-111111111111';
export const LISTING_ID = '22222222-2222-4222-8222-222222222222';
export const PROFILE_ID = '33333333-3333-4333-8333-333333333333';

export function makePhoto(n: number): ListingPhoto {
  const id = `4444444${n}-4444-4444-8444-444444444444`;
  return { id, position: n, width: 800, height: 600, placeholderColor: '#6d5a3a', urls: { thumb: `/media/t${n}.webp`, medium: `/media/m${n}.webp`, large: `/media/l${n}.webp` } };
}

export function makeListing(over: Partial<Listing> = {}): Listing {
  return {
    id: LISTING_ID,
    state: 'draft',
    sellerId: 'usr_seller',
    partId: PART_ID,
    part: { id: PART_ID, name: 'Wheel cylinder, front (fictional)', category: 'wheel_cylinder', safetyClass: 'brake', primaryNumber: 'FX-1001' },
    title: 'Wheel cylinder, front, rebuilt',
    condition: 'used_original',
    conditionLabel: 'Used original: Honest',
    usedGrade: 'honest',
    rubberUse: 'display_only',
    makersMarks: true,
    quantity: 2,
    priceCents: 4250,
    currency: 'USD',
    weightGrams: 900,
    lengthMm: 120,
    widthMm: 60,
    heightMm: 60,
    shippingProfileId: PROFILE_ID,
    description: 'Casting mark clear.',
    descriptionFormat: 'plain',
    descriptionHtml: '<p>Casting mark clear.</p>',
    photos: [],
    submittedAt: null,
    approvedAt: null,
    createdAt: '2025-03-01T10:00:00.000Z',
    updatedAt: '2025-03-02T10:00:00.000Z',
    flags: [],
    ...over,
  };
}

export function makeListingPage(over: Partial<ListingPage> = {}, listing: Partial<Listing> = {}): ListingPage {
  return {
    listing: makeListing({ state: 'approved', ...listing }),
    condition: {
      code: 'used_original',
      label: 'Used original',
      shortLabel: 'Used',
      explanation: 'An original part removed from a vehicle.',
      grade: { code: 'honest', rank: 2, label: 'Honest', explanation: 'Complete and usable, showing its age.' },
      rubberUse: { code: 'display_only', label: 'Display / authenticity only', explanation: 'Offered for display only.' },
    },
    seller: {
      id: 'usr_seller',
      displayName: 'Fenwick Yard (fictional)',
      shopName: 'Fenwick Yard',
      location: 'Oldmarsh',
      country: 'US',
      shipsTo: ['US', 'CA'],
      pickupAtShows: true,
      showsNote: 'Spring swap meet',
      returnPolicy: '14 days if not as described.',
      liveListings: 7,
      memberSince: '2024-01-05T00:00:00.000Z',
    },
    part: {
      part: { id: PART_ID, name: 'Wheel cylinder, front (fictional)', description: '', category: 'wheel_cylinder', weightGrams: 900, lengthMm: 120, widthMm: 60, heightMm: 60, safetyClass: 'brake', restricted: false },
      numbers: [{ kind: 'maker', numbers: [{ id: 'n1', printed: 'FX-1001', key: 'FX1001' }] }],
      chain: {
        parts: [
          { id: PART_ID, name: 'Wheel cylinder, front (fictional)', category: 'wheel_cylinder', safetyClass: 'brake', primaryNumber: 'FX-1001' },
          { id: 'p2', name: 'Wheel cylinder, front, late (fictional)', category: 'wheel_cylinder', safetyClass: 'brake', primaryNumber: 'FX-1002' },
        ],
        edges: [{ fromPartId: PART_ID, toPartId: 'p2', interchange: 'one_way', quantity: 1, note: null }],
        current: ['p2'],
      },
    },
    cautions: [{ code: 'rubber_ages', text: 'Hydraulic brake rubber ages even unused.' }],
    shipping: { id: PROFILE_ID, name: 'By weight', rules: {} },
    viewer: { isOwner: false, isAdmin: false, allowedActions: [] },
    ...over,
  };
}
