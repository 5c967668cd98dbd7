import { z } from 'zod';

/*
 * Shipping rules of one seller: the profile they set up, the parcel weight the carrier bills, and the
 * amount one checkout pays a seller for shipping. Pure functions; integer cents and integer grams.
 */

/** 1 lb = 453.59237 g exactly (international avoirdupois pound); kept as an integer ratio for exact maths. */
const GRAMS_PER_LB_NUM = 45_359_237;
const GRAMS_PER_LB_DEN = 100_000;

/** Named divisors a seller may choose. Source: carriers' published rules (third-party copies), via REFERENCES.md. */
export const DIM_DIVISORS = {
  carrier_139: 139,
  retail_166: 166,
  metric_5000: 5000,
} as const;

export const dimDivisorSchema = z.enum(['carrier_139', 'retail_166', 'metric_5000']);
export type DimDivisor = z.infer<typeof dimDivisorSchema>;

const centsSchema = z.number().int().nonnegative().max(Number.MAX_SAFE_INTEGER);
const countryCodeSchema = z
  .string()
  .regex(/^([A-Z]{2}|\*)$/, 'use an ISO 3166-1 alpha-2 code in upper case, or "*" for everywhere');

const profileBase = {
  /** Shipping is free once the seller's item subtotal in this checkout reaches this amount (>=). */
  freeAboveCents: centsSchema.nullable().optional(),
  /** Destination countries; ['*'] ships everywhere; [] ships nowhere (pickup only in effect). */
  shipsTo: z.array(countryCodeSchema),
  /** Buyer may collect (at a show or the seller's yard) for 0 cents. */
  pickupAvailable: z.boolean().default(false),
  dimDivisor: dimDivisorSchema.default('carrier_139'),
};

const weightBandSchema = z.object({
  upToGrams: z.number().int().positive(),
  amountCents: centsSchema,
});

export const shippingProfileSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('flat_per_order'), amountCents: centsSchema, ...profileBase }),
  z.object({
    kind: z.literal('per_item'),
    firstItemCents: centsSchema,
    additionalItemCents: centsSchema,
    ...profileBase,
  }),
  z.object({
    kind: z.literal('weight_bands'),
    bands: z
      .array(weightBandSchema)
      .min(1)
      .refine((bands) => bands.every((b, i) => i === 0 || b.upToGrams > bands[i - 1].upToGrams), {
        message: 'bands must be listed by strictly increasing upToGrams',
      }),
    /** Charge for a shipment heavier than the last band; null or absent: such shipments are refused. */
    overMaxCents: centsSchema.nullable().optional(),
    ...profileBase,
  }),
  z.object({
    kind: z.literal('pickup_only'),
    ...profileBase,
    shipsTo: z.array(countryCodeSchema).default([]),
    pickupAvailable: z.boolean().default(true),
  }),
]);

export type ShippingProfile = z.output<typeof shippingProfileSchema>;
export type ShippingProfileInput = z.input<typeof shippingProfileSchema>;

export type ShippingDestination = { country: string } | { pickup: true };

export interface ShippingItem {
  listingId: string;
  quantity: number;
  unitPriceCents: number;
  /** Actual weight of one unit, packed. */
  weightGrams: number;
  /** Packed dimensions of one unit; 0 means unknown (actual weight only). */
  lengthMm: number;
  widthMm: number;
  heightMm: number;
}

export type ParcelDims = Pick<ShippingItem, 'weightGrams' | 'lengthMm' | 'widthMm' | 'heightMm'>;

/** What the quote depends on: the seller's part of one checkout, summed. */
export interface ShipmentSummary {
  subtotalCents: number;
  units: number;
  billableGrams: number;
}

export type ShippingRefusal = 'does_not_ship_to' | 'pickup_not_offered' | 'pickup_only' | 'over_weight_limit';

export type ShippingQuote =
  | { ok: true; amountCents: number; billableGrams: number; explanation: string }
  | { ok: false; reason: ShippingRefusal; billableGrams: number; explanation: string };

function fail(message: string): never {
  throw new RangeError(message);
}

function checkNonNegativeInt(value: number, name: string): void {
  if (!Number.isSafeInteger(value) || value < 0) fail(`${name} must be a non-negative integer, got ${value}`);
}

