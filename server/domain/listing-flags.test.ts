import { describe, expect, it } from 'vitest';
import {
  assessPrice,
  computeFlags,
  hammingDistance64,
  hasBlockingFlag,
  isPriceOutlier,
  median,
  medianAbsoluteDeviation,
  toHash64,
  type ListingFlagsInput,
} from './listing-flags';

// A hash with a realistic mix of set bits (32 of 64).
const PHOTO_A = 'a5c3f00f5a3c0ff0';

function input(overrides: Partial<ListingFlagsInput> = {}, listing: Partial<ListingFlagsInput['listing']> = {}): ListingFlagsInput {
  return {
    listing: {
      condition: 'reproduction',
      priceCents: 2500,
      title: 'Wheel cylinder boot (fictional demo part DY-0001)',
      description: 'Demo listing.',
      ...listing,
    },
    isHydraulicRubber: false,
    restrictedCategory: false,
    comparablePricesCents: [],
    photoHashes: [],
    otherSellersPhotoHashes: [],
    sellerApprovedListingCount: 10,
    ...overrides,
  };
}

const codes = (i: ListingFlagsInput) => computeFlags(i).map((f) => f.code);

describe('median and medianAbsoluteDeviation', () => {
  it('when the count is odd, then the median is the middle value', () => {
    expect(median([5, 1, 3])).toBe(3);
  });

  it('when the count is even, then the median is the mean of the two middle values', () => {
    expect(median([4, 1, 3, 2])).toBe(2.5);
  });

  it('when the list is empty, then a clear error is thrown', () => {
    expect(() => median([])).toThrow(/empty/);
    expect(() => medianAbsoluteDeviation([])).toThrow(/empty/);
  });

  it('when a value is not finite, then a clear error is thrown', () => {
    expect(() => median([1, Number.NaN])).toThrow(/finite/);
  });

  it('when all values are equal, then the MAD is 0', () => {
    expect(medianAbsoluteDeviation([700, 700, 700])).toBe(0);
  });

  it('when more than half the values are equal, then the MAD is 0 even with an extreme value', () => {
    expect(medianAbsoluteDeviation([1200, 1200, 1200, 1200, 99_000])).toBe(0);
  });

  it('when there is a single value, then the MAD is 0', () => {
    expect(medianAbsoluteDeviation([42])).toBe(0);
  });

  it('when given the worked example, then the MAD is 2500', () => {
    expect(median([2000, 4000, 5000, 6000, 9000, 10000])).toBe(5500);
    expect(medianAbsoluteDeviation([2000, 4000, 5000, 6000, 9000, 10000])).toBe(2500);
  });
});

describe('isPriceOutlier', () => {
  const comparables = [2000, 4000, 5000, 6000, 9000, 10000];

  it('when a price deviates more than 3 MAD (7500) from the median 5500, then it is an outlier', () => {
    expect(isPriceOutlier(13_500, comparables)).toBe(true);
    expect(assessPrice(13_500, comparables)).toMatchObject({
      judged: true,
      medianCents: 5500,
      madCents: 2500,
      thresholdCents: 7500,
      deviationCents: 8000,
      direction: 'high',
    });
  });

  it('when a price deviates less than 3 MAD, then it is not an outlier', () => {
    expect(isPriceOutlier(12_500, comparables)).toBe(false);
  });

  it('when a price deviates exactly 3 MAD, then it is not an outlier (strictly greater)', () => {
    expect(isPriceOutlier(13_000, comparables)).toBe(false);
  });

  it('when fewer than 5 comparable prices exist, then no judgement is made', () => {
    expect(isPriceOutlier(1_000_000, [1000, 1000, 1000, 1000])).toBe(false);
    expect(assessPrice(1_000_000, [1000, 1000, 1000, 1000]).judged).toBe(false);
  });

  it('when MAD is 0, then only prices more than 50 % away from the median are outliers', () => {
    const same = [1200, 1200, 1200, 1200, 1500];
    expect(isPriceOutlier(1700, same)).toBe(false);
    expect(isPriceOutlier(1900, same)).toBe(true);
    expect(isPriceOutlier(500, same)).toBe(true);
    expect(isPriceOutlier(1200, same)).toBe(false);
  });

  it('when MAD is tiny, then a price a few cents off the median is not an outlier', () => {
    expect(isPriceOutlier(1010, [999, 1000, 1000, 1001, 1002])).toBe(false);
  });

  it('when the median is 0 (free items), then any positive price is an outlier', () => {
    expect(isPriceOutlier(1, [0, 0, 0, 0, 0])).toBe(true);
  });

  it('when a price is far below the usual, then it is an outlier in the low direction', () => {
    expect(assessPrice(100, [10_000, 11_000, 12_000, 13_000, 14_000])).toMatchObject({ outlier: true, direction: 'low' });
  });
});

