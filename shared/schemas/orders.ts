import { z } from 'zod';

/*
 * Requests and replies of the cart, checkout, orders, seller orders, payouts and statements.
 * Money is integer cents everywhere; dates are ISO strings.
 */

const uuid = z.uuid('Not a valid id');
const quantity = z.coerce.number().int('Use a whole number').min(1, 'At least 1').max(999, 'At most 999');
export const countryCode = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{2}$/, 'Use a two-letter country code such as US');

// ---------- cart ----------

export const addCartItemInput = z.object({ listingId: uuid, quantity: quantity.default(1) });
export type AddCartItemInput = z.infer<typeof addCartItemInput>;

export const updateCartItemInput = z.object({ quantity });
export type UpdateCartItemInput = z.infer<typeof updateCartItemInput>;

export const listingIdParams = z.object({ listingId: uuid });

/** Where the cart ships to: a country, or pickup from every seller. Absent: shipping is not quoted yet. */
export const cartQuery = z.object({
  country: countryCode.optional(),
  pickup: z.enum(['1', 'true', '0', 'false']).optional(),
});

export const destinationSchema = z.union([z.object({ pickup: z.literal(true) }).strict(), z.object({ country: countryCode }).strict()]);
export type Destination = z.infer<typeof destinationSchema>;

export const shippingRefusalReasons = [
  'does_not_ship_to',
  'pickup_not_offered',
  'pickup_only',
  'over_weight_limit',
  'no_shipping_profile',
  'destination_needed',
] as const;
export type ShippingRefusalReason = (typeof shippingRefusalReasons)[number];

export const cartShippingSchema = z.union([
  z.object({ ok: z.literal(true), amountCents: z.number().int(), explanation: z.string() }),
  z.object({ ok: z.literal(false), reason: z.enum(shippingRefusalReasons), explanation: z.string() }),
]);

export const cartItemSchema = z.object({
  listingId: z.string(),
  title: z.string(),
  quantity: z.number().int(),
  /** Units that can be bought now (0 when the listing is no longer live). */
  available: z.number().int(),
  unitPriceCents: z.number().int(),
  priceCentsAtAdd: z.number().int(),
  priceChanged: z.boolean(),
  lineCents: z.number().int(),
  thumbnailUrl: z.string().nullable(),
});

export const cartGroupSchema = z.object({
  seller: z.object({ id: z.string(), name: z.string() }),
  items: z.array(cartItemSchema),
  itemsCents: z.number().int(),
  shipping: cartShippingSchema,
});

export const cartWarningSchema = z.object({
  code: z.enum(['quantity_capped', 'not_available', 'price_changed', 'shipping_unavailable']),
  listingId: z.string().optional(),
  sellerId: z.string().optional(),
  message: z.string(),
});

export const cartReply = z.object({
  groups: z.array(cartGroupSchema),
  destination: destinationSchema.nullable(),
  itemsCents: z.number().int(),
  shippingCents: z.number().int(),
  totalCents: z.number().int(),
  /** True when every item can be bought and every seller's shipping is quoted. */
  canCheckout: z.boolean(),
  warnings: z.array(cartWarningSchema),
});
export type CartReply = z.infer<typeof cartReply>;
export type CartGroup = z.infer<typeof cartGroupSchema>;
export type CartItem = z.infer<typeof cartItemSchema>;
export type CartWarning = z.infer<typeof cartWarningSchema>;

// ---------- checkout ----------

export const checkoutInput = z.object({ destination: destinationSchema });
export type CheckoutInput = z.infer<typeof checkoutInput>;
export const checkoutReply = z.object({ orderId: z.string(), url: z.string() });

// ---------- orders ----------

export const orderStates = ['pending_payment', 'paid', 'expired', 'cancelled', 'partially_refunded', 'refunded'] as const;
export const subOrderStates = ['pending_payment', 'paid', 'shipped', 'delivered', 'cancelled', 'refunded', 'expired'] as const;

export const orderIdParams = z.object({ id: uuid });
export const subOrderIdParams = z.object({ subOrderId: uuid });

export const orderLineSchema = z.object({
  id: z.string(),
  listingId: z.string(),
  title: z.string(),
  quantity: z.number().int(),
  refundedQuantity: z.number().int(),
  unitPriceCents: z.number().int(),
  lineCents: z.number().int(),
});

export const subOrderSchema = z.object({
  id: z.string(),
  orderId: z.string(),
  seller: z.object({ id: z.string(), name: z.string() }),
  state: z.enum(subOrderStates),
  itemsCents: z.number().int(),
  shippingCents: z.number().int(),
  refundedCents: z.number().int(),
  shippingExplanation: z.string(),
  pickup: z.boolean(),
  carrier: z.string().nullable(),
  tracking: z.string().nullable(),
  shippedAt: z.string().nullable(),
  deliveredAt: z.string().nullable(),
  lines: z.array(orderLineSchema),
});

