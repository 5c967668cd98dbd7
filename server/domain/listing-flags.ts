/**
 * Automatic flags shown to administrators when they review a listing. Pure: the caller gathers the
 * comparable prices, the other sellers' photo hashes and the seller's history.
 *
 * A 'block' flag means the listing cannot be approved as it stands; a 'review' flag asks the administrator
 * to look before approving.
 */
import { isAgedStock, isCondition, type Condition, type RubberUse } from './conditions';

export type FlagSeverity = 'block' | 'review';

export const flagCodes = [
  'rubber_brake_serviceable',
  'rubber_rebuilt_confirm',
  'restricted_category',
  'price_outlier',
  'photo_reused',
  'new_seller',
] as const;
export type FlagCode = (typeof flagCodes)[number];

export interface ListingFlag {
  code: FlagCode;
  severity: FlagSeverity;
  message: string;
  details: Record<string, unknown>;
}

/** A 64-bit difference hash, as a bigint or 16 hex characters. */
export type Hash64 = bigint | string;

export interface ListingFlagsInput {
  listing: {
    condition: Condition;
    rubberUse?: RubberUse | null;
    partCategory?: string | null;
    safetyClass?: string | null;
    priceCents: number;
    title: string;
    description: string;
  };
  /** The part is hydraulic brake rubber (hose, cylinder cup, boot) or a unit containing it. */
  isHydraulicRubber: boolean;
  /** The part's category needs extra review (weapon mounts and similar). */
  restrictedCategory: boolean;
  /** The same part's other listed or sold prices, in cents. */
  comparablePricesCents: readonly number[];
  photoHashes: readonly Hash64[];
  otherSellersPhotoHashes: ReadonlyArray<{ listingId: string; sellerId: string; hash: Hash64 }>;
  /** Approved listings the seller already has, not counting this one. */
  sellerApprovedListingCount: number;
  /** When given, hashes from this seller's own listings are ignored (reusing your own photo is fine). */
  sellerId?: string;
}

// --- statistics -------------------------------------------------------------------------------------

function assertFiniteNumbers(values: readonly number[], name: string): void {
  if (!Array.isArray(values)) throw new TypeError(`${name} must be an array of numbers`);
  for (const v of values) {
    if (typeof v !== 'number' || !Number.isFinite(v)) throw new TypeError(`${name} must contain only finite numbers, got ${String(v)}`);
  }
}

