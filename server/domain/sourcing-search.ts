import { shipmentCostCents, type ShippingDestination, type ShippingProfile } from './shipping';

/*
 * The search behind planSourcing, on an indexed model (needs, listings and sellers as array positions).
 * Objective, compared lexicographically: first the fewest unfilled units, then the lowest landed cost
 * (item prices + each used seller's shipping for exactly what is bought from them).
 * 1. A greedy construction and local improvement (re-insert a need, drop a seller, consolidate on a seller).
 * 2. Branch and bound from that incumbent, within a node budget: when it finishes, the plan is optimal.
 * No randomness and no clock: the same input gives the same plan.
 */

export interface SearchModel {
  /** Units wanted per need. */
  quantity: number[];
  /** Candidate listing indices per need, cheapest first (ties by listing order). */
  candidates: number[][];
  price: number[];
  stock: number[];
  seller: number[];
  /** Billable grams of one unit under its seller's divisor. */
  unitGrams: number[];
  profiles: ShippingProfile[];
  destination: ShippingDestination;
}

/** Units of each candidate taken, per need: allocation[need] = [listingIndex, units][] */
export type Allocation = Array<Array<[number, number]>>;

export interface SearchResult {
  allocation: Allocation;
  unfilledUnits: number;
  costCents: number;
  /** True when branch and bound ran to the end: the plan is optimal. */
  complete: boolean;
  /** Lower bound on the cost of any plan leaving no more than the necessary units unfilled. */
  rootLowerBoundCents: number;
  /** Units no plan can fill (stock summed per need, ignoring sharing): the bound's premise. */
  minUnfilledUnits: number;
  nodes: number;
}

export interface SearchOptions {
  /** Branch-and-bound node budget; beyond it the plan is the best found (heuristic). */
  maxNodes: number;
}

/** Mutable per-seller totals with cached shipping, for the heuristic. */
class Ledger {
  readonly sub: number[];
  readonly units: number[];
  readonly grams: number[];
  readonly ship: number[];
  readonly stockLeft: number[];
  items = 0;
  shipFinite = 0;
  refused = 0;

  constructor(private readonly m: SearchModel) {
    const n = m.profiles.length;
    this.sub = new Array<number>(n).fill(0);
    this.units = new Array<number>(n).fill(0);
    this.grams = new Array<number>(n).fill(0);
    this.ship = new Array<number>(n).fill(0);
    this.stockLeft = m.stock.slice();
  }

  total(): number {
    return this.refused > 0 ? Infinity : this.items + this.shipFinite;
  }

  /** Shipping of seller k if `units` more of listing l were added (negative to remove). */
  shipWith(l: number, units: number): number {
    const k = this.m.seller[l];
    return shipmentCostCents(
      this.m.profiles[k],
      {
        subtotalCents: this.sub[k] + units * this.m.price[l],
        units: this.units[k] + units,
        billableGrams: this.grams[k] + units * this.m.unitGrams[l],
      },
      this.m.destination,
    );
  }

  /** Landed-cost change of adding `units` of listing l. */
  delta(l: number, units: number): number {
    const k = this.m.seller[l];
    return units * this.m.price[l] + this.shipWith(l, units) - this.ship[k];
  }

  add(l: number, units: number): void {
    const m = this.m;
    const k = m.seller[l];
    const next = this.shipWith(l, units);
    this.stockLeft[l] -= units;
    this.sub[k] += units * m.price[l];
    this.units[k] += units;
    this.grams[k] += units * m.unitGrams[l];
    this.items += units * m.price[l];
    if (this.ship[k] === Infinity) this.refused--;
    else this.shipFinite -= this.ship[k];
    this.ship[k] = next;
    if (next === Infinity) this.refused++;
    else this.shipFinite += next;
  }

  remove(l: number, units: number): void {
    this.add(l, -units);
  }
}

interface Candidate {
  alloc: Array<[number, number]>;
  filled: number;
  delta: number;
}

/** Lexicographic (unfilled units, cost); an infinite cost (a refused shipment) is never better. */
function better(aU: number, aC: number, bU: number, bC: number): boolean {
  return aC !== Infinity && (aU < bU || (aU === bU && aC < bC));
}