describe('hammingDistance64', () => {
  it('when the hashes are equal, then the distance is 0', () => {
    expect(hammingDistance64(PHOTO_A, PHOTO_A)).toBe(0);
  });

  it('when hashes are given as bigint and hex, then both are accepted alike', () => {
    expect(hammingDistance64(0n, 'ffffffffffffffff')).toBe(64);
    expect(hammingDistance64(0b1011n, '0000000000000000')).toBe(3);
    expect(toHash64('00000000000000FF')).toBe(255n);
  });

  it('when a hash is malformed, then a clear error is thrown', () => {
    expect(() => hammingDistance64('abc', PHOTO_A)).toThrow(/16 hex characters/);
    expect(() => hammingDistance64(-1n, 0n)).toThrow(/64-bit/);
    expect(() => hammingDistance64(1n << 64n, 0n)).toThrow(/64-bit/);
  });
});

describe('computeFlags: hydraulic brake rubber', () => {
  for (const condition of ['nos', 'nors', 'used_original', 'core'] as const) {
    it(`when ${condition} hydraulic rubber is offered as serviceable, then it is blocked`, () => {
      const flags = computeFlags(input({ isHydraulicRubber: true }, { condition, rubberUse: 'serviceable' }));
      expect(flags[0]).toMatchObject({ code: 'rubber_brake_serviceable', severity: 'block' });
      expect(hasBlockingFlag(flags)).toBe(true);
    });
  }

  it('when original hydraulic rubber does not say how it may be used, then it is blocked too', () => {
    expect(codes(input({ isHydraulicRubber: true }, { condition: 'nos' }))).toContain('rubber_brake_serviceable');
  });

  it('when original hydraulic rubber is display only, then it is not flagged', () => {
    expect(codes(input({ isHydraulicRubber: true }, { condition: 'used_original', rubberUse: 'display_only' }))).toEqual([]);
  });

  it('when a reproduction hydraulic rubber part is serviceable, then it is not flagged', () => {
    expect(codes(input({ isHydraulicRubber: true }, { condition: 'reproduction', rubberUse: 'serviceable' }))).toEqual([]);
  });

  it('when a rebuilt hydraulic unit is serviceable, then the admin is asked to confirm the rubber was renewed', () => {
    const flags = computeFlags(input({ isHydraulicRubber: true }, { condition: 'rebuilt', rubberUse: 'serviceable' }));
    expect(flags).toMatchObject([{ code: 'rubber_rebuilt_confirm', severity: 'review' }]);
    expect(hasBlockingFlag(flags)).toBe(false);
  });

  it('when the part is not hydraulic rubber, then old stock offered for use is not flagged', () => {
    expect(codes(input({ isHydraulicRubber: false }, { condition: 'nos', rubberUse: 'serviceable' }))).toEqual([]);
  });
});

