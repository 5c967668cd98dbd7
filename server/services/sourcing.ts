/**
 * The sourcing plan of one vehicle: its needs list covered by live listings at the lowest landed cost
 * (server/domain/sourcing-plan.ts does the optimising), and "put the plan in the cart".
 *
 * Shipping is modelled exactly as checkout charges it (server/services/cart.ts): a seller's lines are grouped
 * by shipping profile (the listing's own, else the seller's default), each group is quoted by the domain rules
 * and the quotes add up; the shop's ships-to list applies on top. So each (seller, profile) pair is one
 * "seller" to the optimiser.
 */
import { and, eq, gt, inArray, ne, sql } from 'drizzle-orm';
import type { PlanDestination } from '../../shared/schemas/garage';
import { getDb } from '../db/client';
import { listings, sellerProfiles, shippingProfiles, users } from '../db/schema/index';
import { planSourcing, type CandidateListing, type SourcingNeed } from '../domain/sourcing-plan';
import { shippingProfileSchema, type ShippingProfile } from '../domain/shipping';
import { fillersForPart, indexEdges, type Interchange } from '../domain/supersession';
import { AppError } from '../errors';
import { logger } from '../lib/logger';
import { addItem, userCart } from './cart';
import { loadSubgraph } from './catalog-graph';
import { primaryNumbers } from './catalog';
import { ownedVehicle } from './garage';
import { needsOf, type NeedEntry } from './needs-list';

/** Ships nowhere and offers no pickup: a listing whose seller has no usable shipping set up. */
const NO_SHIPPING: ShippingProfile = shippingProfileSchema.parse({ kind: 'flat_per_order', amountCents: 0, shipsTo: [], pickupAvailable: false });

/** The profile's ships-to narrowed by the shop's own list, as checkout does. */
function narrowShipsTo(profile: ShippingProfile, shop: string[] | null): ShippingProfile {
  if (!shop || shop.includes('*')) return profile;
  const allowed = profile.shipsTo.includes('*') ? shop : profile.shipsTo.filter((c) => shop.includes(c));
  return shippingProfileSchema.parse({ ...profile, shipsTo: allowed });
}

interface Substitute {
  interchange: Interchange;
  conditions: string[];
}

/** Part ids that fill each need one for one (supersession-aware, one-way never backwards), with their terms. */
async function fillersFor(partIds: string[]): Promise<Map<string, Map<string, Substitute>>> {
  const g = await loadSubgraph(partIds);
  const index = indexEdges(g.edges);
  const out = new Map<string, Map<string, Substitute>>();
  for (const partId of partIds) {
    const terms = new Map<string, Substitute>();
    for (const set of fillersForPart(partId, index).fillerSets) {
      // Kits and n-for-one replacements do not fill one unit with one unit; the planner buys single parts.
      if (set.kitOf !== null || set.parts.length !== 1 || set.parts[0].quantity !== 1) continue;
      if (!terms.has(set.parts[0].partId)) terms.set(set.parts[0].partId, { interchange: set.interchange, conditions: set.conditions });
    }
    out.set(partId, terms);
  }
  return out;
}

interface SellerGroup {
  key: string;
  sellerId: string;
  sellerName: string;
  profileId: string | null;
  profileName: string | null;
  profile: ShippingProfile;
}

/** Live listings of the accepted parts with the shipping group each belongs to. The buyer's own are left out. */
async function candidates(buyerId: string, partIds: string[]) {
  if (partIds.length === 0) return { rows: [], groups: new Map<string, SellerGroup>() };
  const db = getDb();
  const defaultProfile = db
    .select({ sellerId: shippingProfiles.sellerId, id: sql<string>`min(${shippingProfiles.id}::text)::uuid`.as('default_id') })
    .from(shippingProfiles)
    .where(eq(shippingProfiles.isDefault, true))
    .groupBy(shippingProfiles.sellerId)
    .as('default_profile');
  const rows = await db
    .select({
      listing: listings,
      shopName: sellerProfiles.shopName,
      shopShipsTo: sellerProfiles.shipsTo,
      displayName: users.displayName,
      profileId: shippingProfiles.id,
      profileName: shippingProfiles.name,
      profileRules: shippingProfiles.rules,
    })
    .from(listings)
    .innerJoin(users, eq(users.id, listings.sellerId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, listings.sellerId))
    .leftJoin(defaultProfile, eq(defaultProfile.sellerId, listings.sellerId))
    .leftJoin(shippingProfiles, sql`${shippingProfiles.id} = coalesce(${listings.shippingProfileId}, ${defaultProfile.id})`)
    .where(and(inArray(listings.partId, partIds), eq(listings.state, 'approved'), gt(listings.quantity, 0), ne(listings.sellerId, buyerId)));
  const groups = new Map<string, SellerGroup>();
  for (const r of rows) {
    const key = `${r.listing.sellerId}/${r.profileId ?? 'none'}`;
    if (groups.has(key)) continue;
    let profile = NO_SHIPPING;
    if (r.profileRules) {
      const parsed = shippingProfileSchema.safeParse(r.profileRules);
      if (parsed.success) profile = narrowShipsTo(parsed.data, r.shopShipsTo);
      else logger.warn({ profileId: r.profileId }, 'stored shipping profile does not parse; its listings are left out of plans');
    }
    groups.set(key, { key, sellerId: r.listing.sellerId, sellerName: r.shopName ?? r.displayName, profileId: r.profileId, profileName: r.profileName, profile });
  }
  return { rows, groups };
}

