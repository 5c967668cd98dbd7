import { describe, expect, it } from 'vitest';
import { shippingForSeller, shippingProfileSchema, type ShippingItem, type ShippingProfileInput } from './shipping';
import { bruteForceSourcing } from './sourcing-brute-force';
import {
  planSourcing,
  POLICY_CONDITIONS,
  type CandidateListing,
  type SourcingInput,
  type SourcingNeed,
  type SourcingPlan,
} from './sourcing-plan';
import { randomSourcingInstance, seededRandom } from './sourcing-random';

// Fictional sellers, parts and prices.
const seller = (p: ShippingProfileInput) => ({ profile: shippingProfileSchema.parse(p) });
const flat = (amountCents: number, extra: Partial<ShippingProfileInput> = {}) =>
  seller({ kind: 'flat_per_order', amountCents, shipsTo: ['*'], ...extra } as ShippingProfileInput);

let listingSeq = 0;
const listing = (over: Partial<CandidateListing> & Pick<CandidateListing, 'sellerId' | 'partId' | 'priceCents'>): CandidateListing => ({
  listingId: `LST-${String(++listingSeq).padStart(4, '0')}`,
  condition: 'used_original',
  available: 5,
  weightGrams: 500,
  lengthMm: 100,
  widthMm: 100,
  heightMm: 100,
  ...over,
});
const need = (needId: string, partId: string, over: Partial<SourcingNeed> = {}): SourcingNeed => ({
  needId,
  partId,
  quantity: 1,
  policy: 'any',
  ...over,
});
const US = { country: 'US' } as const;

/** Re-prices a plan from scratch and checks every promise it makes. */
function checkPlan(input: SourcingInput, plan: SourcingPlan): void {
  const byId = new Map(input.listings.map((l) => [l.listingId, l]));
  const used = new Map<string, number>();
  const perNeed = new Map<string, number>();
  const bySeller = new Map<string, ShippingItem[]>();
  for (const a of plan.assignments) {
    const l = byId.get(a.listingId);
    const n = input.needs.find((x) => x.needId === a.needId);
    expect(l && n).toBeTruthy();
    if (!l || !n) continue;
    expect([n.partId, ...(n.acceptedPartIds ?? [])]).toContain(l.partId);
    expect(POLICY_CONDITIONS[n.policy]).toContain(l.condition);
    expect(a.unitPriceCents).toBe(l.priceCents);
    used.set(l.listingId, (used.get(l.listingId) ?? 0) + a.quantity);
    perNeed.set(n.needId, (perNeed.get(n.needId) ?? 0) + a.quantity);
    const items = bySeller.get(l.sellerId) ?? [];
    items.push({ ...l, quantity: a.quantity, unitPriceCents: l.priceCents });
    bySeller.set(l.sellerId, items);
  }
  for (const [id, q] of used) expect(q).toBeLessThanOrEqual(byId.get(id)?.available ?? 0);
  for (const n of input.needs) {
    const missing = plan.unfilled.find((u) => u.needId === n.needId)?.missing ?? 0;
    expect((perNeed.get(n.needId) ?? 0) + missing).toBe(n.quantity);
  }
  let total = 0;
  for (const [sellerId, items] of bySeller) {
    const q = shippingForSeller(input.sellers[sellerId].profile, items, input.destination);
    expect(q.ok).toBe(true);
    if (q.ok) total += q.amountCents;
    total += items.reduce((a, it) => a + it.quantity * it.unitPriceCents, 0);
  }
  expect(plan.totalCents).toBe(total);
  expect(plan.lowerBoundCents).toBeLessThanOrEqual(plan.totalCents);
}

const missingUnits = (plan: SourcingPlan) => plan.unfilled.reduce((a, u) => a + u.missing, 0);

