import { describe, expect, it } from 'vitest';
import {
  billableWeightGrams,
  dimensionalWeightKgMetric,
  dimensionalWeightLb,
  poundsToGramsCeil,
  shippingForSeller,
  shippingProfileSchema,
  type ShippingItem,
  type ShippingProfile,
} from './shipping';

const profile = (p: unknown): ShippingProfile => shippingProfileSchema.parse(p);

const item = (over: Partial<ShippingItem> = {}): ShippingItem => ({
  listingId: 'L-1',
  quantity: 1,
  unitPriceCents: 2500,
  weightGrams: 500,
  lengthMm: 100,
  widthMm: 100,
  heightMm: 50,
  ...over,
});

const US = { country: 'US' };

describe('shipping profile schema', () => {
  it('when a profile omits pickup and divisor, then the defaults are filled in', () => {
    const p = profile({ kind: 'flat_per_order', amountCents: 900, shipsTo: ['*'] });
    expect(p).toMatchObject({ pickupAvailable: false, dimDivisor: 'carrier_139' });
  });

  it('when a pickup-only profile has no ship-to list, then it ships nowhere and offers pickup', () => {
    expect(profile({ kind: 'pickup_only' })).toMatchObject({ shipsTo: [], pickupAvailable: true });
  });

  it('when bands are not strictly increasing, then the profile is rejected', () => {
    const r = shippingProfileSchema.safeParse({
      kind: 'weight_bands',
      shipsTo: ['US'],
      bands: [
        { upToGrams: 5000, amountCents: 900 },
        { upToGrams: 5000, amountCents: 1200 },
      ],
    });
    expect(r.success).toBe(false);
  });

  it('when a country code is lower case or money is fractional, then the profile is rejected', () => {
    expect(shippingProfileSchema.safeParse({ kind: 'flat_per_order', amountCents: 900, shipsTo: ['us'] }).success).toBe(false);
    expect(shippingProfileSchema.safeParse({ kind: 'flat_per_order', amountCents: 9.5, shipsTo: ['US'] }).success).toBe(false);
    expect(shippingProfileSchema.safeParse({ kind: 'per_item', firstItemCents: -1, additionalItemCents: 0, shipsTo: ['US'] }).success).toBe(false);
  });
});

describe('dimensional weight', () => {
  it('when sides are fractional, then each is rounded up to the inch before dividing', () => {
    // 11.2 x 11.2 x 11.2 -> 12 x 12 x 12 = 1728 in^3; / 139 = 12.4 -> 13 lb
    expect(dimensionalWeightLb(11.2, 11.2, 11.2)).toBe(13);
    expect(dimensionalWeightLb(12, 12, 12, 166)).toBe(11);
  });

  it('when a side is negative or the divisor is zero, then it throws', () => {
    expect(() => dimensionalWeightLb(-1, 2, 3)).toThrow(RangeError);
    expect(() => dimensionalWeightLb(1, 2, 3, 0)).toThrow(RangeError);
  });

  it('when metric, then cm^3 / 5000 gives kg', () => {
    expect(dimensionalWeightKgMetric(50, 40, 30)).toBe(12);
    expect(dimensionalWeightKgMetric(49.1, 40, 30)).toBe(12);
  });

  it('when converting pounds, then 1 lb is 453.59237 g rounded up to the gram', () => {
    expect(poundsToGramsCeil(1)).toBe(454);
    expect(poundsToGramsCeil(100)).toBe(45_360); // 45359.237
    expect(poundsToGramsCeil(100_000)).toBe(45_359_237);
  });
});

