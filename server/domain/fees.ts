/*
 * Platform fees and the split of one multi-seller checkout. Integer cents throughout; every split adds up
 * exactly: sum(seller shares) + sum(platform fees) === amount charged.
 */

/**
 * Platform fee schedule in basis points (1 bps = 0.01 %), by listing category. Drabyard's own invented
 * schedule, not a published one; pass a different table to change it.
 */
export interface FeeTable {
  defaultBps: number;
  byCategory: Readonly<Record<string, number>>;
}

export const DEFAULT_FEE_TABLE: FeeTable = {
  defaultBps: 800,
  byCategory: {
    small_hardware: 1000,
    heavy_bulky: 600,
  },
};

export interface CheckoutLine {
  category: string;
  amountCents: number;
}

export interface CheckoutSeller {
  sellerId: string;
  lines: readonly CheckoutLine[];
  shippingCents: number;
}

export interface SplitLine extends CheckoutLine {
  feeBps: number;
  feeCents: number;
}

export interface SellerSplit {
  sellerId: string;
  itemsCents: number;
  shippingCents: number;
  feeCents: number;
  /** What the seller is paid: items + shipping - fee. */
  shareCents: number;
  lines: SplitLine[];
}

export interface CheckoutSplit {
  sellers: SellerSplit[];
  totals: {
    itemsCents: number;
    shippingCents: number;
    /** Amount charged to the buyer: items + shipping of every seller. */
    chargeCents: number;
    feeCents: number;
    shareCents: number;
  };
}

function fail(message: string): never {
  throw new RangeError(message);
}

function checkCents(value: number, name: string): void {
  if (!Number.isSafeInteger(value) || value < 0) fail(`${name} must be a non-negative integer of cents, got ${value}`);
}

function checkBps(value: number, name: string): void {
  if (!Number.isInteger(value) || value < 0 || value > 10_000) fail(`${name} must be an integer 0..10000 bps, got ${value}`);
}

function checkFeeTable(table: FeeTable): void {
  checkBps(table.defaultBps, 'feeTable.defaultBps');
  for (const [category, bps] of Object.entries(table.byCategory)) checkBps(bps, `feeTable.byCategory.${category}`);
}

export function feeBpsFor(category: string, table: FeeTable = DEFAULT_FEE_TABLE): number {
  return Object.hasOwn(table.byCategory, category) ? table.byCategory[category] : table.defaultBps;
}

/** Round half up of numerator / denominator for non-negative values. */
function roundHalfUp(numerator: bigint, denominator: bigint): bigint {
  return (2n * numerator + denominator) / (2n * denominator);
}

/**
 * Largest-remainder apportionment: shares are numerators[i] / denominator, floored, and the `total - sum of
 * floors` leftover cents go one each to the largest remainders; ties go to the earlier index so the result
 * is deterministic. The caller guarantees total - sum(floors) lies in [0, count of non-zero remainders].
 */
function largestRemainder(numerators: readonly bigint[], denominator: bigint, total: bigint): number[] {
  const floors = numerators.map((n) => n / denominator);
  const remainders = numerators.map((n) => n % denominator);
  let leftover = total - floors.reduce((a, b) => a + b, 0n);
  const order = numerators
    .map((_, i) => i)
    .sort((a, b) => (remainders[b] > remainders[a] ? 1 : remainders[b] < remainders[a] ? -1 : a - b));
  for (const i of order) {
    if (leftover <= 0n) break;
    floors[i] += 1n;
    leftover -= 1n;
  }
  if (leftover !== 0n) fail('internal: largest-remainder leftover out of range');
  return floors.map(Number);
}

/**
 * Splits totalCents in proportion to the weights (e.g. line amounts, for a partial refund), in whole cents,
 * adding up to totalCents exactly. Leftover cents go to the largest remainders, ties to the earlier entry.
 */
