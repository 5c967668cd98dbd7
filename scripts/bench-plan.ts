/*
 * Sourcing-plan benchmark (`npm run bench:plan`). Seeded, fictional instances; prints figures and PASS/FAIL
 * against the targets:
 *   1. 40 needs over 600 candidate listings from 60 sellers: median time under 1 s; total, bound, gap.
 *   2. Random small instances (12 needs or fewer, at most 3 candidates each): the plan must cost exactly
 *      the exhaustive optimum on every one.
 * Always exits 0; read the PASS/FAIL lines.
 */
import { bruteForceSourcing } from '../server/domain/sourcing-brute-force';
import { planSourcing, type SourcingPlan } from '../server/domain/sourcing-plan';
import { randomSourcingInstance } from '../server/domain/sourcing-random';

const cents = (c: number) => `${(c / 100).toFixed(2)}`;
const verdict = (ok: boolean) => (ok ? 'PASS' : 'FAIL');

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

function largeInstance(): void {
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
  const sellersUsed = new Set(input.listings.map((l) => l.sellerId)).size;
  console.log(`\n1. Large instance: ${input.needs.length} needs, ${input.listings.length} candidate listings, ${sellersUsed} sellers (seed 2024)`);
  const times: number[] = [];
  let plan: SourcingPlan | undefined;
  for (let run = 0; run < 5; run++) {
    const t0 = performance.now();
    plan = planSourcing(input);
    times.push(performance.now() - t0);
  }
  if (!plan) return;
  const ms = median(times);
  const units = plan.assignments.reduce((a, x) => a + x.quantity, 0);
  console.log(`   runs (ms):        ${times.map((t) => t.toFixed(1)).join(', ')}`);
  console.log(`   median time:      ${ms.toFixed(1)} ms`);
  console.log(`   method:           ${plan.method} (${plan.nodesExplored} search nodes)`);
  console.log(`   total:            ${cents(plan.totalCents)} (items ${cents(plan.itemsCents)} + shipping ${cents(plan.shippingCents)}; ${units} units from ${plan.perSeller.length} sellers)`);
  console.log(`   lower bound:      ${cents(plan.lowerBoundCents)}`);
  console.log(`   gap:              ${cents(plan.gapCents)} (${plan.gapPercent.toFixed(2)} % of total; an upper bound on how far from optimal)`);
  console.log(`   unfilled needs:   ${plan.unfilled.length}`);
  console.log(`   ${verdict(ms < 1000)}  40 needs planned in under 1 s (median ${ms.toFixed(1)} ms)`);
}

function smallInstances(count: number): void {
  console.log(`\n2. ${count} random small instances (1-12 needs, 1-3 candidates per need), against exhaustive search`);
  let optimal = 0;
  let exactMethod = 0;
  let worstGap = 0;
  let worstSeed = -1;
  let planMs = 0;
  let bruteMs = 0;
  let plansPriced = 0;
  let largestSpace = 0;
  const failures: string[] = [];
  for (let n = 0; n < count; n++) {
    const seed = 10_000 + n;
    // Every fourth instance is the worst case: 12 needs with exactly 3 candidates each (3^12 = 531441 plans).
    const worst = n % 4 === 3;
    const input = randomSourcingInstance(seed, {
      needs: worst ? 12 : 1 + (n % 12),
      candidatesPerNeed: 3,
      fixedCandidates: worst,
      sellers: 2 + (n % 7),
      maxQuantity: worst ? 1 : 2,
      maxAvailable: 3,
      shareChance: 0,
      policyChance: worst ? 0 : 0.3,
    });
    const t0 = performance.now();
    const plan = planSourcing(input);
    const t1 = performance.now();
    const best = bruteForceSourcing(input);
    const t2 = performance.now();
    planMs += t1 - t0;
    bruteMs += t2 - t1;
    plansPriced += best.plansPriced;
    largestSpace = Math.max(largestSpace, best.plansPriced);
    if (plan.method === 'exact') exactMethod++;
    const missing = plan.unfilled.reduce((a, u) => a + u.missing, 0);
    if (missing === best.unfilledUnits && plan.totalCents === best.totalCents) optimal++;
    else {
      const gap = missing === best.unfilledUnits ? (plan.totalCents - best.totalCents) / best.totalCents : Infinity;
      if (gap > worstGap) {
        worstGap = gap;
        worstSeed = seed;
      }
      failures.push(`seed ${seed}: plan ${cents(plan.totalCents)} (${missing} unfilled) vs optimum ${cents(best.totalCents)} (${best.unfilledUnits} unfilled)`);
    }
  }
  console.log(`   optimal:          ${optimal} / ${count}`);
  console.log(`   proved exact:     ${exactMethod} / ${count} (method 'exact')`);
  console.log(`   worst gap:        ${worstGap === 0 ? '0 (none)' : `${(worstGap * 100).toFixed(2)} % (seed ${worstSeed})`}`);
  console.log(`   time:             planner ${planMs.toFixed(0)} ms in all; exhaustive ${bruteMs.toFixed(0)} ms, ${plansPriced} plans priced (largest ${largestSpace})`);
  for (const f of failures.slice(0, 10)) console.log(`   ${f}`);
  console.log(`   ${verdict(optimal === count)}  optimal on every instance of 12 needs or fewer (${optimal}/${count})`);
}

console.log('Drabyard sourcing-plan benchmark (fictional, seeded data)');
largeInstance();
smallInstances(Number(process.env.BENCH_PLAN_SMALL ?? 200));