describe('billableWeightGrams', () => {
  it('when a box is light and bulky, then the dimensional weight is billed', () => {
    // 610 x 610 x 610 mm -> 25 x 25 x 25 in (24.02 rounds up) = 15625 in^3; /139 = 112.4 -> 113 lb
    const g = billableWeightGrams({ weightGrams: 2000, lengthMm: 610, widthMm: 610, heightMm: 610 });
    expect(g).toBe(poundsToGramsCeil(113));
  });

  it('when a part is small and dense, then its actual weight is billed', () => {
    expect(billableWeightGrams({ weightGrams: 9000, lengthMm: 200, widthMm: 150, heightMm: 100 })).toBe(9000);
  });

  it('when millimetres make whole inches, then no extra inch is added', () => {
    // 254 mm = 10 in exactly: 10 x 10 x 10 / 139 = 7.19 -> 8 lb
    expect(billableWeightGrams({ weightGrams: 0, lengthMm: 254, widthMm: 254, heightMm: 254 })).toBe(poundsToGramsCeil(8));
  });

  it('when the divisor is metric, then cm^3 / 5 gives grams', () => {
    // 500 x 400 x 300 mm = 60000 cm^3 -> 12 kg
    expect(billableWeightGrams({ weightGrams: 3000, lengthMm: 500, widthMm: 400, heightMm: 300 }, 'metric_5000')).toBe(12_000);
    // 401 mm rounds up to 41 cm
    expect(billableWeightGrams({ weightGrams: 0, lengthMm: 500, widthMm: 401, heightMm: 300 }, 'metric_5000')).toBe(12_300);
  });

  it('when dimensions are unknown (0), then only the actual weight counts', () => {
    expect(billableWeightGrams({ weightGrams: 700, lengthMm: 0, widthMm: 0, heightMm: 0 })).toBe(700);
  });

  it('when a weight is fractional or negative, then it throws', () => {
    expect(() => billableWeightGrams({ weightGrams: 1.5, lengthMm: 1, widthMm: 1, heightMm: 1 })).toThrow(/weightGrams/);
    expect(() => billableWeightGrams({ weightGrams: 1, lengthMm: -1, widthMm: 1, heightMm: 1 })).toThrow(/lengthMm/);
  });
});