/** Median of a non-empty list; the mean of the two middle values for an even count. */
export function median(values: readonly number[]): number {
  assertFiniteNumbers(values, 'median input');
  if (values.length === 0) throw new RangeError('median of an empty list is undefined');
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Median absolute deviation from the median (unscaled: no 1.4826 factor). */
export function medianAbsoluteDeviation(values: readonly number[]): number {
  const m = median(values);
  return median(values.map((v) => Math.abs(v - m)));
}

/** Fewer comparable prices than this and no price judgement is made. */
export const MIN_COMPARABLE_PRICES = 5;
/** Deviation from the median, in MADs, beyond which a price is an outlier. */
export const OUTLIER_MAD_MULTIPLIER = 3;
/**
 * Deviation from the median, as a share of the median, that a price must also exceed. This is what handles
 * MAD = 0 (most comparables at one price: flag only prices more than 50 % off it) and a tiny MAD (a few cents of
 * spread would otherwise flag a price a few cents off). Common practice, no published source: old parts sell
 * over a wide range, and half again or half off the usual price is where a listing is worth a second look.
 */
export const OUTLIER_MIN_RELATIVE_DEVIATION = 0.5;

export interface PriceAssessment {
  /** False when there were too few comparables to judge. */
  judged: boolean;
  outlier: boolean;
  comparableCount: number;
  medianCents: number | null;
  madCents: number | null;
  /** The deviation from the median the price must exceed to be an outlier. */
  thresholdCents: number | null;
  deviationCents: number | null;
  direction: 'high' | 'low' | null;
}

/**
 * Outlier rule: with at least 5 comparables, a price is an outlier when
 * |price - median| > max(3 * MAD, 0.5 * median).
 *
 * Worked example: comparables 2000, 4000, 5000, 6000, 9000, 10000 cents. Median 5500; absolute deviations
 * 3500, 1500, 500, 500, 3500, 4500, whose median (the MAD) is 2500. Threshold max(7500, 2750) = 7500.
 * A price of 13500 deviates by 8000 and is flagged; 12500 deviates by 7000 and is not.
 * MAD = 0 example: comparables 1200 x 4 and 1500: median 1200, MAD 0, threshold 600; 1900 is flagged, 1700 not.
 */
export function assessPrice(priceCents: number, comparablePricesCents: readonly number[]): PriceAssessment {
  if (typeof priceCents !== 'number' || !Number.isFinite(priceCents)) throw new TypeError(`priceCents must be a finite number, got ${String(priceCents)}`);
  assertFiniteNumbers(comparablePricesCents, 'comparablePricesCents');
  const count = comparablePricesCents.length;
  if (count < MIN_COMPARABLE_PRICES) {
    return { judged: false, outlier: false, comparableCount: count, medianCents: null, madCents: null, thresholdCents: null, deviationCents: null, direction: null };
  }
  const m = median(comparablePricesCents);
  const mad = medianAbsoluteDeviation(comparablePricesCents);
  const threshold = Math.max(OUTLIER_MAD_MULTIPLIER * mad, OUTLIER_MIN_RELATIVE_DEVIATION * m);
  const deviation = Math.abs(priceCents - m);
  const outlier = deviation > threshold;
  return {
    judged: true,
    outlier,
    comparableCount: count,
    medianCents: m,
    madCents: mad,
    thresholdCents: threshold,
    deviationCents: deviation,
    direction: priceCents > m ? 'high' : priceCents < m ? 'low' : null,
  };
}

export function isPriceOutlier(priceCents: number, comparablePricesCents: readonly number[]): boolean {
  return assessPrice(priceCents, comparablePricesCents).outlier;
}

// --- photo hashes -----------------------------------------------------------------------------------

const MAX_64 = (1n << 64n) - 1n;

/** Parses a 64-bit hash given as a bigint or 16 hex characters. */
export function toHash64(hash: Hash64): bigint {
  if (typeof hash === 'bigint') {
    if (hash < 0n || hash > MAX_64) throw new RangeError('a 64-bit hash must be between 0 and 2^64 - 1');
    return hash;
  }
  if (typeof hash !== 'string' || !/^[0-9a-f]{16}$/i.test(hash)) {
    throw new TypeError(`a 64-bit hash must be 16 hex characters, got ${JSON.stringify(hash)}`);
  }
  return BigInt(`0x${hash}`);
}

function popcount64(x: bigint): number {
  let count = 0;
  let v = x;
  while (v) {
    v &= v - 1n;
    count++;
  }
  return count;
}

/** Number of differing bits between two 64-bit hashes (0..64). */
export function hammingDistance64(a: Hash64, b: Hash64): number {
  return popcount64(toHash64(a) ^ toHash64(b));
}

/** At or below this many differing bits (of 64), two photos count as the same picture. */
export const PHOTO_REUSE_MAX_DISTANCE = 6;
/**
 * Hashes with fewer than this many set bits, or more than 64 minus it, come from near-featureless images
 * (a blank wall, a plain gradient). Any two such hashes sit close together, so they prove nothing and are
 * not compared. Common practice, no published source.
 */
export const MIN_HASH_FEATURE_BITS = 8;

function isFeatureless(hash: bigint): boolean {
  const bits = popcount64(hash);
  return bits < MIN_HASH_FEATURE_BITS || bits > 64 - MIN_HASH_FEATURE_BITS;
}

// --- flags --------------------------------------------------------------------------------------------

/** Listings a seller has approved before their listings stop being flagged as new. */
export const NEW_SELLER_LISTING_COUNT = 3;

function assertInput(input: ListingFlagsInput): void {
  if (input == null || typeof input !== 'object' || input.listing == null) throw new TypeError('computeFlags needs an input with a listing');
  const { listing } = input;
  if (!isCondition(listing.condition)) throw new TypeError(`Unknown listing condition: ${JSON.stringify(listing.condition)}`);
  if (listing.rubberUse != null && listing.rubberUse !== 'serviceable' && listing.rubberUse !== 'display_only') {
    throw new TypeError(`Unknown rubber use: ${JSON.stringify(listing.rubberUse)}`);
  }
  if (!Number.isSafeInteger(listing.priceCents) || listing.priceCents < 0) {
    throw new RangeError(`priceCents must be a non-negative integer, got ${String(listing.priceCents)}`);
  }
  for (const p of input.comparablePricesCents) {
    if (!Number.isSafeInteger(p) || p < 0) throw new RangeError(`comparable prices must be non-negative integer cents, got ${String(p)}`);
  }
  if (!Number.isSafeInteger(input.sellerApprovedListingCount) || input.sellerApprovedListingCount < 0) {
    throw new RangeError(`sellerApprovedListingCount must be a non-negative integer, got ${String(input.sellerApprovedListingCount)}`);
  }
}

function rubberFlags(input: ListingFlagsInput): ListingFlag[] {
  if (!input.isHydraulicRubber) return [];
  const { condition, rubberUse } = input.listing;
  const offeredForUse = rubberUse !== 'display_only';
  // source: /work/shared/DOMAIN.md, "Safety rules of the trade" (common practice): hydraulic brake rubber ages
  // even unused, so old rubber (NOS, NORS, used, core) is display / authenticity only, never serviceable.
  // Reproductions are new today and may be serviceable.
  if (isAgedStock(condition) && offeredForUse) {
    return [
      {
        code: 'rubber_brake_serviceable',
        severity: 'block',
        message:
          'Old hydraulic brake rubber cannot be offered for use: it ages even unused. List it as display / authenticity only.',
        details: { condition, rubberUse: rubberUse ?? null, requiredRubberUse: 'display_only' },
      },
    ];
  }
  // A rebuilt unit is acceptable for use only if every rubber part was renewed in the rebuild: the admin checks.
  if (condition === 'rebuilt' && offeredForUse) {
    return [
      {
        code: 'rubber_rebuilt_confirm',
        severity: 'review',
        message: 'Rebuilt hydraulic brake unit offered for use: confirm the description says all rubber parts were renewed.',
        details: { condition, rubberUse: rubberUse ?? null },
      },
    ];
  }
  return [];
}

function priceFlags(input: ListingFlagsInput): ListingFlag[] {
  const a = assessPrice(input.listing.priceCents, input.comparablePricesCents);
  if (!a.outlier) return [];
  return [
    {
      code: 'price_outlier',
      severity: 'review',
      message: `Price is far ${a.direction === 'high' ? 'above' : 'below'} the usual for this part (median of ${a.comparableCount} comparable prices).`,
      details: {
        priceCents: input.listing.priceCents,
        medianCents: a.medianCents,
        madCents: a.madCents,
        thresholdCents: a.thresholdCents,
        deviationCents: a.deviationCents,
        direction: a.direction,
        comparableCount: a.comparableCount,
      },
    },
  ];
}

function photoFlags(input: ListingFlagsInput): ListingFlag[] {
  const others = input.otherSellersPhotoHashes
    .filter((o) => input.sellerId === undefined || o.sellerId !== input.sellerId)
    .map((o) => ({ ...o, value: toHash64(o.hash) }))
    .filter((o) => !isFeatureless(o.value));
  const matches: Array<{ photoIndex: number; listingId: string; sellerId: string; distance: number }> = [];
  input.photoHashes.forEach((hash, photoIndex) => {
    const own = toHash64(hash);
    if (isFeatureless(own)) return;
    for (const other of others) {
      const distance = popcount64(own ^ other.value);
      if (distance <= PHOTO_REUSE_MAX_DISTANCE) matches.push({ photoIndex, listingId: other.listingId, sellerId: other.sellerId, distance });
    }
  });
  if (matches.length === 0) return [];
  matches.sort((x, y) => x.distance - y.distance || x.photoIndex - y.photoIndex);
  const photos = new Set(matches.map((m) => m.photoIndex)).size;
  const sellers = new Set(matches.map((m) => m.sellerId)).size;
  return [
    {
      code: 'photo_reused',
      severity: 'review',
      message: `${photos} photo${photos === 1 ? '' : 's'} closely match${photos === 1 ? 'es' : ''} photos in another seller's listings (${sellers} seller${sellers === 1 ? '' : 's'}).`,
      details: { matches, maxDistance: PHOTO_REUSE_MAX_DISTANCE },
    },
  ];
}

export function computeFlags(input: ListingFlagsInput): ListingFlag[] {
  assertInput(input);
  const flags: ListingFlag[] = [...rubberFlags(input)];
  if (input.restrictedCategory) {
    flags.push({
      code: 'restricted_category',
      severity: 'review',
      message: 'Restricted category (weapon mounts and similar): check that nothing live or regulated is offered and the listing is lawful.',
      details: { partCategory: input.listing.partCategory ?? null },
    });
  }
  flags.push(...priceFlags(input), ...photoFlags(input));
  if (input.sellerApprovedListingCount < NEW_SELLER_LISTING_COUNT) {
    flags.push({
      code: 'new_seller',
      severity: 'review',
      message: `New seller: this is among their first ${NEW_SELLER_LISTING_COUNT} listings.`,
      details: { sellerApprovedListingCount: input.sellerApprovedListingCount },
    });
  }
  // Blocks first so the reviewer sees them at the top.
  return flags.sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'block' ? -1 : 1));
}

/** A listing with any block flag cannot be approved. */
export function hasBlockingFlag(flags: readonly ListingFlag[]): boolean {
  return flags.some((f) => f.severity === 'block');
}