export const refundSchema = z.object({
  id: z.string(),
  subOrderId: z.string().nullable(),
  amountCents: z.number().int(),
  restock: z.boolean(),
  reason: z.string(),
  createdAt: z.string(),
});

/** Where a shipped order goes, as the buyer gave it on the payment page (null for pickup, or before payment). */
export const shipToSchema = z.object({
  name: z.string(),
  line1: z.string(),
  line2: z.string().nullable(),
  city: z.string(),
  state: z.string().nullable(),
  postalCode: z.string().nullable(),
  country: z.string(),
});
export type ShipTo = z.infer<typeof shipToSchema>;

export const orderSchema = z.object({
  id: z.string(),
  state: z.enum(orderStates),
  itemsCents: z.number().int(),
  shippingCents: z.number().int(),
  totalCents: z.number().int(),
  refundedCents: z.number().int(),
  destination: destinationSchema,
  shipTo: shipToSchema.nullable(),
  createdAt: z.string(),
  paidAt: z.string().nullable(),
  expiresAt: z.string(),
  subOrders: z.array(subOrderSchema),
  refunds: z.array(refundSchema),
});
export type OrderDto = z.infer<typeof orderSchema>;
export type SubOrderDto = z.infer<typeof subOrderSchema>;

export const orderSummarySchema = orderSchema.omit({ subOrders: true, refunds: true, shipTo: true }).extend({
  sellerCount: z.number().int(),
  itemCount: z.number().int(),
});
export type OrderSummary = z.infer<typeof orderSummarySchema>;

/** What a seller sees of one sub-order: their lines, their money, and who bought. */
export const sellerSubOrderSchema = subOrderSchema.extend({
  buyer: z.object({ name: z.string(), email: z.string() }),
  destination: destinationSchema,
  shipTo: shipToSchema.nullable(),
  feeCents: z.number().int(),
  shareCents: z.number().int(),
  paidAt: z.string().nullable(),
  transfer: z
    .object({ state: z.enum(['pending', 'paid', 'waiting_for_onboarding', 'failed']), amountCents: z.number().int() })
    .nullable(),
});
export type SellerSubOrderDto = z.infer<typeof sellerSubOrderSchema>;

export const sellerOrdersQuery = z.object({ state: z.enum(subOrderStates).optional() });

export const shipInput = z.object({
  carrier: z.string().trim().min(2, 'Name the carrier').max(60),
  tracking: z
    .string()
    .trim()
    .min(4, 'Enter the tracking number')
    .max(60)
    .regex(/^[A-Za-z0-9 -]+$/, 'Use letters, digits, spaces and hyphens only'),
});
export type ShipInput = z.infer<typeof shipInput>;

export const refundInput = z
  .object({
    subOrderId: uuid.optional(),
    /** A partial refund of this many cents (items or shipping); omit for the whole remainder. */
    amountCents: z.number().int().positive().optional(),
    /** A refund of these units: each line's unit price times the quantity. */
    lines: z
      .array(z.object({ lineId: uuid, quantity: z.number().int().positive() }))
      .min(1)
      .max(100)
      .optional(),
    restock: z.boolean(),
    reason: z.string().trim().min(3, 'Give a reason of at least 3 characters').max(500),
  })
  .refine((v) => !(v.amountCents !== undefined && v.lines !== undefined), {
    message: 'Give either amountCents or lines, not both',
    path: ['amountCents'],
  })
  .refine((v) => !(v.restock && v.amountCents !== undefined), {
    message: 'To restock, name the lines and quantities that come back',
    path: ['restock'],
  });
export type RefundInput = z.infer<typeof refundInput>;

// ---------- payouts and statements ----------

export const payoutStateSchema = z.object({
  hasAccount: z.boolean(),
  payoutsEnabled: z.boolean(),
  transfers: z.object({
    paidCents: z.number().int(),
    pendingCents: z.number().int(),
    waitingForOnboardingCents: z.number().int(),
  }),
});
export type PayoutState = z.infer<typeof payoutStateSchema>;

export const statementQuery = z.object({
  month: z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'Use a month such as 2026-12'),
  format: z.enum(['json', 'csv']).default('json'),
});

export const statementLineSchema = z.object({
  date: z.string(),
  kind: z.enum(['sale', 'refund']),
  orderId: z.string(),
  subOrderId: z.string(),
  salesCents: z.number().int(),
  shippingCents: z.number().int(),
  feeCents: z.number().int(),
  refundCents: z.number().int(),
  netCents: z.number().int(),
});

export const statementSchema = z.object({
  month: z.string(),
  sellerId: z.string(),
  shopName: z.string(),
  lines: z.array(statementLineSchema),
  totals: z.object({
    salesCents: z.number().int(),
    shippingCents: z.number().int(),
    feeCents: z.number().int(),
    refundCents: z.number().int(),
    netCents: z.number().int(),
  }),
  transferredCents: z.number().int(),
});
export type Statement = z.infer<typeof statementSchema>;
export type StatementLine = z.infer<typeof statementLineSchema>;