function checkPositiveFinite(value: number, name: string): void {
  if (!Number.isFinite(value) || value < 0) fail(`${name} must be a finite number >= 0, got ${value}`);
}

/**
 * Dimensional weight in whole pounds: each dimension rounded up to the next inch, L x W x H / divisor,
 * rounded up to the next whole pound.
 * source: Parcel dimensional weight — carriers' published rules (third-party copies), via REFERENCES.md.
 */
export function dimensionalWeightLb(lengthIn: number, widthIn: number, heightIn: number, divisor = 139): number {
  checkPositiveFinite(lengthIn, 'lengthIn');
  checkPositiveFinite(widthIn, 'widthIn');
  checkPositiveFinite(heightIn, 'heightIn');
  if (!Number.isSafeInteger(divisor) || divisor <= 0) fail(`divisor must be a positive integer, got ${divisor}`);
  const cubicInches = Math.ceil(lengthIn) * Math.ceil(widthIn) * Math.ceil(heightIn);
  return Math.ceil(cubicInches / divisor);
}

/**
 * Metric dimensional weight in kg: cm^3 / divisor (5000).
 * source: Parcel dimensional weight — carriers' published rules (third-party copies), via REFERENCES.md.
 * Rounding each side up to the whole centimetre is our choice (common practice, no published source); the
 * result is not rounded here — billableWeightGrams rounds it up to the whole gram.
 */
export function dimensionalWeightKgMetric(lengthCm: number, widthCm: number, heightCm: number, divisor = 5000): number {
  checkPositiveFinite(lengthCm, 'lengthCm');
  checkPositiveFinite(widthCm, 'widthCm');
  checkPositiveFinite(heightCm, 'heightCm');
  if (!Number.isSafeInteger(divisor) || divisor <= 0) fail(`divisor must be a positive integer, got ${divisor}`);
  return (Math.ceil(lengthCm) * Math.ceil(widthCm) * Math.ceil(heightCm)) / divisor;
}

/** Whole pounds to grams, rounded up to the gram (1 lb = 453.59237 g exactly). */
export function poundsToGramsCeil(lb: number): number {
  checkNonNegativeInt(lb, 'lb');
  return Math.ceil((lb * GRAMS_PER_LB_NUM) / GRAMS_PER_LB_DEN);
}

/** mm to whole inches, rounded up, in integer maths (25.4 mm = 1 in exactly). */
function mmToInchesCeil(mm: number): number {
  return Math.ceil((mm * 10) / 254);
}

function mmToCmCeil(mm: number): number {
  return Math.ceil(mm / 10);
}

function checkParcel(item: ParcelDims, label: string): void {
  checkNonNegativeInt(item.weightGrams, `${label}.weightGrams`);
  checkNonNegativeInt(item.lengthMm, `${label}.lengthMm`);
  checkNonNegativeInt(item.widthMm, `${label}.widthMm`);
  checkNonNegativeInt(item.heightMm, `${label}.heightMm`);
}

/**
 * Billable weight of one packed unit in grams: max(actual, dimensional), the dimensional part computed with
 * the seller's divisor (imperial divisors work in inches and whole pounds, metric in cm and kg).
 * Actual weight is taken as given, not rounded up to the pound (our choice: the bands are in grams).
 */
export function billableWeightGrams(item: ParcelDims, divisor: DimDivisor = 'carrier_139'): number {
  checkParcel(item, 'item');
  return unitBillableGrams(item, divisor);
}

function unitBillableGrams(item: ParcelDims, divisor: DimDivisor): number {
  let dimGrams: number;
  if (divisor === 'metric_5000') {
    const cm3 = mmToCmCeil(item.lengthMm) * mmToCmCeil(item.widthMm) * mmToCmCeil(item.heightMm);
    // cm^3 / 5000 kg = cm^3 / 5 g
    dimGrams = Math.ceil((cm3 * 1000) / DIM_DIVISORS.metric_5000);
  } else {
    const in3 = mmToInchesCeil(item.lengthMm) * mmToInchesCeil(item.widthMm) * mmToInchesCeil(item.heightMm);
    const lb = Math.ceil(in3 / DIM_DIVISORS[divisor]);
    dimGrams = Math.ceil((lb * GRAMS_PER_LB_NUM) / GRAMS_PER_LB_DEN);
  }
  return Math.max(item.weightGrams, dimGrams);
}

