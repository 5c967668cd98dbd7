import { z } from 'zod';
import {
  assertShippingDestination,
  assertShippingProfile,
  shipmentCostCents,
  shippingForSeller,
  unitBillableGramsFor,
  type ShippingDestination,
  type ShippingItem,
  type ShippingProfile,
} from './shipping';
import { allocationCost, search, type SearchModel } from './sourcing-search';

/*
 * The restorer's sourcing plan: which listings to buy, across sellers, so every need is covered at the
 * lowest landed cost (item prices + each chosen seller's shipping for exactly what is bought from them).
 * Supersession is resolved before this: a need carries the part ids that fill it (acceptedPartIds). A
 * number replaced by a kit of several parts is expanded by the caller into one need per kit part.
 */

export const listingConditions = ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction', 'core'] as const;
export type ListingCondition = (typeof listingConditions)[number];

export const sourcingPolicies = ['originals_only', 'nos_only', 'reproduction_ok', 'any'] as const;
export type SourcingPolicy = (typeof sourcingPolicies)[number];

/**
 * Conditions each policy accepts (our decision):
 * - originals_only: parts made in the period, new or used, and original units rebuilt — NOS, NORS (period
 *   replacement stock, never used), used originals, rebuilt originals. Reproductions are not originals.
 * - nos_only: NOS alone.
 * - reproduction_ok and any: everything but cores. A core is sold to be rebuilt, not to be fitted, so no
 *   policy buys one to fill a need; 'any' stays a separate word so it can widen later.
 */
export const POLICY_CONDITIONS: Readonly<Record<SourcingPolicy, readonly ListingCondition[]>> = {
  originals_only: ['nos', 'nors', 'used_original', 'rebuilt'],
  nos_only: ['nos'],
  reproduction_ok: ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction'],
  any: ['nos', 'nors', 'used_original', 'rebuilt', 'reproduction'],
};

const idSchema = z.string().min(1);
const countSchema = z.number().int().nonnegative().max(Number.MAX_SAFE_INTEGER);

export const sourcingNeedSchema = z.object({
  needId: idSchema,
  partId: idSchema,
  quantity: z.number().int().positive().max(10_000),
  policy: z.enum(sourcingPolicies),
  /** Other part ids that fill this need (supersessions, interchangeable numbers); partId always does. */
  acceptedPartIds: z.array(idSchema).optional(),
});
export type SourcingNeed = z.infer<typeof sourcingNeedSchema>;

export const candidateListingSchema = z.object({
  listingId: idSchema,
  sellerId: idSchema,
  partId: idSchema,
  condition: z.enum(listingConditions),
  priceCents: countSchema,
  available: countSchema,
  weightGrams: countSchema,
  lengthMm: countSchema,
  widthMm: countSchema,
  heightMm: countSchema,
});
export type CandidateListing = z.infer<typeof candidateListingSchema>;

export interface SourcingInput {
  needs: readonly SourcingNeed[];
  listings: readonly CandidateListing[];
  sellers: Readonly<Record<string, { profile: ShippingProfile }>>;
  destination: ShippingDestination;
  options?: {
    /** Branch-and-bound node budget (default DEFAULT_MAX_NODES); 0 = heuristic only. */
    maxNodes?: number;
  };
}

export type UnfilledReason = 'no_listing' | 'not_enough_stock' | 'condition_policy' | 'does_not_ship';

export interface SourcingAssignment {
  needId: string;
  listingId: string;
  sellerId: string;
  quantity: number;
  unitPriceCents: number;
}

export interface SellerTotals {
  sellerId: string;
  itemsCents: number;
  shippingCents: number;
  shippingExplanation: string;
}

export interface UnfilledNeed {
  needId: string;
  partId: string;
  requested: number;
  filled: number;
  missing: number;
  reason: UnfilledReason;
  detail: string;
}

export interface SourcingPlan {
  assignments: SourcingAssignment[];
  perSeller: SellerTotals[];
  itemsCents: number;
  shippingCents: number;
  totalCents: number;
  unfilled: UnfilledNeed[];
  /** 'exact': the search ran to the end and the plan is optimal; 'heuristic': best found within budget. */
  method: 'exact' | 'heuristic';
  /**
   * No plan filling as many units costs less. With method 'heuristic' it is the root bound (item prices at
   * their cheapest + shipping that needs with disjoint sellers cannot avoid); capped at totalCents.
   */
  lowerBoundCents: number;
  gapCents: number;
  /** gapCents as a percentage of totalCents, two decimals. */
  gapPercent: number;
  optimal: boolean;
  nodesExplored: number;
}

/** Enough for exhaustive proof on a dozen needs with a few listings each; larger plans stay under a second. */
export const DEFAULT_MAX_NODES = 300_000;
/** Deeper trees would risk the call stack; such plans go heuristic only. */
const MAX_TREE_DEPTH = 4_000;

function fail(message: string): never {
  throw new RangeError(message);
}