describe('shippingForSeller', () => {
  const flat = profile({ kind: 'flat_per_order', amountCents: 1200, shipsTo: ['US', 'CA'] });
  const perItem = profile({ kind: 'per_item', firstItemCents: 800, additionalItemCents: 250, shipsTo: ['*'] });
  const bands = profile({
    kind: 'weight_bands',
    shipsTo: ['*'],
    bands: [
      { upToGrams: 2000, amountCents: 700 },
      { upToGrams: 10_000, amountCents: 1500 },
    ],
    overMaxCents: 4000,
  });

  it('when flat per order, then one charge covers every item', () => {
    const q = shippingForSeller(flat, [item(), item({ listingId: 'L-2', quantity: 3 })], US);
    expect(q).toMatchObject({ ok: true, amountCents: 1200 });
  });

  it('when per item, then the first unit and each further unit are charged', () => {
    const q = shippingForSeller(perItem, [item({ quantity: 2 }), item({ listingId: 'L-2' })], US);
    expect(q).toMatchObject({ ok: true, amountCents: 800 + 2 * 250 });
    if (q.ok) expect(q.explanation).toContain('2 more');
  });

  it('when weight bands, then the summed billable weight picks the band', () => {
    expect(shippingForSeller(bands, [item({ weightGrams: 1000, quantity: 2 })], US)).toMatchObject({ ok: true, amountCents: 700, billableGrams: 2000 });
    expect(shippingForSeller(bands, [item({ weightGrams: 1001, quantity: 2 })], US)).toMatchObject({ ok: true, amountCents: 1500 });
  });

  it('when heavier than the last band, then the over-max charge applies, or the seller refuses without one', () => {
    expect(shippingForSeller(bands, [item({ weightGrams: 12_000 })], US)).toMatchObject({ ok: true, amountCents: 4000 });
    const capped = profile({ kind: 'weight_bands', shipsTo: ['*'], bands: [{ upToGrams: 10_000, amountCents: 1500 }], overMaxCents: null });
    expect(shippingForSeller(capped, [item({ weightGrams: 12_000 })], US)).toMatchObject({ ok: false, reason: 'over_weight_limit' });
  });

  it('when a bulky box is light, then the band follows its dimensional weight', () => {
    // 610 mm cube: 113 lb dimensional, far over the 10 kg band
    expect(shippingForSeller(bands, [item({ weightGrams: 500, lengthMm: 610, widthMm: 610, heightMm: 610 })], US)).toMatchObject({ ok: true, amountCents: 4000 });
  });

  it('when the item subtotal reaches the free-above threshold, then shipping is free; one cent less, it is charged', () => {
    const free = profile({ kind: 'flat_per_order', amountCents: 1200, shipsTo: ['*'], freeAboveCents: 5000 });
    expect(shippingForSeller(free, [item({ unitPriceCents: 2500, quantity: 2 })], US)).toMatchObject({ ok: true, amountCents: 0 });
    expect(shippingForSeller(free, [item({ unitPriceCents: 2500 }), item({ listingId: 'L-2', unitPriceCents: 2499 })], US)).toMatchObject({
      ok: true,
      amountCents: 1200,
    });
  });

  it('when free shipping applies but the parcel is over the weight limit, then the seller still refuses', () => {
    const p = profile({ kind: 'weight_bands', shipsTo: ['*'], bands: [{ upToGrams: 1000, amountCents: 500 }], freeAboveCents: 100 });
    expect(shippingForSeller(p, [item({ weightGrams: 5000 })], US)).toMatchObject({ ok: false, reason: 'over_weight_limit' });
  });

  it('when the destination is not in ships-to, then it is refused; "*" ships anywhere', () => {
    expect(shippingForSeller(flat, [item()], { country: 'DE' })).toMatchObject({ ok: false, reason: 'does_not_ship_to' });
    expect(shippingForSeller(perItem, [item()], { country: 'DE' })).toMatchObject({ ok: true });
  });

  it('when the buyer picks up, then it costs nothing where pickup is offered and is refused elsewhere', () => {
    const withPickup = profile({ kind: 'flat_per_order', amountCents: 1200, shipsTo: ['US'], pickupAvailable: true });
    expect(shippingForSeller(withPickup, [item()], { pickup: true })).toMatchObject({ ok: true, amountCents: 0 });
    expect(shippingForSeller(flat, [item()], { pickup: true })).toMatchObject({ ok: false, reason: 'pickup_not_offered' });
    const showOnly = profile({ kind: 'pickup_only' });
    expect(shippingForSeller(showOnly, [item()], { pickup: true })).toMatchObject({ ok: true, amountCents: 0 });
    expect(shippingForSeller(showOnly, [item()], US)).toMatchObject({ ok: false, reason: 'pickup_only' });
  });

  it('when there are no items, then nothing is charged', () => {
    expect(shippingForSeller(flat, [], US)).toMatchObject({ ok: true, amountCents: 0 });
  });

  it('when input is bad, then a RangeError names the field', () => {
    expect(() => shippingForSeller(flat, [item({ quantity: 0 })], US)).toThrow(/quantity/);
    expect(() => shippingForSeller(flat, [item({ unitPriceCents: 1.5 })], US)).toThrow(/unitPriceCents/);
    expect(() => shippingForSeller(flat, [item()], { country: 'usa' })).toThrow(/country/);
    expect(() => shippingForSeller({ kind: 'flat_per_order', amountCents: -5, shipsTo: ['US'] } as unknown as ShippingProfile, [item()], US)).toThrow(
      /invalid shipping profile/,
    );
    expect(() => shippingForSeller({ kind: 'flat_per_order', amountCents: 5, shipsTo: ['US'] } as unknown as ShippingProfile, [item()], US)).toThrow(
      /defaults/,
    );
  });
});