describe('planSourcing against exhaustive search', () => {
  it('when instances are small and random, then the plan costs exactly the optimum', () => {
    let exact = 0;
    for (let seed = 1; seed <= 250; seed++) {
      const input = randomSourcingInstance(seed, {
        needs: 1 + (seed % 6),
        candidatesPerNeed: 3,
        sellers: 2 + (seed % 4),
        maxQuantity: 3,
        maxAvailable: 3,
        shareChance: 0.3,
        policyChance: 0.5,
        destination: seed % 10 === 0 ? { pickup: true } : { country: seed % 7 === 0 ? 'CA' : 'US' },
      });
      const plan = planSourcing(input);
      const best = bruteForceSourcing(input);
      expect({ seed, missing: missingUnits(plan), total: plan.totalCents }).toEqual({ seed, missing: best.unfilledUnits, total: best.totalCents });
      checkPlan(input, plan);
      if (plan.method === 'exact') exact++;
    }
    expect(exact).toBe(250);
  });

  it('when the search is not allowed to branch, then the heuristic alone still gives a sound plan and an honest bound', () => {
    for (let seed = 300; seed < 340; seed++) {
      const input = randomSourcingInstance(seed, { needs: 6, candidatesPerNeed: 3, sellers: 4, maxQuantity: 2, maxAvailable: 3, shareChance: 0.2, policyChance: 0.3 });
      const plan = planSourcing({ ...input, options: { maxNodes: 0 } });
      const best = bruteForceSourcing(input);
      checkPlan(input, plan);
      expect(plan.method).toBe('heuristic');
      // A heuristic may fill less when needs compete for stock; never more, and never cheaper at equal fill.
      expect(missingUnits(plan)).toBeGreaterThanOrEqual(best.unfilledUnits);
      if (missingUnits(plan) === best.unfilledUnits) expect(plan.totalCents).toBeGreaterThanOrEqual(best.totalCents);
      if (best.unfilledUnits === 0) expect(plan.lowerBoundCents).toBeLessThanOrEqual(best.totalCents);
      expect(plan.gapCents).toBe(plan.totalCents - plan.lowerBoundCents);
    }
  });
});