// Profiles checked once per object: the optimiser quotes the same profile many thousands of times.
const checkedProfiles = new WeakSet<object>();

/** Throws a RangeError naming every problem when the profile does not match the schema. */
export function assertShippingProfile(profile: unknown): asserts profile is ShippingProfile {
  if (typeof profile === 'object' && profile !== null && checkedProfiles.has(profile)) return;
  const parsed = shippingProfileSchema.safeParse(profile);
  if (!parsed.success) fail(`invalid shipping profile: ${z.prettifyError(parsed.error)}`);
  // Defaults must already be applied by the caller (parse the stored profile with the schema).
  const p = profile as Record<string, unknown>;
  if (p.pickupAvailable === undefined || p.dimDivisor === undefined || p.shipsTo === undefined) {
    fail('invalid shipping profile: parse it with shippingProfileSchema first so defaults are filled in');
  }
  checkedProfiles.add(profile as object);
}

/** Throws a RangeError unless the destination is {pickup: true} or {country: 'XX'} (ISO 3166-1 alpha-2). */
export function assertShippingDestination(destination: ShippingDestination): void {
  if ('pickup' in destination) {
    if (destination.pickup !== true) fail('destination.pickup must be true');
    return;
  }
  if (typeof destination.country !== 'string' || !/^[A-Z]{2}$/.test(destination.country)) {
    fail(`destination.country must be an ISO 3166-1 alpha-2 code in upper case, got ${String(destination.country)}`);
  }
}

/** Outcome of the rules without the wording; shared by the quote and the optimiser's hot loop. */
type Evaluation =
  | { ok: true; amountCents: number; rule: 'nothing' | 'pickup' | 'free_above' | 'flat' | 'per_item' | 'band' | 'over_max'; band?: number }
  | { ok: false; reason: ShippingRefusal };

function evaluate(profile: ShippingProfile, s: ShipmentSummary, destination: ShippingDestination): Evaluation {
  if (s.units === 0) return { ok: true, amountCents: 0, rule: 'nothing' };
  if ('pickup' in destination) {
    return profile.kind === 'pickup_only' || profile.pickupAvailable
      ? { ok: true, amountCents: 0, rule: 'pickup' }
      : { ok: false, reason: 'pickup_not_offered' };
  }
  if (profile.kind === 'pickup_only') return { ok: false, reason: 'pickup_only' };
  if (!profile.shipsTo.includes('*') && !profile.shipsTo.includes(destination.country)) {
    return { ok: false, reason: 'does_not_ship_to' };
  }
  // A weight the seller will not ship is refused even when the order would ship free: free shipping is a
  // price, the weight limit is what the seller can physically send.
  let band = -1;
  if (profile.kind === 'weight_bands') {
    band = profile.bands.findIndex((b) => s.billableGrams <= b.upToGrams);
    if (band === -1 && (profile.overMaxCents === null || profile.overMaxCents === undefined)) {
      return { ok: false, reason: 'over_weight_limit' };
    }
  }
  if (profile.freeAboveCents !== null && profile.freeAboveCents !== undefined && s.subtotalCents >= profile.freeAboveCents) {
    return { ok: true, amountCents: 0, rule: 'free_above' };
  }
  switch (profile.kind) {
    case 'flat_per_order':
      return { ok: true, amountCents: profile.amountCents, rule: 'flat' };
    case 'per_item':
      return {
        ok: true,
        amountCents: profile.firstItemCents + profile.additionalItemCents * (s.units - 1),
        rule: 'per_item',
      };
    case 'weight_bands':
      return band === -1
        ? { ok: true, amountCents: profile.overMaxCents as number, rule: 'over_max' }
        : { ok: true, amountCents: profile.bands[band].amountCents, rule: 'band', band };
  }
}

/**
 * Shipping cost of a summarised shipment, or Infinity when the seller refuses it. For the optimiser:
 * the profile must already have passed assertShippingProfile and the summary must be sound.
 */
export function shipmentCostCents(profile: ShippingProfile, s: ShipmentSummary, destination: ShippingDestination): number {
  const e = evaluate(profile, s, destination);
  return e.ok ? e.amountCents : Infinity;
}

