import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, jsonb, pgTable, primaryKey, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { listings } from './listings';
import { createdAt, id, ts, updatedAt } from './columns';

/** A cart per signed-in user, or per anonymous browser (token in a cookie) until it merges at sign-in. */
export const carts = pgTable(
  'carts',
  {
    id: id(),
    userId: uuid('user_id').references(() => users.id, { onDelete: 'cascade' }),
    anonToken: text('anon_token'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('carts_user_key').on(t.userId), uniqueIndex('carts_anon_key').on(t.anonToken)],
);

export const cartItems = pgTable(
  'cart_items',
  {
    cartId: uuid('cart_id').notNull().references(() => carts.id, { onDelete: 'cascade' }),
    listingId: uuid('listing_id').notNull().references(() => listings.id, { onDelete: 'cascade' }),
    quantity: integer('quantity').notNull(),
    /** The price when added, so the cart can show what changed since. */
    priceCentsAtAdd: integer('price_cents_at_add').notNull(),
    addedAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.cartId, t.listingId] }), check('cart_items_qty_positive', sql`${t.quantity} > 0`)],
);

export const orderStates = ['pending_payment', 'paid', 'expired', 'cancelled', 'partially_refunded', 'refunded'] as const;
export const subOrderStates = ['pending_payment', 'paid', 'shipped', 'delivered', 'cancelled', 'refunded', 'expired'] as const;

/** One order per checkout; money in cents; the charge equals the sum of sellers' shares plus the fees. */
export const orders = pgTable(
  'orders',
  {
    id: id(),
    buyerId: uuid('buyer_id').notNull().references(() => users.id),
    state: text('state', { enum: orderStates }).notNull().default('pending_payment'),
    checkoutSessionId: text('checkout_session_id'),
    paymentIntentId: text('payment_intent_id'),
    chargeId: text('charge_id'),
    transferGroup: text('transfer_group').notNull(),
    currency: text('currency').notNull().default('usd'),
    itemsCents: integer('items_cents').notNull(),
    shippingCents: integer('shipping_cents').notNull(),
    feeCents: integer('fee_cents').notNull(),
    totalCents: integer('total_cents').notNull(),
    refundedCents: integer('refunded_cents').notNull().default(0),
    destination: jsonb('destination').notNull(),
    /** The shipping address collected on the payment page (shared/schemas/orders.ts ShipTo); null for pickup. */
    shipTo: jsonb('ship_to'),
    expiresAt: ts('expires_at').notNull(),
    paidAt: ts('paid_at'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('orders_checkout_session_key').on(t.checkoutSessionId),
    index('orders_buyer_idx').on(t.buyerId, t.createdAt),
    index('orders_pending_expiry_idx').on(t.expiresAt).where(sql`${t.state} = 'pending_payment'`),
    check('orders_total_adds_up', sql`${t.totalCents} = ${t.itemsCents} + ${t.shippingCents}`),
  ],
);

export const subOrders = pgTable(
  'sub_orders',
  {
    id: id(),
    orderId: uuid('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
    sellerId: uuid('seller_id').notNull().references(() => users.id),
    state: text('state', { enum: subOrderStates }).notNull().default('pending_payment'),
    itemsCents: integer('items_cents').notNull(),
    shippingCents: integer('shipping_cents').notNull(),
    feeCents: integer('fee_cents').notNull(),
    shareCents: integer('share_cents').notNull(),
    refundedCents: integer('refunded_cents').notNull().default(0),
    shippingExplanation: text('shipping_explanation').notNull().default(''),
    pickup: boolean('pickup').notNull().default(false),
    carrier: text('carrier'),
    tracking: text('tracking'),
    shippedAt: ts('shipped_at'),
    deliveredAt: ts('delivered_at'),
    transferId: text('transfer_id'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('sub_orders_order_idx').on(t.orderId), index('sub_orders_seller_idx').on(t.sellerId, t.createdAt)],
);

export const orderLines = pgTable(
  'order_lines',
  {
    id: id(),
    subOrderId: uuid('sub_order_id').notNull().references(() => subOrders.id, { onDelete: 'cascade' }),
    listingId: uuid('listing_id').notNull().references(() => listings.id),
    partId: uuid('part_id'),
    title: text('title').notNull(),
    category: text('category').notNull(),
    quantity: integer('quantity').notNull(),
    unitPriceCents: integer('unit_price_cents').notNull(),
    feeCents: integer('fee_cents').notNull(),
    refundedQuantity: integer('refunded_quantity').notNull().default(0),
  },
  (t) => [index('order_lines_sub_order_idx').on(t.subOrderId)],
);

/** Units held for a checkout session; released by expiry (webhook or sweeper), committed at payment. */
export const stockReservations = pgTable(
  'stock_reservations',
  {
    id: id(),
    orderId: uuid('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
    listingId: uuid('listing_id').notNull().references(() => listings.id),
    quantity: integer('quantity').notNull(),
    state: text('state', { enum: ['held', 'committed', 'released'] }).notNull().default('held'),
    createdAt: createdAt(),
  },
  (t) => [index('stock_reservations_order_idx').on(t.orderId), index('stock_reservations_listing_idx').on(t.listingId, t.state)],
);

/** Stripe events already handled: the id is the key, so a replay is a no-op. */
export const stripeEvents = pgTable('stripe_events', {
  id: text('id').primaryKey(),
  type: text('type').notNull(),
  processedAt: createdAt(),
});

export const refunds = pgTable(
  'refunds',
  {
    id: id(),
    orderId: uuid('order_id').notNull().references(() => orders.id),
    subOrderId: uuid('sub_order_id').references(() => subOrders.id),
    stripeRefundId: text('stripe_refund_id'),
    amountCents: integer('amount_cents').notNull(),
    restock: boolean('restock').notNull().default(false),
    reason: text('reason').notNull().default(''),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('refunds_stripe_key').on(t.stripeRefundId), index('refunds_order_idx').on(t.orderId)],
);

export const transfers = pgTable(
  'transfers',
  {
    id: id(),
    subOrderId: uuid('sub_order_id').notNull().references(() => subOrders.id),
    sellerId: uuid('seller_id').notNull().references(() => users.id),
    stripeTransferId: text('stripe_transfer_id'),
    /** What the seller is owed for the sub-order, net of refunds so far. */
    amountCents: integer('amount_cents').notNull(),
    /** What went to the seller's account at Stripe (set when paid). */
    sentCents: integer('sent_cents').notNull().default(0),
    /** What was taken back from it at Stripe (transfer reversals) after refunds made once it was paid. */
    reversedCents: integer('reversed_cents').notNull().default(0),
    state: text('state', { enum: ['pending', 'paid', 'waiting_for_onboarding', 'failed'] }).notNull().default('pending'),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('transfers_sub_order_key').on(t.subOrderId), index('transfers_seller_idx').on(t.sellerId, t.createdAt)],
);