describe('planSourcing by hand', () => {
  it('when one seller has everything, then buying there beats the cheapest items plus two shipping charges', () => {
    const input: SourcingInput = {
      needs: [need('N-1', 'PART-A'), need('N-2', 'PART-B')],
      listings: [
        listing({ listingId: 'ONE-A', sellerId: 'S-ONE', partId: 'PART-A', priceCents: 1000 }),
        listing({ listingId: 'ONE-B', sellerId: 'S-ONE', partId: 'PART-B', priceCents: 1000 }),
        listing({ listingId: 'CHEAP-A', sellerId: 'S-A', partId: 'PART-A', priceCents: 900 }),
        listing({ listingId: 'CHEAP-B', sellerId: 'S-B', partId: 'PART-B', priceCents: 900 }),
      ],
      sellers: { 'S-ONE': flat(1500), 'S-A': flat(1500), 'S-B': flat(1500) },
      destination: US,
    };
    const plan = planSourcing(input);
    expect(plan.assignments.map((a) => a.listingId)).toEqual(['ONE-A', 'ONE-B']);
    expect(plan).toMatchObject({ totalCents: 3500, shippingCents: 1500, method: 'exact', optimal: true, gapCents: 0 });
    expect(plan.perSeller).toEqual([{ sellerId: 'S-ONE', itemsCents: 2000, shippingCents: 1500, shippingExplanation: expect.stringContaining('Flat') }]);
  });

  it('when a dearer item lifts a seller over its free-shipping threshold, then the plan takes it', () => {
    const input: SourcingInput = {
      needs: [need('N-1', 'PART-A'), need('N-2', 'PART-B')],
      listings: [
        listing({ listingId: 'FREE-A', sellerId: 'S-FREE', partId: 'PART-A', priceCents: 3000 }),
        listing({ listingId: 'FREE-B', sellerId: 'S-FREE', partId: 'PART-B', priceCents: 2100 }),
        listing({ listingId: 'OTHER-B', sellerId: 'S-OTHER', partId: 'PART-B', priceCents: 1500 }),
      ],
      sellers: { 'S-FREE': flat(1200, { freeAboveCents: 5000 }), 'S-OTHER': flat(300) },
      destination: US,
    };
    // Free seller alone: 5100, free shipping. Split: 3000 + 1200 + 1500 + 300 = 6000.
    const plan = planSourcing(input);
    expect(plan.assignments.map((a) => a.listingId)).toEqual(['FREE-A', 'FREE-B']);
    expect(plan.totalCents).toBe(5100);
    expect(plan.perSeller[0].shippingExplanation).toMatch(/Free shipping/);
  });

  it('when weight bands make one heavy parcel dear, then the plan splits the heavy parts across sellers', () => {
    const bands = seller({
      kind: 'weight_bands',
      shipsTo: ['*'],
      bands: [
        { upToGrams: 10_000, amountCents: 1000 },
        { upToGrams: 20_000, amountCents: 6000 },
      ],
      overMaxCents: null,
    });
    const heavy = { weightGrams: 8000, lengthMm: 200, widthMm: 200, heightMm: 200 };
    const input: SourcingInput = {
      needs: [need('N-1', 'HUB-L'), need('N-2', 'HUB-R')],
      listings: [
        listing({ listingId: 'B-L', sellerId: 'S-BANDS', partId: 'HUB-L', priceCents: 5000, ...heavy }),
        listing({ listingId: 'B-R', sellerId: 'S-BANDS', partId: 'HUB-R', priceCents: 5000, ...heavy }),
        listing({ listingId: 'F-R', sellerId: 'S-FLAT', partId: 'HUB-R', priceCents: 5500, ...heavy }),
      ],
      sellers: { 'S-BANDS': bands, 'S-FLAT': flat(1000) },
      destination: US,
    };
    // Together: 10000 + 6000 (16 kg band) = 16000; split: 5000 + 1000 + 5500 + 1000 = 12500.
    const plan = planSourcing(input);
    expect(plan.assignments.map((a) => a.listingId)).toEqual(['B-L', 'F-R']);
    expect(plan.totalCents).toBe(12_500);
  });

  it('when a seller refuses a parcel over its last band, then the plan never sends it', () => {
    const capped = seller({ kind: 'weight_bands', shipsTo: ['*'], bands: [{ upToGrams: 10_000, amountCents: 500 }], overMaxCents: null });
    const heavy = { weightGrams: 6000, lengthMm: 200, widthMm: 200, heightMm: 200 };
    const input: SourcingInput = {
      needs: [need('N-1', 'DRUM', { quantity: 2 })],
      listings: [
        listing({ listingId: 'CAP', sellerId: 'S-CAP', partId: 'DRUM', priceCents: 1000, available: 2, ...heavy }),
        listing({ listingId: 'DEAR', sellerId: 'S-DEAR', partId: 'DRUM', priceCents: 9000, available: 2, ...heavy }),
      ],
      sellers: { 'S-CAP': capped, 'S-DEAR': flat(1000) },
      destination: US,
    };
    const plan = planSourcing(input);
    expect(plan.assignments).toEqual([
      { needId: 'N-1', listingId: 'CAP', sellerId: 'S-CAP', quantity: 1, unitPriceCents: 1000 },
      { needId: 'N-1', listingId: 'DEAR', sellerId: 'S-DEAR', quantity: 1, unitPriceCents: 9000 },
    ]);
    expect(plan.totalCents).toBe(1000 + 500 + 9000 + 1000);
    checkPlan(input, plan);
  });

  it('when two needs can use the same listing, then its stock is shared and the second need goes elsewhere', () => {
    const input: SourcingInput = {
      needs: [need('N-OLD', 'PN-OLD', { acceptedPartIds: ['PN-NEW'] }), need('N-NEW', 'PN-NEW')],
      listings: [
        listing({ listingId: 'NEW-1', sellerId: 'S-A', partId: 'PN-NEW', priceCents: 1000, available: 1 }),
        listing({ listingId: 'NEW-2', sellerId: 'S-A', partId: 'PN-NEW', priceCents: 1400, available: 3 }),
      ],
      sellers: { 'S-A': flat(500) },
      destination: US,
    };
    const plan = planSourcing(input);
    expect(plan.assignments.map((a) => [a.needId, a.listingId])).toEqual([
      ['N-OLD', 'NEW-1'],
      ['N-NEW', 'NEW-2'],
    ]);
    expect(plan.totalCents).toBe(1000 + 1400 + 500);
  });

  it('when stock runs short, then the plan buys what there is and reports the rest', () => {
    const input: SourcingInput = {
      needs: [need('N-1', 'GASKET', { quantity: 5 })],
      listings: [listing({ listingId: 'G-1', sellerId: 'S-A', partId: 'GASKET', priceCents: 300, available: 2 })],
      sellers: { 'S-A': flat(500) },
      destination: US,
    };
    const plan = planSourcing(input);
    expect(plan.assignments).toEqual([{ needId: 'N-1', listingId: 'G-1', sellerId: 'S-A', quantity: 2, unitPriceCents: 300 }]);
    expect(plan.unfilled).toEqual([
      { needId: 'N-1', partId: 'GASKET', requested: 5, filled: 2, missing: 3, reason: 'not_enough_stock', detail: expect.stringContaining('Only 2') },
    ]);
  });

  it('when a need covers several units, then it may split them over listings', () => {
    const input: SourcingInput = {
      needs: [need('N-1', 'BOLT', { quantity: 4 })],
      listings: [
        listing({ listingId: 'B-1', sellerId: 'S-A', partId: 'BOLT', priceCents: 100, available: 3 }),
        listing({ listingId: 'B-2', sellerId: 'S-A', partId: 'BOLT', priceCents: 150, available: 3 }),
      ],
      sellers: { 'S-A': flat(500) },
      destination: US,
    };
    const plan = planSourcing(input);
    expect(plan.assignments.map((a) => [a.listingId, a.quantity])).toEqual([
      ['B-1', 3],
      ['B-2', 1],
    ]);
    expect(plan.totalCents).toBe(300 + 150 + 500);
  });
});