/** Heuristic: greedy construction then local improvement until nothing improves. */
class LocalSearch {
  readonly ledger: Ledger;
  readonly alloc: Allocation;

  constructor(private readonly m: SearchModel) {
    this.ledger = new Ledger(m);
    this.alloc = m.quantity.map(() => []);
  }

  unfilled(): number {
    let u = 0;
    this.m.quantity.forEach((q, i) => {
      u += q - this.filledOf(i);
    });
    return u;
  }

  private filledOf(i: number): number {
    let f = 0;
    for (const [, x] of this.alloc[i]) f += x;
    return f;
  }

  /** Copy of the current allocation. */
  snapshot(): Allocation {
    return this.alloc.map((a) => a.map(([l, x]) => [l, x] as [number, number]));
  }

  takeNeed(i: number): void {
    this.take(i);
  }

  applyNeed(i: number, a: Array<[number, number]>): void {
    this.apply(i, a.map(([l, x]) => [l, x] as [number, number]));
  }

  private apply(i: number, a: Array<[number, number]>): void {
    for (const [l, x] of a) this.ledger.add(l, x);
    this.alloc[i] = a;
  }

  private take(i: number): Array<[number, number]> {
    const old = this.alloc[i];
    for (const [l, x] of old) this.ledger.remove(l, x);
    this.alloc[i] = [];
    return old;
  }

  /** Best allocation of need i with everything else fixed (need i must be taken out first). */
  private best(i: number, allowed: (l: number) => boolean): Candidate {
    const m = this.m;
    const q = m.quantity[i];
    const led = this.ledger;
    let bestC: Candidate = { alloc: [], filled: 0, delta: 0 };
    // Whole quantity from one listing.
    for (const l of m.candidates[i]) {
      if (!allowed(l) || led.stockLeft[l] < q) continue;
      const d = led.delta(l, q);
      if (d === Infinity) continue;
      if (better(0, d, q - bestC.filled, bestC.delta)) bestC = { alloc: [[l, q]], filled: q, delta: d };
    }
    // Greedy split by cost per unit, for needs no single listing covers (or covers dearly).
    const before = led.total();
    const split: Array<[number, number]> = [];
    let rem = q;
    while (rem > 0) {
      let pick = -1;
      let pickUnits = 0;
      let pickRate = Infinity;
      for (const l of m.candidates[i]) {
        if (!allowed(l) || led.stockLeft[l] <= 0) continue;
        const t = Math.min(rem, led.stockLeft[l]);
        const rate = led.delta(l, t) / t;
        if (rate < pickRate) {
          pick = l;
          pickUnits = t;
          pickRate = rate;
        }
      }
      if (pick === -1) break;
      led.add(pick, pickUnits);
      split.push([pick, pickUnits]);
      rem -= pickUnits;
    }
    const splitDelta = led.total() - before;
    for (const [l, x] of split) led.remove(l, x);
    if (split.length > 0 && better(rem, splitDelta, q - bestC.filled, bestC.delta)) {
      bestC = { alloc: split, filled: q - rem, delta: splitDelta };
    }
    return bestC;
  }

  /** Greedy construction: most constrained needs first. */
  construct(order: number[]): void {
    for (const i of order) this.apply(i, this.best(i, () => true).alloc);
  }

  private reinsertPass(order: number[]): boolean {
    let improved = false;
    for (const i of order) {
      const u0 = this.unfilled();
      const t0 = this.ledger.total();
      const old = this.take(i);
      const cand = this.best(i, () => true);
      this.apply(i, cand.alloc);
      if (better(this.unfilled(), this.ledger.total(), u0, t0)) improved = true;
      else {
        this.take(i);
        this.apply(i, old);
      }
    }
    return improved;
  }

  private sellersUsed(): number[] {
    const used: number[] = [];
    this.ledger.units.forEach((u, k) => {
      if (u > 0) used.push(k);
    });
    return used;
  }

