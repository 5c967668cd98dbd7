import { z } from 'zod';
import { cleanQueryText } from './text';

/** Search request and reply shapes, shared by the server's validation and the client's search page. */

export const searchConditions = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'] as const;
export const searchOriginalities = ['original', 'period_replacement', 'reproduction'] as const;
export const priceBands = ['under_10', '10_50', '50_200', '200_1000', 'over_1000'] as const;
export const searchSorts = ['relevance', 'price_asc', 'price_desc', 'newest'] as const;
export const searchHitTypes = ['part', 'listing'] as const;
export const facetNames = ['type', 'vehicle', 'system', 'assembly', 'condition', 'originality', 'seller', 'price', 'shipsTo', 'pickup', 'hasPhotos', 'inStock'] as const;
export type FacetName = (typeof facetNames)[number];

export const SEARCH_QUERY_MAX_LENGTH = 200;
const MAX_VALUES = 20;
const MAX_PRICE_CENTS = 100_000_000;


/** A parameter that may be repeated (`?condition=nos&condition=nors`) or given once. */
const many = <T extends z.ZodType>(item: T, name: string) =>
  z.preprocess(
    (v) => (v === undefined || v === '' ? [] : Array.isArray(v) ? v : [v]),
    z.array(item).max(MAX_VALUES, `At most ${MAX_VALUES} ${name} values`),
  );

const slug = z.string().regex(/^[a-z0-9-]{1,80}$/, 'Not a valid slug');
const flag = z.enum(['true', 'false']).transform((v) => v === 'true');
const cents = z.coerce.number({ error: 'Give a whole number of cents' }).int('Give a whole number of cents').min(0).max(MAX_PRICE_CENTS);

export const searchQuery = z
  .object({
    q: z
      .string()
      .max(SEARCH_QUERY_MAX_LENGTH * 2, `A search is at most ${SEARCH_QUERY_MAX_LENGTH} characters`)
      .transform(cleanQueryText)
      .pipe(z.string().max(SEARCH_QUERY_MAX_LENGTH, `A search is at most ${SEARCH_QUERY_MAX_LENGTH} characters`))
      .optional(),
    type: z.enum(searchHitTypes).optional(),
    vehicle: many(slug, 'vehicle'),
    system: many(slug, 'system'),
    assembly: many(slug, 'assembly'),
    condition: many(z.enum(searchConditions), 'condition'),
    originality: many(z.enum(searchOriginalities), 'originality'),
    seller: many(z.uuid('Not a valid seller id'), 'seller'),
    price: many(z.enum(priceBands), 'price band'),
    priceMin: cents.optional(),
    priceMax: cents.optional(),
    shipsTo: many(
      z
        .string()
        .regex(/^[A-Za-z]{2}$/, 'Use a two-letter country code')
        .transform((c) => c.toUpperCase()),
      'country',
    ),
    pickup: flag.optional(),
    hasPhotos: flag.optional(),
    inStock: flag.optional(),
    sort: z.enum(searchSorts).optional(),
    cursor: z
      .string()
      .max(600)
      .regex(/^[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+$/, 'Not a valid cursor')
      .optional(),
    limit: z.coerce.number().int().min(1).max(50).default(24),
  })
  .strict()
  .refine((v) => v.priceMin === undefined || v.priceMax === undefined || v.priceMin <= v.priceMax, {
    message: 'priceMin must not be above priceMax',
    path: ['priceMin'],
  })
  .refine((v) => !(v.type === 'part' && (v.sort === 'price_asc' || v.sort === 'price_desc')), {
    message: 'Catalog parts have no price: sort them by relevance or newest',
    path: ['sort'],
  });
export type SearchQuery = z.infer<typeof searchQuery>;

export const suggestQuery = z
  .object({
    q: z
      .string()
      .max(200, 'A search is at most 100 characters')
      .transform(cleanQueryText)
      .pipe(z.string().min(1, 'Type something').max(100, 'A search is at most 100 characters')),
  })
  .strict();

export interface SearchHit {
  type: 'listing' | 'part';
  /** Listing id for a listing, part id for a part. */
  id: string;
  partId: string | null;
  title: string;
  primaryNumber: string | null;
  /** The number the hit was found under (for number searches). */
  matchedNumber: string | null;
  /** How a hit found through a supersession or a near number relates to what was typed. */
  fitNote: string | null;
  condition: (typeof searchConditions)[number] | null;
  conditionLabel: string | null;
  priceCents: number | null;
  sellerId: string | null;
  sellerName: string | null;
  thumbnailUrl: string | null;
  inStock: boolean;
  quantity: number | null;
  vehicleNames: string[];
  createdAt: string;
  score: number;
}

export interface FacetValue {
  value: string;
  label: string;
  count: number;
}

export interface SearchReply {
  total: number;
  /** True when the match set was too large to count row by row: total and facet counts come from a fixed sample. */
  totalIsEstimate: boolean;
  facetsAreEstimates: boolean;
  /** 'all': every word matched; 'any': nothing matched every word, so hits match some of them. */
  matchMode: 'all' | 'any' | 'number' | 'browse';
  /** Typed words that were not in the catalog's vocabulary and the words searched for instead. */
  corrections: Array<{ from: string; to: string }>;
  hits: SearchHit[];
  facets: Record<FacetName, FacetValue[]>;
  nextCursor: string | null;
  /** Close part numbers (by trigram similarity) when nothing was found. */
  didYouMean: Array<{ number: string; partId: string }>;
}

export interface Suggestion {
  type: 'part' | 'number';
  partId: string;
  number: string | null;
  name: string;
  matchedBy: 'number_prefix' | 'name';
}

export interface SuggestReply {
  suggestions: Suggestion[];
}