export async function buildPlan(userId: string, vehicleId: string, destination: PlanDestination) {
  const v = await ownedVehicle(userId, vehicleId);
  const { needs } = await needsOf(v);
  const needById = new Map(needs.map((n) => [n.needId, n]));
  const partIds = [...new Set(needs.map((n) => n.part.id))];
  const fillers = await fillersFor(partIds);
  const accepted = [...new Set([...fillers.values()].flatMap((m) => [...m.keys()]))];
  const { rows, groups } = await candidates(userId, accepted);
  const groupOf = new Map(rows.map((r) => [r.listing.id, `${r.listing.sellerId}/${r.profileId ?? 'none'}`]));
  const listingById = new Map(rows.map((r) => [r.listing.id, r.listing]));

  const sourcingNeeds: SourcingNeed[] = needs.map((n) => ({
    needId: n.needId,
    partId: n.part.id,
    quantity: n.quantity,
    policy: n.policy,
    acceptedPartIds: [...(fillers.get(n.part.id)?.keys() ?? [])],
  }));
  const candidateListings: CandidateListing[] = rows.map(({ listing: l }) => ({
    listingId: l.id,
    sellerId: groupOf.get(l.id)!,
    partId: l.partId!,
    condition: l.condition,
    priceCents: l.priceCents,
    available: l.quantity,
    weightGrams: l.weightGrams,
    lengthMm: l.lengthMm,
    widthMm: l.widthMm,
    heightMm: l.heightMm,
  }));
  const sellers = Object.fromEntries([...groups.values()].map((g) => [g.key, { profile: g.profile }]));
  const plan = planSourcing({ needs: sourcingNeeds, listings: candidateListings, sellers, destination });

  const numbers = await primaryNumbers([...new Set(rows.map((r) => r.listing.partId!))]);
  // Regroup per real seller: the cart shows one group per seller, its shipping the sum over profiles.
  const bySeller = new Map<
    string,
    { seller: { id: string; name: string }; items: unknown[]; itemsCents: number; shippingCents: number; shipments: Array<{ profileName: string | null; shippingCents: number; explanation: string }> }
  >();
  for (const s of plan.perSeller) {
    const g = groups.get(s.sellerId)!;
    const entry = bySeller.get(g.sellerId) ?? { seller: { id: g.sellerId, name: g.sellerName }, items: [], itemsCents: 0, shippingCents: 0, shipments: [] };
    entry.itemsCents += s.itemsCents;
    entry.shippingCents += s.shippingCents;
    entry.shipments.push({ profileName: g.profileName, shippingCents: s.shippingCents, explanation: s.shippingExplanation });
    bySeller.set(g.sellerId, entry);
  }
  for (const a of plan.assignments) {
    const l = listingById.get(a.listingId)!;
    const need = needById.get(a.needId)!;
    const g = groups.get(a.sellerId)!;
    const substitute = l.partId !== need.part.id ? (fillers.get(need.part.id)?.get(l.partId!) ?? null) : null;
    bySeller.get(g.sellerId)!.items.push({
      needId: a.needId,
      listingId: l.id,
      title: l.title,
      condition: l.condition,
      partId: l.partId,
      partNumber: numbers.get(l.partId!) ?? null,
      forPart: { id: need.part.id, primaryNumber: need.part.primaryNumber, name: need.part.name },
      substitute,
      quantity: a.quantity,
      unitPriceCents: a.unitPriceCents,
      lineCents: a.quantity * a.unitPriceCents,
    });
  }
  return {
    vehicleId: v.id,
    destination,
    plan: {
      sellers: [...bySeller.values()].sort((a, b) => a.seller.name.localeCompare(b.seller.name)),
      itemsCents: plan.itemsCents,
      shippingCents: plan.shippingCents,
      totalCents: plan.totalCents,
    },
    unfilled: plan.unfilled.map((u) => {
      const n = needById.get(u.needId) as NeedEntry;
      return { needId: u.needId, part: n.part, policy: n.policy, requested: u.requested, filled: u.filled, missing: u.missing, reason: u.reason, detail: u.detail };
    }),
    method: plan.method,
    optimal: plan.optimal,
    lowerBoundCents: plan.lowerBoundCents,
    gapCents: plan.gapCents,
    gapPercent: plan.gapPercent,
    /** Assignments as the cart needs them: listing and units. */
    purchases: plan.assignments.reduce<Array<{ listingId: string; quantity: number }>>((acc, a) => {
      const same = acc.find((x) => x.listingId === a.listingId);
      if (same) same.quantity += a.quantity;
      else acc.push({ listingId: a.listingId, quantity: a.quantity });
      return acc;
    }, []),
  };
}

/**
 * Puts the plan in the buyer's cart. The plan is computed again here (a client's copy is never trusted), and
 * the cart is brought up to at least the planned units of each listing, so a second click adds nothing.
 */
export async function planToCart(userId: string, vehicleId: string, destination: PlanDestination) {
  const result = await buildPlan(userId, vehicleId, destination);
  if (result.purchases.length === 0) throw new AppError(409, 'invalid_state', 'The plan buys nothing: no need can be filled from live listings right now');
  const cart = await userCart(userId);
  const inCart = new Map((cart?.lines ?? []).map((l) => [l.listingId, l.quantity]));
  const added: Array<{ listingId: string; quantity: number }> = [];
  const warnings: unknown[] = [];
  for (const p of result.purchases) {
    const missing = p.quantity - (inCart.get(p.listingId) ?? 0);
    if (missing <= 0) continue;
    warnings.push(...(await addItem({ userId }, p.listingId, missing)));
    added.push({ listingId: p.listingId, quantity: missing });
  }
  return { added, warnings, plan: result };
}