  /** Re-plans the given needs one by one under `allowed`; keeps the result only when the plan improves. */
  private tryReplan(needs: number[], allowed: (l: number) => boolean, keepOldIfLessFilled: boolean): boolean {
    const u0 = this.unfilled();
    const t0 = this.ledger.total();
    const saved = needs.map((i) => this.take(i));
    needs.forEach((i, n) => {
      const cand = this.best(i, allowed);
      const oldFilled = saved[n].reduce((a, [, x]) => a + x, 0);
      if (keepOldIfLessFilled && cand.filled < oldFilled) {
        // An earlier need in this move may have taken stock the old allocation used.
        const fits = saved[n].every(([l, x]) => this.ledger.stockLeft[l] >= x);
        this.apply(i, fits ? saved[n] : this.best(i, () => true).alloc);
      } else this.apply(i, cand.alloc);
    });
    if (better(this.unfilled(), this.ledger.total(), u0, t0)) return true;
    for (const i of needs) this.take(i);
    needs.forEach((i, n) => this.apply(i, saved[n]));
    return false;
  }

  private dropPass(): boolean {
    let improved = false;
    for (const k of this.sellersUsed()) {
      if (this.ledger.units[k] === 0) continue;
      const affected: number[] = [];
      this.alloc.forEach((a, i) => {
        if (a.some(([l]) => this.m.seller[l] === k)) affected.push(i);
      });
      if (this.tryReplan(affected, (l) => this.m.seller[l] !== k, false)) improved = true;
    }
    return improved;
  }

  private consolidatePass(bySeller: number[][]): boolean {
    let improved = false;
    bySeller.forEach((needs, k) => {
      if (needs.length === 0) return;
      if (this.tryReplan(needs, (l) => this.m.seller[l] === k, true)) improved = true;
    });
    return improved;
  }

  improve(order: number[], maxRounds: number): void {
    const bySeller: number[][] = this.m.profiles.map(() => []);
    this.m.candidates.forEach((cs, i) => {
      const seen = new Set<number>();
      for (const l of cs) {
        const k = this.m.seller[l];
        if (!seen.has(k)) {
          seen.add(k);
          bySeller[k].push(i);
        }
      }
    });
    for (let round = 0; round < maxRounds; round++) {
      let improved = this.reinsertPass(order);
      improved = this.consolidatePass(bySeller) || improved;
      improved = this.dropPass() || improved;
      if (!improved) break;
    }
  }
}

/** Exact cost of an allocation (Infinity when a seller refuses its shipment). */
export function allocationCost(m: SearchModel, allocation: Allocation): { unfilledUnits: number; costCents: number } {
  const led = new Ledger(m);
  let unfilledUnits = 0;
  allocation.forEach((a, i) => {
    let f = 0;
    for (const [l, x] of a) {
      if (!m.candidates[i].includes(l) || !Number.isInteger(x) || x <= 0) throw new Error('internal: allocation uses a listing the need cannot take');
      led.add(l, x);
      f += x;
    }
    if (f > m.quantity[i]) throw new Error('internal: allocation buys more than the need');
    unfilledUnits += m.quantity[i] - f;
  });
  if (led.stockLeft.some((s) => s < 0)) throw new Error('internal: allocation oversells a listing');
  return { unfilledUnits, costCents: led.total() };
}

/** Per-profile helpers for the shipping lower bound. */
interface BoundProfile {
  profile: ShippingProfile;
  /** weight_bands: suffixMin[b] = cheapest band amount from band b upwards (overMax included). */
  suffixMin: number[];
}

function boundProfile(profile: ShippingProfile): BoundProfile {
  const suffixMin: number[] = [];
  if (profile.kind === 'weight_bands') {
    let min = profile.overMaxCents ?? Infinity;
    for (let b = profile.bands.length - 1; b >= 0; b--) {
      min = Math.min(min, profile.bands[b].amountCents);
      suffixMin[b] = min;
    }
  }
  return { profile, suffixMin };
}

/**
 * Least shipping seller k can still end up charging, given its current (non-empty) shipment and an upper
 * bound on the item subtotal still to come. Valid because subtotal, units and weight only grow deeper in
 * the search; free-above is the one rule that can lower the charge, so it counts whenever reachable.
 */
