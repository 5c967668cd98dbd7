import { shippingForSeller, type ShippingItem } from './shipping';
import { POLICY_CONDITIONS, type SourcingInput } from './sourcing-plan';

/*
 * Exhaustive reference for planSourcing, for tests and the benchmark only: tries every way to split every
 * need over its acceptable listings, prices each complete plan with shippingForSeller, keeps the best by
 * (fewest unfilled units, then lowest cost). Its one shortcut — dropping a branch once it already leaves more
 * units unfilled than the best plan found — cannot lose the optimum. Exponential: small instances only.
 */

export interface BruteForceResult {
  unfilledUnits: number;
  totalCents: number;
  plansPriced: number;
}

export function bruteForceSourcing(input: SourcingInput): BruteForceResult {
  const { needs, listings, sellers, destination } = input;
  const accepts = needs.map((need) => {
    const parts = new Set([need.partId, ...(need.acceptedPartIds ?? [])]);
    return listings
      .map((_, i) => i)
      .filter((i) => {
        const l = listings[i];
        if (!parts.has(l.partId) || !POLICY_CONDITIONS[need.policy].includes(l.condition) || l.available <= 0) return false;
        const one = shippingForSeller(sellers[l.sellerId].profile, [item(i, 1)], destination);
        return one.ok;
      });
  });
  const stockLeft = listings.map((l) => l.available);
  const taken = listings.map(() => 0);
  let bestUnfilled = Infinity;
  let bestCost = Infinity;
  let plansPriced = 0;

  function item(i: number, quantity: number): ShippingItem {
    const l = listings[i];
    return {
      listingId: l.listingId,
      quantity,
      unitPriceCents: l.priceCents,
      weightGrams: l.weightGrams,
      lengthMm: l.lengthMm,
      widthMm: l.widthMm,
      heightMm: l.heightMm,
    };
  }

  function price(unfilled: number): void {
    plansPriced++;
    const bySeller = new Map<string, ShippingItem[]>();
    let cost = 0;
    listings.forEach((l, i) => {
      if (taken[i] === 0) return;
      cost += taken[i] * l.priceCents;
      const list = bySeller.get(l.sellerId) ?? [];
      list.push(item(i, taken[i]));
      bySeller.set(l.sellerId, list);
    });
    for (const [sellerId, items] of bySeller) {
      const q = shippingForSeller(sellers[sellerId].profile, items, destination);
      if (!q.ok) return;
      cost += q.amountCents;
    }
    if (unfilled < bestUnfilled || (unfilled === bestUnfilled && cost < bestCost)) {
      bestUnfilled = unfilled;
      bestCost = cost;
    }
  }

  function need(n: number, unfilled: number): void {
    if (unfilled > bestUnfilled) return;
    if (n === needs.length) {
      price(unfilled);
      return;
    }
    split(n, 0, needs[n].quantity, unfilled);
  }

  function split(n: number, c: number, remaining: number, unfilled: number): void {
    const cands = accepts[n];
    if (c === cands.length) {
      need(n + 1, unfilled + remaining);
      return;
    }
    const i = cands[c];
    for (let x = Math.min(remaining, stockLeft[i]); x >= 0; x--) {
      stockLeft[i] -= x;
      taken[i] += x;
      split(n, c + 1, remaining - x, unfilled);
      stockLeft[i] += x;
      taken[i] -= x;
    }
  }

  need(0, 0);
  return { unfilledUnits: bestUnfilled, totalCents: bestCost, plansPriced };
}
