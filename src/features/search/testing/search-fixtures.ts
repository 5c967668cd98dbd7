// Fictional search replies for component tests (invented numbers, sellers and vehicles).
import { facetNames, type FacetName, type FacetValue, type SearchHit, type SearchReply } from '@shared/schemas/search';

export const PART_OLD = '0b6f3a52-6c1e-4d7a-9f0e-2a1b3c4d5e01';
export const PART_NEW = '0b6f3a52-6c1e-4d7a-9f0e-2a1b3c4d5e02';
export const LISTING_1 = '7c0d9e8f-1a2b-4c3d-8e4f-5a6b7c8d9e01';
export const LISTING_2 = '7c0d9e8f-1a2b-4c3d-8e4f-5a6b7c8d9e02';
export const SELLER_1 = '3e2d1c0b-9a8f-4e7d-8c6b-5a4f3e2d1c01';

export function makeHit(overrides: Partial<SearchHit> = {}): SearchHit {
  return {
    type: 'listing',
    id: LISTING_1,
    partId: PART_NEW,
    title: 'Master cylinder assembly, late',
    primaryNumber: 'FV-26602',
    matchedNumber: 'FV-26602',
    fitNote: 'listed under replacement number FV-26602, two-way interchangeable',
    condition: 'nos',
    conditionLabel: 'New old stock (NOS)',
    priceCents: 18950,
    sellerId: SELLER_1,
    sellerName: 'Fernhollow Surplus',
    thumbnailUrl: null,
    inStock: true,
    quantity: 2,
    vehicleNames: ['Fictional FV-4 utility truck'],
    createdAt: '2026-03-02T10:00:00.000Z',
    score: 80,
    ...overrides,
  };
}

const emptyFacets = () => Object.fromEntries(facetNames.map((f) => [f, [] as FacetValue[]])) as Record<FacetName, FacetValue[]>;

export function makeReply(overrides: Partial<Omit<SearchReply, 'facets'>> & { facets?: Partial<Record<FacetName, FacetValue[]>> } = {}): SearchReply {
  const { facets, ...rest } = overrides;
  return {
    total: 2,
    totalIsEstimate: false,
    facetsAreEstimates: false,
    matchMode: 'number',
    corrections: [],
    hits: [
      makeHit(),
      makeHit({
        type: 'part',
        id: PART_OLD,
        partId: PART_OLD,
        title: 'Master cylinder assembly, early',
        primaryNumber: 'FV-20417',
        matchedNumber: 'FV-20417',
        fitNote: null,
        condition: null,
        conditionLabel: null,
        priceCents: null,
        sellerId: null,
        sellerName: null,
        quantity: null,
      }),
    ],
    nextCursor: null,
    didYouMean: [],
    ...rest,
    facets: {
      ...emptyFacets(),
      type: [
        { value: 'listing', label: 'Listings', count: 1 },
        { value: 'part', label: 'Catalog parts', count: 1 },
      ],
      condition: [
        { value: 'nos', label: 'New old stock (NOS)', count: 1 },
        { value: 'used_original', label: 'Used original', count: 3 },
      ],
      inStock: [
        { value: 'true', label: 'In stock', count: 4 },
        { value: 'false', label: 'Out of stock', count: 1 },
      ],
      ...facets,
    },
  };
}