function shippingLowerBound(bp: BoundProfile, sub: number, units: number, grams: number, potential: number, pickup: boolean): number {
  if (pickup) return 0;
  const p = bp.profile;
  let band = -1;
  if (p.kind === 'weight_bands') {
    band = p.bands.findIndex((b) => grams <= b.upToGrams);
    if (band === -1 && (p.overMaxCents === null || p.overMaxCents === undefined)) return Infinity;
  }
  if (p.freeAboveCents !== null && p.freeAboveCents !== undefined && sub + potential >= p.freeAboveCents) return 0;
  switch (p.kind) {
    case 'flat_per_order':
      return p.amountCents;
    case 'per_item':
      return p.firstItemCents + p.additionalItemCents * (units - 1);
    case 'weight_bands':
      return band === -1 ? (p.overMaxCents as number) : bp.suffixMin[band];
    case 'pickup_only':
      return 0;
  }
}

/**
 * Lower bound from the facility-location view of the plan: opening seller k costs at least minShipNew[k],
 * serving need i from seller k costs at least its fillable units at k's cheapest acceptable price. Any
 * feasible solution of that problem's LP dual bounds it from below; dual ascent (raise each need's value
 * until some seller's opening charge is used up) finds a good one in a few passes.
 */
function facilityDualBound(m: SearchModel, fillable: number[], minShipNew: number[], potential: number[]): number {
  // Per-item shipping splits exactly into an opening charge and a charge per unit:
  // first + additional x (units - 1) = (first - additional) + additional x units.
  const opening = minShipNew.slice();
  const perUnit = minShipNew.map(() => 0);
  if (!('pickup' in m.destination)) {
    m.profiles.forEach((p, k) => {
      const freeReachable = p.freeAboveCents !== null && p.freeAboveCents !== undefined && potential[k] >= p.freeAboveCents;
      if (p.kind === 'per_item' && !freeReachable && p.firstItemCents >= p.additionalItemCents) {
        opening[k] = p.firstItemCents - p.additionalItemCents;
        perUnit[k] = p.additionalItemCents;
      }
    });
  }
  const rows = m.candidates.map((cs, i) => {
    const best = new Map<number, number>();
    for (const l of cs) {
      const k = m.seller[l];
      const c = fillable[i] * (m.price[l] + perUnit[k]);
      if (!best.has(k) || c < (best.get(k) as number)) best.set(k, c);
    }
    return [...best.entries()].map(([k, c]) => ({ k, c })).sort((a, b) => a.c - b.c || a.k - b.k);
  });
  const slack = opening;
  const v = rows.map((r, i) => (fillable[i] > 0 && r.length > 0 ? r[0].c : 0));
  for (let pass = 0; pass < 100; pass++) {
    let changed = false;
    rows.forEach((r, i) => {
      if (fillable[i] === 0 || r.length === 0) return;
      let minSlack = Infinity;
      let next = Infinity;
      for (const e of r) {
        if (e.c <= v[i]) minSlack = Math.min(minSlack, slack[e.k]);
        else {
          next = e.c;
          break;
        }
      }
      const step = Math.min(minSlack, next - v[i]);
      if (step > 0 && step !== Infinity) {
        for (const e of r) if (e.c <= v[i]) slack[e.k] -= step;
        v[i] += step;
        changed = true;
      }
    });
    if (!changed) break;
  }
  return v.reduce((a, b) => a + b, 0);
}

/** Bounds that depend only on the model (not on the search position). */
interface StaticBounds {
  order: number[];
  fillable: number[];
  contrib: number[][];
  potential: number[];
  bps: BoundProfile[];
  minShipNew: number[];
}

function staticBounds(m: SearchModel, order: number[], base: Base | null): StaticBounds {
  const nSellers = m.profiles.length;
  const pickup = 'pickup' in m.destination;
  const cands = m.candidates;
  const fillable = m.quantity.map((q, i) => Math.min(q, cands[i].reduce((a, l) => a + m.stock[l], 0)));
  const contrib = cands.map((cs, i) => cs.map((l) => m.price[l] * Math.min(m.stock[l], m.quantity[i])));
  const potential = new Array<number>(nSellers).fill(0);
  cands.forEach((cs, i) => cs.forEach((l, c) => (potential[m.seller[l]] += contrib[i][c])));
  const bps = m.profiles.map(boundProfile);
  // Least shipping any non-empty shipment from seller k can cost (0 where the base already ships).
  const minShipNew = new Array<number>(nSellers).fill(Infinity);
  cands.forEach((cs) =>
    cs.forEach((l) => {
      const k = m.seller[l];
      const b = base && base.units[k] > 0;
      const lb = b ? 0 : shippingLowerBound(bps[k], m.price[l], 1, m.unitGrams[l], potential[k], pickup);
      if (lb < minShipNew[k]) minShipNew[k] = lb;
    }),
  );
  return { order, fillable, contrib, potential, bps, minShipNew };
}