describe('computeFlags: other flags', () => {
  it('when the category is restricted, then it needs review', () => {
    const flags = computeFlags(input({ restrictedCategory: true }, { partCategory: 'weapon_mount' }));
    expect(flags).toMatchObject([{ code: 'restricted_category', severity: 'review', details: { partCategory: 'weapon_mount' } }]);
  });

  it('when the price is an outlier, then it needs review with the numbers in the details', () => {
    const flags = computeFlags(input({ comparablePricesCents: [2000, 4000, 5000, 6000, 9000, 10000] }, { priceCents: 13_500 }));
    expect(flags).toMatchObject([{ code: 'price_outlier', severity: 'review', details: { medianCents: 5500, madCents: 2500 } }]);
  });

  it('when a photo is within 6 bits of another seller photo, then it needs review', () => {
    const near = (toHash64(PHOTO_A) ^ 0b111111n).toString(16).padStart(16, '0'); // 6 bits off
    const flags = computeFlags(
      input({
        photoHashes: [PHOTO_A],
        otherSellersPhotoHashes: [{ listingId: 'L-2', sellerId: 'S-2', hash: near }],
      }),
    );
    expect(flags).toMatchObject([
      { code: 'photo_reused', severity: 'review', details: { matches: [{ photoIndex: 0, listingId: 'L-2', sellerId: 'S-2', distance: 6 }] } },
    ]);
  });

  it('when the nearest other photo is 7 bits away, then nothing is flagged', () => {
    const far = toHash64(PHOTO_A) ^ 0b1111111n;
    expect(codes(input({ photoHashes: [PHOTO_A], otherSellersPhotoHashes: [{ listingId: 'L-2', sellerId: 'S-2', hash: far }] }))).toEqual([]);
  });

  it("when the match is one of the seller's own listings, then it is ignored", () => {
    expect(
      codes(
        input({
          sellerId: 'S-1',
          photoHashes: [PHOTO_A],
          otherSellersPhotoHashes: [{ listingId: 'L-9', sellerId: 'S-1', hash: PHOTO_A }],
        }),
      ),
    ).toEqual([]);
  });

  it('when both photos are featureless (blank), then they are not called a match', () => {
    expect(
      codes(input({ photoHashes: ['0000000000000000'], otherSellersPhotoHashes: [{ listingId: 'L-2', sellerId: 'S-2', hash: 0n }] })),
    ).toEqual([]);
  });

  it('when the seller has fewer than 3 approved listings, then the listing needs review as a new seller', () => {
    expect(codes(input({ sellerApprovedListingCount: 0 }))).toEqual(['new_seller']);
    expect(codes(input({ sellerApprovedListingCount: 2 }))).toEqual(['new_seller']);
    expect(codes(input({ sellerApprovedListingCount: 3 }))).toEqual([]);
  });

  it('when several flags apply, then blocks come first', () => {
    const flags = computeFlags(
      input({ isHydraulicRubber: true, restrictedCategory: true, sellerApprovedListingCount: 0 }, { condition: 'nos', rubberUse: 'serviceable' }),
    );
    expect(flags.map((f) => f.code)).toEqual(['rubber_brake_serviceable', 'restricted_category', 'new_seller']);
  });
});

describe('computeFlags: bad input', () => {
  it('when the price is not integer cents, then a clear error is thrown', () => {
    expect(() => computeFlags(input({}, { priceCents: 12.5 }))).toThrow(/priceCents/);
    expect(() => computeFlags(input({}, { priceCents: -1 }))).toThrow(/priceCents/);
  });

  it('when the condition is unknown, then a clear error is thrown', () => {
    expect(() => computeFlags(input({}, { condition: 'mint' as never }))).toThrow(/condition/);
  });

  it('when a comparable price is negative, then a clear error is thrown', () => {
    expect(() => computeFlags(input({ comparablePricesCents: [1, 2, 3, 4, -5] }))).toThrow(/comparable/);
  });

  it('when a photo hash is malformed, then a clear error is thrown', () => {
    expect(() => computeFlags(input({ photoHashes: ['zz'] }))).toThrow(/hex/);
  });
});
