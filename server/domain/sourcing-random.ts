import type { ShippingProfile } from './shipping';
import {
  listingConditions,
  sourcingPolicies,
  type CandidateListing,
  type SourcingInput,
  type SourcingNeed,
} from './sourcing-plan';

/*
 * Seeded random sourcing instances for the tests and the plan benchmark. All data is fictional: invented
 * part ids, seller ids and prices.
 */

/** mulberry32: small, fast, seedable; good enough for test data (not for anything secret). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface RandomInstanceOptions {
  needs: number;
  /** Listings per need's own part: 1..candidatesPerNeed each. */
  candidatesPerNeed: number;
  /** Exactly candidatesPerNeed listings per need instead of 1..candidatesPerNeed. */
  fixedCandidates?: boolean;
  sellers: number;
  maxQuantity: number;
  maxAvailable: number;
  /** Chance that a need also accepts another need's part (stock shared between needs). */
  shareChance: number;
  /** Chance that a need's policy is not 'any' (policies, conditions and cores then matter). */
  policyChance: number;
  destination?: SourcingInput['destination'];
}

export function randomSourcingInstance(seed: number, o: RandomInstanceOptions): SourcingInput {
  const rnd = seededRandom(seed);
  const int = (lo: number, hi: number) => lo + Math.floor(rnd() * (hi - lo + 1));
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)];
  const destination = o.destination ?? { country: 'US' };

  const sellers: Record<string, { profile: ShippingProfile }> = {};
  for (let s = 0; s < o.sellers; s++) {
    const base = {
      freeAboveCents: rnd() < 0.3 ? int(5, 40) * 1000 : null,
      shipsTo: rnd() < 0.85 ? ['*'] : pick([['US'], ['CA'], ['US', 'CA'], ['DE']]),
      pickupAvailable: rnd() < 0.5,
      dimDivisor: pick(['carrier_139', 'retail_166', 'metric_5000'] as const),
    };
    const kind = rnd();
    let profile: ShippingProfile;
    if (kind < 0.3) profile = { kind: 'flat_per_order', amountCents: int(4, 25) * 100, ...base };
    else if (kind < 0.6) profile = { kind: 'per_item', firstItemCents: int(4, 15) * 100, additionalItemCents: int(0, 6) * 100, ...base };
    else if (kind < 0.95) {
      profile = {
        kind: 'weight_bands',
        bands: [
          { upToGrams: 2000, amountCents: int(4, 9) * 100 },
          { upToGrams: 10_000, amountCents: int(10, 19) * 100 },
          { upToGrams: 30_000, amountCents: int(20, 45) * 100 },
        ],
        overMaxCents: rnd() < 0.7 ? int(50, 90) * 100 : null,
        ...base,
      };
    } else profile = { kind: 'pickup_only', ...base, shipsTo: [], pickupAvailable: true };
    sellers[`SELLER-${String(s).padStart(3, '0')}`] = { profile };
  }
  const sellerIds = Object.keys(sellers);

  const needs: SourcingNeed[] = [];
  const listings: CandidateListing[] = [];
  for (let n = 0; n < o.needs; n++) {
    const partId = `PART-${String(n).padStart(3, '0')}`;
    const policy = rnd() < o.policyChance ? pick(sourcingPolicies) : 'any';
    needs.push({ needId: `NEED-${String(n).padStart(3, '0')}`, partId, quantity: int(1, o.maxQuantity), policy });
    const count = o.fixedCandidates ? o.candidatesPerNeed : int(1, o.candidatesPerNeed);
    const heavy = rnd() < 0.3;
    for (let c = 0; c < count; c++) {
      listings.push({
        listingId: `LST-${String(n).padStart(3, '0')}-${c}`,
        sellerId: pick(sellerIds),
        partId,
        condition: o.policyChance > 0 ? pick(listingConditions) : pick(['nos', 'used_original', 'reproduction'] as const),
        priceCents: int(3, 250) * 100 + int(0, 99),
        available: int(1, o.maxAvailable),
        weightGrams: heavy ? int(3000, 25_000) : int(50, 2500),
        lengthMm: heavy ? int(300, 1200) : int(20, 400),
        widthMm: heavy ? int(200, 600) : int(20, 300),
        heightMm: heavy ? int(100, 500) : int(10, 200),
      });
    }
  }
  for (let n = 0; n < o.needs; n++) {
    if (o.needs > 1 && rnd() < o.shareChance) {
      const other = (n + 1 + Math.floor(rnd() * (o.needs - 1))) % o.needs;
      needs[n].acceptedPartIds = [needs[other].partId];
    }
  }
  return { needs, listings, sellers, destination };
}