/** Billable grams of one unit for a profile, unchecked (the optimiser validates listings once). */
export function unitBillableGramsFor(profile: ShippingProfile, item: ParcelDims): number {
  return unitBillableGrams(item, profile.dimDivisor);
}

function formatCents(cents: number): string {
  return `${(cents / 100).toFixed(2)}`;
}

function explain(profile: ShippingProfile, s: ShipmentSummary, e: Evaluation, destination: ShippingDestination): string {
  const weight = `billable weight ${s.billableGrams} g`;
  if (!e.ok) {
    switch (e.reason) {
      case 'pickup_not_offered':
        return 'This seller does not offer pickup.';
      case 'pickup_only':
        return 'This seller only hands items over at pickup; choose pickup.';
      case 'does_not_ship_to':
        return `This seller does not ship to ${'country' in destination ? destination.country : 'that destination'}.`;
      case 'over_weight_limit':
        return `Too heavy for this seller's shipping (${weight}); ask the seller for a quote.`;
    }
  }
  switch (e.rule) {
    case 'nothing':
      return 'Nothing to ship.';
    case 'pickup':
      return 'Pickup: the buyer collects, no shipping charge.';
    case 'free_above':
      return `Free shipping: item subtotal ${formatCents(s.subtotalCents)} reaches the seller's free-shipping threshold of ${formatCents(profile.freeAboveCents ?? 0)}.`;
    case 'flat':
      return `Flat rate per order: ${formatCents(e.amountCents)}.`;
    case 'per_item': {
      if (profile.kind !== 'per_item') return '';
      const extra = s.units - 1;
      return extra === 0
        ? `Per item: first item ${formatCents(profile.firstItemCents)}.`
        : `Per item: first item ${formatCents(profile.firstItemCents)} + ${extra} more x ${formatCents(profile.additionalItemCents)} = ${formatCents(e.amountCents)}.`;
    }
    case 'band': {
      if (profile.kind !== 'weight_bands' || e.band === undefined) return '';
      return `Weight band up to ${profile.bands[e.band].upToGrams} g (${weight}): ${formatCents(e.amountCents)}.`;
    }
    case 'over_max': {
      if (profile.kind !== 'weight_bands') return '';
      return `Over the heaviest band of ${profile.bands[profile.bands.length - 1].upToGrams} g (${weight}): ${formatCents(e.amountCents)}.`;
    }
  }
}

/** Sums one seller's lines into what the rules depend on. Each unit is taken as its own parcel for weight. */
export function summariseShipment(profile: ShippingProfile, items: readonly ShippingItem[]): ShipmentSummary {
  let subtotalCents = 0;
  let units = 0;
  let billableGrams = 0;
  items.forEach((item, i) => {
    const label = `items[${i}]`;
    if (typeof item.listingId !== 'string' || item.listingId === '') fail(`${label}.listingId must be a non-empty string`);
    if (!Number.isSafeInteger(item.quantity) || item.quantity <= 0) fail(`${label}.quantity must be a positive integer, got ${item.quantity}`);
    checkNonNegativeInt(item.unitPriceCents, `${label}.unitPriceCents`);
    checkParcel(item, label);
    subtotalCents += item.quantity * item.unitPriceCents;
    units += item.quantity;
    billableGrams += item.quantity * unitBillableGrams(item, profile.dimDivisor);
  });
  if (!Number.isSafeInteger(subtotalCents) || !Number.isSafeInteger(billableGrams)) fail('items add up beyond safe integers');
  return { subtotalCents, units, billableGrams };
}

/**
 * What one seller charges to ship exactly these items to the destination (or 0 at pickup).
 * Free-above compares with the seller's item subtotal (sum of quantity x unit price).
 * Weight bands use the summed billable weight, each unit counted as its own packed parcel (conservative:
 * heavy parts rarely share a box).
 */
export function shippingForSeller(
  profile: ShippingProfile,
  items: readonly ShippingItem[],
  destination: ShippingDestination,
): ShippingQuote {
  assertShippingProfile(profile);
  assertShippingDestination(destination);
  const s = summariseShipment(profile, items);
  const e = evaluate(profile, s, destination);
  const explanation = explain(profile, s, e, destination);
  return e.ok
    ? { ok: true, amountCents: e.amountCents, billableGrams: s.billableGrams, explanation }
    : { ok: false, reason: e.reason, billableGrams: s.billableGrams, explanation };
}