/** Shipments fixed outside a sub-problem (large-neighbourhood search), per seller. */
interface Base {
  sub: number[];
  units: number[];
  grams: number[];
}

interface Incumbent {
  unfilled: number;
  cost: number;
  alloc: Allocation;
}

/**
 * Depth-first branch and bound: needs in `order`, and within a need its candidates cheapest first, taking
 * as many units as possible first. Returns a strictly better plan than the incumbent, or the incumbent.
 * With a base, costs count the sub-problem's items plus every seller's shipping (base shipments included).
 */
function branchAndBound(m: SearchModel, sb: StaticBounds, base: Base | null, incumbent: Incumbent, maxNodes: number) {
  const nNeeds = m.quantity.length;
  const nSellers = m.profiles.length;
  const pickup = 'pickup' in m.destination;
  const cands = m.candidates;
  const { order, fillable, contrib, potential, bps, minShipNew } = sb;
  const potentialNow = potential.slice();

  const minPrice = cands.map((cs) => (cs.length > 0 ? m.price[cs[0]] : 0));
  const sufShort = new Array<number>(nNeeds + 1).fill(0);
  const sufItems = new Array<number>(nNeeds + 1).fill(0);
  for (let p = nNeeds - 1; p >= 0; p--) {
    const i = order[p];
    sufShort[p] = sufShort[p + 1] + m.quantity[i] - fillable[i];
    sufItems[p] = sufItems[p + 1] + fillable[i] * minPrice[i];
  }

  let bestU = incumbent.unfilled;
  let bestCost = incumbent.cost;
  let bestAlloc = incumbent.alloc;

  const sub = base ? base.sub.slice() : new Array<number>(nSellers).fill(0);
  const units = base ? base.units.slice() : new Array<number>(nSellers).fill(0);
  const grams = base ? base.grams.slice() : new Array<number>(nSellers).fill(0);
  const lbCache = new Array<number>(nSellers).fill(0);
  const stockLeft = m.stock.slice();
  const choice = cands.map((cs) => new Array<number>(cs.length).fill(0));
  let lbSum = 0;
  let lbInf = 0;
  let items = 0;
  let unfilledSoFar = 0;
  let nodes = 0;
  let aborted = false;

  const refresh = (k: number): void => {
    const next = units[k] === 0 ? 0 : shippingLowerBound(bps[k], sub[k], units[k], grams[k], potentialNow[k], pickup);
    const prev = lbCache[k];
    if (prev === Infinity) lbInf--;
    else lbSum -= prev;
    if (next === Infinity) lbInf++;
    else lbSum += next;
    lbCache[k] = next;
  };
  for (let k = 0; k < nSellers; k++) if (units[k] > 0) refresh(k);

  // A need still to come must open at least one of its sellers, at that seller's least charge.
  const newSellerTerm = (from: number): number => {
    let maxOne = 0;
    for (let p = from; p < nNeeds; p++) {
      const i = order[p];
      if (fillable[i] === 0) continue;
      let min = Infinity;
      for (const l of cands[i]) {
        if (stockLeft[l] <= 0) continue;
        const k = m.seller[l];
        const c = units[k] > 0 ? 0 : minShipNew[k];
        if (c < min) min = c;
      }
      if (min !== Infinity && min > maxOne) maxOne = min;
    }
    return maxOne;
  };

  const prunes = (uLB: number, cLB: number): boolean => uLB > bestU || (uLB === bestU && cLB >= bestCost);

  const leaf = (): void => {
    let cost = items;
    for (let k = 0; k < nSellers; k++) {
      if (units[k] === 0) continue;
      cost += shipmentCostCents(m.profiles[k], { subtotalCents: sub[k], units: units[k], billableGrams: grams[k] }, m.destination);
    }
    if (!better(unfilledSoFar, cost, bestU, bestCost)) return;
    bestU = unfilledSoFar;
    bestCost = cost;
    bestAlloc = cands.map((cs, i) => {
      const a: Array<[number, number]> = [];
      cs.forEach((l, c) => {
        if (choice[i][c] > 0) a.push([l, choice[i][c]]);
      });
      return a;
    });
  };

  const visitNeed = (p: number): void => {
    if (++nodes > maxNodes) {
      aborted = true;
      return;
    }
    if (p === nNeeds) {
      leaf();
      return;
    }
    if (lbInf > 0) return;
    const uLB = unfilledSoFar + sufShort[p];
    const cLB = items + lbSum + sufItems[p] + newSellerTerm(p);
    if (prunes(uLB, cLB)) return;
    visitCandidate(p, 0, m.quantity[order[p]]);
  };

  const visitCandidate = (p: number, c: number, r: number): void => {
    if (++nodes > maxNodes) {
      aborted = true;
      return;
    }
    const i = order[p];
    const cs = cands[i];
    if (r === 0 || c === cs.length) {
      unfilledSoFar += r;
      visitNeed(p + 1);
      unfilledSoFar -= r;
      return;
    }
    const l = cs[c];
    const k = m.seller[l];
    const price = m.price[l];
    const g = m.unitGrams[l];
    potentialNow[k] -= contrib[i][c];
    refresh(k);
    for (let x = Math.min(r, stockLeft[l]); x >= 0 && !aborted; x--) {
      if (x > 0) {
        stockLeft[l] -= x;
        sub[k] += x * price;
        units[k] += x;
        grams[k] += x * g;
        items += x * price;
        refresh(k);
      }
      if (lbInf === 0) {
        // What the rest of this need can still take, and at what least price (candidates are by price).
        let remStock = 0;
        let nextPrice = 0;
        for (let c2 = c + 1; c2 < cs.length; c2++) {
          const st = stockLeft[cs[c2]];
          if (st > 0) {
            if (remStock === 0) nextPrice = m.price[cs[c2]];
            remStock += st;
          }
        }
        const rr = r - x;
        const uLB = unfilledSoFar + Math.max(0, rr - remStock) + sufShort[p + 1];
        const cLB = items + lbSum + Math.min(rr, remStock) * nextPrice + sufItems[p + 1];
        if (!prunes(uLB, cLB)) {
          choice[i][c] = x;
          visitCandidate(p, c + 1, rr);
          choice[i][c] = 0;
        }
      }
      if (x > 0) {
        stockLeft[l] += x;
        sub[k] -= x * price;
        units[k] -= x;
        grams[k] -= x * g;
        items -= x * price;
        refresh(k);
      }
    }
    potentialNow[k] += contrib[i][c];
    refresh(k);
  };

  if (maxNodes > 0) visitNeed(0);
  return { alloc: bestAlloc, unfilled: bestU, cost: bestCost, complete: maxNodes > 0 && !aborted, nodes: Math.min(nodes, maxNodes) };
}