export function allocateProportionally(totalCents: number, weights: readonly number[]): number[] {
  checkCents(totalCents, 'totalCents');
  weights.forEach((w, i) => {
    if (!Number.isSafeInteger(w) || w < 0) fail(`weights[${i}] must be a non-negative integer, got ${w}`);
  });
  const sum = weights.reduce((a, b) => a + BigInt(b), 0n);
  if (sum === 0n) {
    if (totalCents === 0) return weights.map(() => 0);
    fail('cannot allocate a non-zero total over weights that are all zero');
  }
  const total = BigInt(totalCents);
  return largestRemainder(
    weights.map((w) => total * BigInt(w)),
    sum,
    total,
  );
}

/**
 * Platform fee of one seller's lines: the exact fee (sum of amount x bps / 10000) is rounded half up once,
 * on the seller's total, then handed out to the lines by largest remainder so the lines add up exactly.
 * Fees are charged on items only, never on shipping: shipping passes through to the seller, who pays the
 * carrier (our rule).
 */
export function feeForLines(lines: readonly CheckoutLine[], table: FeeTable = DEFAULT_FEE_TABLE): SplitLine[] {
  checkFeeTable(table);
  lines.forEach((l, i) => {
    if (typeof l.category !== 'string' || l.category === '') fail(`lines[${i}].category must be a non-empty string`);
    checkCents(l.amountCents, `lines[${i}].amountCents`);
  });
  const bps = lines.map((l) => feeBpsFor(l.category, table));
  const exact = lines.map((l, i) => BigInt(l.amountCents) * BigInt(bps[i]));
  const total = roundHalfUp(
    exact.reduce((a, b) => a + b, 0n),
    10_000n,
  );
  const perLine = largestRemainder(exact, 10_000n, total);
  return lines.map((l, i) => ({ category: l.category, amountCents: l.amountCents, feeBps: bps[i], feeCents: perLine[i] }));
}

/** Splits one checkout across its sellers: what each is paid, what the platform keeps, and totals. */
export function splitCheckout(sellers: readonly CheckoutSeller[], feeTable: FeeTable = DEFAULT_FEE_TABLE): CheckoutSplit {
  checkFeeTable(feeTable);
  const seen = new Set<string>();
  const out: SellerSplit[] = sellers.map((s, i) => {
    if (typeof s.sellerId !== 'string' || s.sellerId === '') fail(`sellers[${i}].sellerId must be a non-empty string`);
    if (seen.has(s.sellerId)) fail(`seller ${s.sellerId} appears twice; merge its lines first`);
    seen.add(s.sellerId);
    checkCents(s.shippingCents, `sellers[${i}].shippingCents`);
    const lines = feeForLines(s.lines, feeTable);
    const itemsCents = lines.reduce((a, l) => a + l.amountCents, 0);
    const feeCents = lines.reduce((a, l) => a + l.feeCents, 0);
    return {
      sellerId: s.sellerId,
      itemsCents,
      shippingCents: s.shippingCents,
      feeCents,
      shareCents: itemsCents + s.shippingCents - feeCents,
      lines,
    };
  });
  const sum = (pick: (s: SellerSplit) => number) => out.reduce((a, s) => a + pick(s), 0);
  const totals = {
    itemsCents: sum((s) => s.itemsCents),
    shippingCents: sum((s) => s.shippingCents),
    chargeCents: sum((s) => s.itemsCents + s.shippingCents),
    feeCents: sum((s) => s.feeCents),
    shareCents: sum((s) => s.shareCents),
  };
  if (!Number.isSafeInteger(totals.chargeCents)) fail('checkout total exceeds safe integers');
  if (totals.shareCents + totals.feeCents !== totals.chargeCents) fail('internal: split does not add up');
  return { sellers: out, totals };
}

/**
 * Estimated card processing cost of one charge: 2.9 % + 30 cents, +1.5 % for international cards, rounded
 * half up to the cent. Informational only (seller statements); the processor's own figure is what counts.
 * source: Card payments — Stripe's published pricing, via REFERENCES.md.
 */
export function cardProcessingEstimate(amountCents: number, options: { international?: boolean } = {}): number {
  checkCents(amountCents, 'amountCents');
  if (amountCents === 0) return 0; // no charge, nothing to process
  const bps = 290n + (options.international ? 150n : 0n);
  return Number(roundHalfUp(BigInt(amountCents) * bps, 10_000n)) + 30;
}