describe('condition policies', () => {
  const conditions = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'] as const;
  const input = (policy: SourcingNeed['policy']): SourcingInput => ({
    needs: [need('N-1', 'PART-A', { policy })],
    // The cheapest is the least original: the policy decides what is bought.
    listings: conditions.map((condition, i) =>
      listing({ listingId: `C-${i}-${condition}`, sellerId: 'S-A', partId: 'PART-A', condition, priceCents: 10_000 - i * 1000 }),
    ),
    sellers: { 'S-A': flat(0) },
    destination: US,
  });
  const bought = (policy: SourcingNeed['policy']) => planSourcing(input(policy)).assignments[0]?.listingId;

  it('when originals only, then the cheapest of NOS, NORS, used original or rebuilt is bought', () => {
    expect(bought('originals_only')).toBe('C-3-rebuilt');
  });

  it('when NOS only, then only NOS is bought', () => {
    expect(bought('nos_only')).toBe('C-0-nos');
  });

  it('when reproductions are acceptable or anything goes, then a reproduction may be bought but never a core', () => {
    expect(bought('reproduction_ok')).toBe('C-4-reproduction');
    expect(bought('any')).toBe('C-4-reproduction');
  });
});

describe('unfilled reasons', () => {
  const base = (listings: CandidateListing[], needs: SourcingNeed[], destination: SourcingInput['destination'] = US): SourcingInput => ({
    needs,
    listings,
    sellers: { 'S-US': flat(500, { shipsTo: ['US'] }), 'S-SHOW': seller({ kind: 'pickup_only' }) },
    destination,
  });
  const reason = (input: SourcingInput) => planSourcing(input).unfilled.map((u) => u.reason);

  it('when nobody lists the part, then the reason is no_listing', () => {
    expect(reason(base([], [need('N-1', 'RARE')]))).toEqual(['no_listing']);
  });

  it('when the only listings are in excluded conditions, then the reason is condition_policy', () => {
    const l = [listing({ sellerId: 'S-US', partId: 'P', priceCents: 100, condition: 'reproduction' })];
    expect(reason(base(l, [need('N-1', 'P', { policy: 'originals_only' })]))).toEqual(['condition_policy']);
  });

  it('when acceptable listings cannot reach the destination, then the reason is does_not_ship', () => {
    const l = [
      listing({ sellerId: 'S-US', partId: 'P', priceCents: 100 }),
      listing({ sellerId: 'S-SHOW', partId: 'P', priceCents: 100 }),
    ];
    expect(reason(base(l, [need('N-1', 'P')], { country: 'DE' }))).toEqual(['does_not_ship']);
    // At pickup the show seller serves it.
    expect(reason(base(l, [need('N-1', 'P')], { pickup: true }))).toEqual([]);
  });

  it('when the acceptable units are sold out, then the reason is not_enough_stock and excluded stock is mentioned', () => {
    const l = [
      listing({ sellerId: 'S-US', partId: 'P', priceCents: 100, available: 0, condition: 'nos' }),
      listing({ sellerId: 'S-US', partId: 'P', priceCents: 100, available: 4, condition: 'reproduction' }),
    ];
    const plan = planSourcing(base(l, [need('N-1', 'P', { policy: 'nos_only' })]));
    expect(plan.unfilled[0]).toMatchObject({ reason: 'not_enough_stock', missing: 1, detail: expect.stringContaining('4 more unit(s)') });
  });
});