/**
 * Large-neighbourhood search: for each seller, free the needs it could serve (at most `size`), keep the rest
 * of the plan fixed, and search that sub-problem exactly (within a node budget); keep strict improvements.
 */
function improveByNeighbourhoods(m: SearchModel, ls: LocalSearch, order: number[], nodeBudget: number, size: number): number {
  const bySeller: number[][] = m.profiles.map(() => []);
  m.candidates.forEach((cs, i) => {
    for (const k of new Set(cs.map((l) => m.seller[l]))) bySeller[k].push(i);
  });
  const perProblem = Math.max(2_000, Math.floor(nodeBudget / Math.max(1, 3 * bySeller.length)));
  let used = 0;
  for (let pass = 0; pass < 3 && used < nodeBudget; pass++) {
    let improved = false;
    for (let k = 0; k < bySeller.length && used < nodeBudget; k++) {
      if (bySeller[k].length < 2) continue;
      // The seller's needs, a window of them per pass so each sub-problem stays small.
      const all = bySeller[k];
      const freed = all.length <= size ? all : [...all, ...all].slice((pass * size) % all.length, ((pass * size) % all.length) + size).sort((a, b) => a - b);
      const led = ls.ledger;
      const saved = freed.map((i) => ls.alloc[i]);
      const u0 = ls.unfilled();
      const t0 = led.total();
      for (const i of freed) ls.takeNeed(i);
      const base: Base = { sub: led.sub.slice(), units: led.units.slice(), grams: led.grams.slice() };
      const subModel: SearchModel = {
        ...m,
        quantity: freed.map((i) => m.quantity[i]),
        candidates: freed.map((i) => m.candidates[i]),
        stock: led.stockLeft.slice(),
      };
      // In the sub-problem's terms: units unfilled among the freed needs; their items plus all shipping.
      const fixedUnfilled = ls.unfilled() - freed.reduce((a, i) => a + m.quantity[i], 0);
      const subOrder = [...freed.keys()].sort((a, b) => subModel.candidates[a].length - subModel.candidates[b].length || a - b);
      const sb = staticBounds(subModel, subOrder, base);
      const r = branchAndBound(subModel, sb, base, { unfilled: u0 - fixedUnfilled, cost: t0 - led.items, alloc: saved }, perProblem);
      used += r.nodes;
      const alloc = r.alloc;
      freed.forEach((i, n) => ls.applyNeed(i, alloc[n]));
      if (better(ls.unfilled(), led.total(), u0, t0)) improved = true;
      else {
        for (const i of freed) ls.takeNeed(i);
        freed.forEach((i, n) => ls.applyNeed(i, saved[n]));
      }
    }
    if (!improved) break;
    ls.improve(order, 5);
  }
  return used;
}