function parseAll<T>(schema: z.ZodType<T>, values: readonly unknown[], label: string): T[] {
  if (!Array.isArray(values)) fail(`${label} must be an array`);
  return values.map((v, i) => {
    const r = schema.safeParse(v);
    if (!r.success) fail(`${label}[${i}] is invalid: ${z.prettifyError(r.error)}`);
    return r.data;
  });
}

interface Eligibility {
  matching: number;
  policyOk: number;
  shippable: number;
  /** Units in listings matching part and ship-to but excluded by the condition policy. */
  excludedByPolicyUnits: number;
  /** Indices into the sorted listings. */
  candidates: number[];
}

/** Plans what to buy from whom; see the file comment for the objective. Deterministic. */
export function planSourcing(input: SourcingInput): SourcingPlan {
  const needs = parseAll(sourcingNeedSchema, input.needs, 'needs');
  const listings = parseAll(candidateListingSchema, input.listings, 'listings');
  assertShippingDestination(input.destination);
  const destination = input.destination;
  const maxNodes = input.options?.maxNodes ?? DEFAULT_MAX_NODES;
  if (!Number.isSafeInteger(maxNodes) || maxNodes < 0) fail('options.maxNodes must be a non-negative integer');

  const needIds = new Set<string>();
  for (const n of needs) {
    if (needIds.has(n.needId)) fail(`needId ${n.needId} appears twice`);
    needIds.add(n.needId);
  }
  // Listing order decides ties, so sort by id: the plan must not depend on the order rows came in.
  listings.sort((a, b) => (a.listingId < b.listingId ? -1 : a.listingId > b.listingId ? 1 : 0));
  listings.forEach((l, i) => {
    if (i > 0 && listings[i - 1].listingId === l.listingId) fail(`listingId ${l.listingId} appears twice`);
  });
  const sellerIds = [...new Set(listings.map((l) => l.sellerId))].sort();
  for (const id of sellerIds) {
    const s = input.sellers[id];
    if (!s) fail(`listing seller ${id} has no entry in sellers`);
    assertShippingProfile(s.profile);
  }

  // Whether one unit of a listing can be shipped at all (ships-to, pickup, weight limit).
  const unitGrams = listings.map((l) => unitBillableGramsFor(input.sellers[l.sellerId].profile, l));
  const unitShips = listings.map(
    (l, i) =>
      shipmentCostCents(
        input.sellers[l.sellerId].profile,
        { subtotalCents: l.priceCents, units: 1, billableGrams: unitGrams[i] },
        destination,
      ) !== Infinity,
  );

  const byPart = new Map<string, number[]>();
  listings.forEach((l, i) => {
    const list = byPart.get(l.partId);
    if (list) list.push(i);
    else byPart.set(l.partId, [i]);
  });

  const eligibility: Eligibility[] = needs.map((need) => {
    const accepted = [...new Set([need.partId, ...(need.acceptedPartIds ?? [])])];
    const matching = accepted.flatMap((p) => byPart.get(p) ?? []).sort((a, b) => a - b);
    const allowed = POLICY_CONDITIONS[need.policy];
    const policyOk = matching.filter((i) => allowed.includes(listings[i].condition));
    const shippable = policyOk.filter((i) => unitShips[i]);
    const excludedByPolicyUnits = matching
      .filter((i) => !allowed.includes(listings[i].condition) && unitShips[i])
      .reduce((a, i) => a + listings[i].available, 0);
    const candidates = shippable
      .filter((i) => listings[i].available > 0)
      .sort((a, b) => listings[a].priceCents - listings[b].priceCents || a - b);
    return { matching: matching.length, policyOk: policyOk.length, shippable: shippable.length, excludedByPolicyUnits, candidates };
  });

  // Indexed model over the listings and sellers that matter.
  const listingIndex = new Map<number, number>();
  const modelListings: number[] = [];
  for (const e of eligibility) {
    for (const i of e.candidates) {
      if (!listingIndex.has(i)) {
        listingIndex.set(i, modelListings.length);
        modelListings.push(i);
      }
    }
  }
  const modelSellerIds = [...new Set(modelListings.map((i) => listings[i].sellerId))].sort();
  const sellerIndex = new Map(modelSellerIds.map((id, k) => [id, k]));
  const model: SearchModel = {
    quantity: needs.map((n) => n.quantity),
    candidates: eligibility.map((e) => e.candidates.map((i) => listingIndex.get(i) as number)),
    price: modelListings.map((i) => listings[i].priceCents),
    stock: modelListings.map((i) => listings[i].available),
    seller: modelListings.map((i) => sellerIndex.get(listings[i].sellerId) as number),
    unitGrams: modelListings.map((i) => unitGrams[i]),
    profiles: modelSellerIds.map((id) => input.sellers[id].profile),
    destination,
  };
  for (const p of model.price) if (!Number.isSafeInteger(p * 10_000)) fail('listing prices are too large to plan with');

  const depth = model.candidates.reduce((a, cs) => a + cs.length + 2, 1);
  const result = search(model, { maxNodes: depth > MAX_TREE_DEPTH ? 0 : maxNodes });
  const check = allocationCost(model, result.allocation);
  if (check.costCents !== result.costCents || check.unfilledUnits !== result.unfilledUnits) {
    fail('internal: sourcing plan cost does not reproduce');
  }

  // ---- shape the plan ----
  const assignments: SourcingAssignment[] = [];
  const itemsBySeller = new Map<string, ShippingItem[]>();
  const filledByNeed = needs.map(() => 0);
  result.allocation.forEach((alloc, n) => {
    const rows = alloc
      .map(([ml, quantity]) => ({ listing: listings[modelListings[ml]], quantity }))
      .sort((a, b) => (a.listing.listingId < b.listing.listingId ? -1 : 1));
    for (const { listing, quantity } of rows) {
      filledByNeed[n] += quantity;
      assignments.push({
        needId: needs[n].needId,
        listingId: listing.listingId,
        sellerId: listing.sellerId,
        quantity,
        unitPriceCents: listing.priceCents,
      });
      const items = itemsBySeller.get(listing.sellerId) ?? [];
      const same = items.find((it) => it.listingId === listing.listingId);
      if (same) same.quantity += quantity;
      else {
        items.push({
          listingId: listing.listingId,
          quantity,
          unitPriceCents: listing.priceCents,
          weightGrams: listing.weightGrams,
          lengthMm: listing.lengthMm,
          widthMm: listing.widthMm,
          heightMm: listing.heightMm,
        });
      }
      itemsBySeller.set(listing.sellerId, items);
    }
  });

  const perSeller: SellerTotals[] = [...itemsBySeller.keys()].sort().map((sellerId) => {
    const items = itemsBySeller.get(sellerId) as ShippingItem[];
    const quote = shippingForSeller(input.sellers[sellerId].profile, items, destination);
    if (!quote.ok) fail(`internal: planned shipment from ${sellerId} is refused (${quote.reason})`);
    return {
      sellerId,
      itemsCents: items.reduce((a, it) => a + it.quantity * it.unitPriceCents, 0),
      shippingCents: quote.amountCents,
      shippingExplanation: quote.explanation,
    };
  });
  const itemsCents = perSeller.reduce((a, s) => a + s.itemsCents, 0);
  const shippingCents = perSeller.reduce((a, s) => a + s.shippingCents, 0);
  const totalCents = itemsCents + shippingCents;
  if (totalCents !== result.costCents) fail('internal: sourcing plan total does not match its shipping quotes');

  // Which listings more than one need could draw on: a shortfall there is stock taken by another need.
  const candidateUse = new Map<number, number>();
  for (const e of eligibility) for (const i of e.candidates) candidateUse.set(i, (candidateUse.get(i) ?? 0) + 1);

  const unfilled: UnfilledNeed[] = [];
  needs.forEach((need, n) => {
    const filled = filledByNeed[n];
    const missing = need.quantity - filled;
    if (missing === 0) return;
    const e = eligibility[n];
    const base = { needId: need.needId, partId: need.partId, requested: need.quantity, filled, missing };
    const policyNote =
      e.excludedByPolicyUnits > 0 ? ` ${e.excludedByPolicyUnits} more unit(s) are listed in conditions the '${need.policy}' policy excludes.` : '';
    if (e.matching === 0) {
      unfilled.push({ ...base, reason: 'no_listing', detail: 'No listing offers this part or an accepted substitute.' });
    } else if (e.policyOk === 0) {
      unfilled.push({ ...base, reason: 'condition_policy', detail: `Listings exist, but none in a condition the '${need.policy}' policy accepts.` });
    } else if (e.shippable === 0) {
      unfilled.push({
        ...base,
        reason: 'does_not_ship',
        detail: 'pickup' in destination ? 'No seller of an acceptable listing offers pickup.' : `No seller of an acceptable listing ships to ${destination.country}.`,
      });
    } else {
      const stock = e.candidates.reduce((a, i) => a + listings[i].available, 0);
      const shared = e.candidates.some((i) => (candidateUse.get(i) ?? 0) > 1);
      if (stock >= need.quantity && !shared) {
        unfilled.push({ ...base, reason: 'does_not_ship', detail: "The sellers' shipping refuses a shipment that heavy." });
      } else {
        unfilled.push({
          ...base,
          reason: 'not_enough_stock',
          detail:
            (stock < need.quantity
              ? `Only ${stock} acceptable unit(s) are available.`
              : 'The acceptable units are also needed elsewhere in this plan.') + policyNote,
        });
      }
    }
  });

  const optimal = result.complete;
  const lowerBoundCents = optimal ? totalCents : Math.min(result.rootLowerBoundCents, totalCents);
  const gapCents = totalCents - lowerBoundCents;
  return {
    assignments,
    perSeller,
    itemsCents,
    shippingCents,
    totalCents,
    unfilled,
    method: optimal ? 'exact' : 'heuristic',
    lowerBoundCents,
    gapCents,
    gapPercent: totalCents === 0 ? 0 : Math.round((gapCents * 10_000) / totalCents) / 100,
    // Without a finished search, only a bound reached at the least possible shortfall proves the plan.
    optimal: optimal || (result.unfilledUnits === result.minUnfilledUnits && result.rootLowerBoundCents >= totalCents),
    nodesExplored: result.nodes,
  };
}