describe('planSourcing behaviour', () => {
  it('when the listings come in another order, then the plan is the same', () => {
    const input = randomSourcingInstance(99, { needs: 8, candidatesPerNeed: 4, sellers: 5, maxQuantity: 2, maxAvailable: 3, shareChance: 0.2, policyChance: 0.3 });
    const rnd = seededRandom(5);
    const shuffled = [...input.listings].sort(() => rnd() - 0.5);
    expect(planSourcing({ ...input, listings: shuffled })).toEqual(planSourcing(input));
  });

  it('when the instance is large, then it runs heuristically within budget and reports a bound and gap', () => {
    const input = randomSourcingInstance(2024, {
      needs: 40,
      candidatesPerNeed: 15,
      fixedCandidates: true,
      sellers: 60,
      maxQuantity: 3,
      maxAvailable: 5,
      shareChance: 0.1,
      policyChance: 0.3,
    });
    const plan = planSourcing(input);
    checkPlan(input, plan);
    expect(plan.method).toBe('heuristic');
    expect(plan.lowerBoundCents).toBeGreaterThan(0);
    expect(plan.gapCents).toBe(plan.totalCents - plan.lowerBoundCents);
    expect(plan.gapPercent).toBeCloseTo((100 * plan.gapCents) / plan.totalCents, 2);
  });

  it('when input is bad, then a RangeError says what is wrong', () => {
    const ok: SourcingInput = {
      needs: [need('N-1', 'P')],
      listings: [listing({ listingId: 'X', sellerId: 'S-A', partId: 'P', priceCents: 100 })],
      sellers: { 'S-A': flat(100) },
      destination: US,
    };
    expect(() => planSourcing({ ...ok, sellers: {} })).toThrow(/S-A has no entry/);
    expect(() => planSourcing({ ...ok, listings: [...ok.listings, ...ok.listings] })).toThrow(/appears twice/);
    expect(() => planSourcing({ ...ok, needs: [need('N-1', 'P', { quantity: 0 })] })).toThrow(/needs\[0\]/);
    expect(() => planSourcing({ ...ok, listings: [{ ...ok.listings[0], priceCents: -1 }] })).toThrow(/listings\[0\]/);
    expect(() => planSourcing({ ...ok, destination: { country: 'Narnia' } })).toThrow(/country/);
  });
});