/** Heuristic plan, then branch and bound to prove or improve it. */
export function search(m: SearchModel, options: SearchOptions): SearchResult {
  const nNeeds = m.quantity.length;
  const cands = m.candidates;

  // Most constrained needs first, for the greedy and the tree alike.
  const order = [...Array(nNeeds).keys()].sort((a, b) => cands[a].length - cands[b].length || a - b);

  const ls = new LocalSearch(m);
  ls.construct(order);
  ls.improve(order, 30);

  const sb = staticBounds(m, order, null);
  const fullBudget = Math.floor(options.maxNodes / 3);
  let r = branchAndBound(m, sb, null, { unfilled: ls.unfilled(), cost: ls.ledger.total(), alloc: ls.snapshot() }, fullBudget);
  let nodes = r.nodes;
  if (!r.complete && options.maxNodes > 0) {
    // Too big to prove: spend the rest on neighbourhoods around the best plan, then one more full try.
    for (let i = 0; i < nNeeds; i++) ls.takeNeed(i);
    for (let i = 0; i < nNeeds; i++) ls.applyNeed(i, r.alloc[i]);
    nodes += improveByNeighbourhoods(m, ls, order, options.maxNodes - nodes, 8);
    r = { alloc: ls.snapshot(), unfilled: ls.unfilled(), cost: ls.ledger.total(), complete: false, nodes: 0 };
  }

  const rootLowerBoundCents = Math.max(
    bestSimpleBound(m, sb),
    facilityDualBound(m, sb.fillable, sb.minShipNew, sb.potential),
  );
  return {
    allocation: r.alloc,
    unfilledUnits: r.unfilled,
    costCents: r.cost,
    complete: r.complete,
    rootLowerBoundCents,
    minUnfilledUnits: m.quantity.reduce((a, q, i) => a + q - sb.fillable[i], 0),
    nodes,
  };
}

/**
 * Items at their cheapest, plus shipping that needs with pairwise disjoint seller sets cannot avoid: each
 * opens a different seller.
 */
function bestSimpleBound(m: SearchModel, sb: StaticBounds): number {
  let items = 0;
  const picks: Array<{ cost: number; sellers: number[] }> = [];
  m.candidates.forEach((cs, i) => {
    if (sb.fillable[i] === 0 || cs.length === 0) return;
    items += sb.fillable[i] * m.price[cs[0]];
    const sellers = [...new Set(cs.map((l) => m.seller[l]))];
    const cost = Math.min(...sellers.map((k) => sb.minShipNew[k]));
    if (cost > 0) picks.push({ cost, sellers });
  });
  picks.sort((a, b) => b.cost - a.cost);
  const taken = new Set<number>();
  let ship = 0;
  for (const pk of picks) {
    if (pk.sellers.some((k) => taken.has(k))) continue;
    pk.sellers.forEach((k) => taken.add(k));
    ship += pk.cost;
  }
  return items + ship;
}
