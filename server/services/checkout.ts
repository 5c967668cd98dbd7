import { randomUUID } from 'node:crypto';
import { and, eq, ne, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Destination } from '../../shared/schemas/orders';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { orderLines, orders, subOrders } from '../db/schema/index';
import { splitCheckout } from '../domain/fees';
import { loadEnv } from '../env';
import { AppError, invalidState, notFound } from '../errors';
import { logger } from '../lib/logger';
import { priceCart, userCart } from './cart';
import { releaseReservations, reserveStock, type Tx } from './stock';
import { getStripe, stripeErrorInfo } from './stripe-client';

/*
 * Checkout: one order per cart with a sub-order per seller, stock reserved in the same transaction, then one
 * Stripe Checkout Session for the whole amount (separate charges and transfers: the sellers are paid by
 * transfers in the order's transfer group once the payment is in).
 */

type AllowedCountry = Stripe.Checkout.SessionCreateParams.ShippingAddressCollection.AllowedCountry;

// source: Stripe's minimum charge amount for USD is $0.50 (Stripe docs, "Minimum and maximum charge amounts"), from memory
const MIN_CHARGE_CENTS = 50;

export interface CheckoutStarted {
  orderId: string;
  url: string;
}

/** Starts paying for the signed-in buyer's whole cart. Throws a 409 naming the listing when stock ran out. */
export async function startCheckout(user: SessionUser, destination: Destination): Promise<CheckoutStarted> {
  const e = loadEnv(process.env);
  const cart = await userCart(user.id);
  if (!cart || cart.lines.length === 0) throw new AppError(400, 'validation_failed', 'Your cart is empty.');
  const priced = priceCart(cart.lines, destination);
  if (priced.shippingProblems.length) {
    const first = priced.shippingProblems[0];
    throw new AppError(409, 'conflict', `${first.sellerName}: ${first.explanation}`, { shipping: priced.shippingProblems });
  }
  const own = cart.lines.find((l) => l.sellerId === user.id);
  if (own) throw new AppError(409, 'conflict', `"${own.title}" is your own listing; remove it from the cart.`);

  const split = splitCheckout(
    priced.sellers.map((s) => ({
      sellerId: s.sellerId,
      lines: s.lines.map((l) => ({ category: l.category, amountCents: l.quantity * l.unitPriceCents })),
      shippingCents: s.shippingCents,
    })),
  );
  if (split.totals.chargeCents < MIN_CHARGE_CENTS) {
    throw new AppError(400, 'validation_failed', `The total must be at least $${(MIN_CHARGE_CENTS / 100).toFixed(2)} to pay by card.`);
  }

  const orderId = randomUUID();
  const transferGroup = `order_${orderId}`;
  // A little past the hold, so Stripe's own 30-minute minimum holds whatever its clock says.
  const expiresAtSeconds = Math.floor(Date.now() / 1000) + e.CHECKOUT_HOLD_MINUTES * 60 + 30;
  const pickup = 'pickup' in destination;

  const abandoned = await getDb().transaction(async (tx) => {
    // One checkout at a time per buyer: an older unpaid checkout is abandoned and its stock goes back first.
    await tx.execute(sql`SELECT pg_advisory_xact_lock(hashtext(${`checkout:${user.id}`}))`);
    const older = await tx
      .select({ id: orders.id, sessionId: orders.checkoutSessionId })
      .from(orders)
      .where(and(eq(orders.buyerId, user.id), eq(orders.state, 'pending_payment'), ne(orders.id, orderId)))
      .for('update');
    for (const o of older) await closePendingOrder(tx, o.id, 'cancelled');

    await tx.insert(orders).values({
      id: orderId,
      buyerId: user.id,
      state: 'pending_payment',
      transferGroup,
      currency: 'usd',
      itemsCents: split.totals.itemsCents,
      shippingCents: split.totals.shippingCents,
      feeCents: split.totals.feeCents,
      totalCents: split.totals.chargeCents,
      destination,
      expiresAt: new Date(expiresAtSeconds * 1000),
    });
    for (const [i, s] of split.sellers.entries()) {
      const seller = priced.sellers[i];
      const [sub] = await tx
        .insert(subOrders)
        .values({
          orderId,
          sellerId: s.sellerId,
          state: 'pending_payment',
          itemsCents: s.itemsCents,
          shippingCents: s.shippingCents,
          feeCents: s.feeCents,
          shareCents: s.shareCents,
          shippingExplanation: seller.shippingExplanation,
          pickup,
        })
        .returning({ id: subOrders.id });
      await tx.insert(orderLines).values(
        seller.lines.map((l, j) => ({
          subOrderId: sub.id,
          listingId: l.listingId,
          partId: l.partId,
          title: l.title,
          category: l.category,
          quantity: l.quantity,
          unitPriceCents: l.unitPriceCents,
          feeCents: s.lines[j].feeCents,
        })),
      );
    }
    await reserveStock(
      tx,
      orderId,
      cart.lines.map((l) => ({ listingId: l.listingId, quantity: l.quantity, title: l.title })),
    );
    return older;
  });
  for (const o of abandoned) if (o.sessionId) void expireStripeSession(o.sessionId).catch(() => undefined);

  const lineItems: Stripe.Checkout.SessionCreateParams.LineItem[] = [];
  for (const s of priced.sellers) {
    for (const l of s.lines) {
      lineItems.push({ quantity: l.quantity, price_data: { currency: 'usd', unit_amount: l.unitPriceCents, product_data: { name: `${l.title} (${s.sellerName})` } } });
    }
    if (s.shippingCents > 0) {
      lineItems.push({ quantity: 1, price_data: { currency: 'usd', unit_amount: s.shippingCents, product_data: { name: `Shipping from ${s.sellerName}` } } });
    }
  }
  let session: Stripe.Checkout.Session;
  try {
    session = await getStripe().checkout.sessions.create(
      {
        mode: 'payment',
        line_items: lineItems,
        customer_email: user.email,
        client_reference_id: orderId,
        metadata: { orderId },
        payment_intent_data: { transfer_group: transferGroup, metadata: { orderId } },
        // The sellers need the address to ship to; shipping was priced for this one country, so only it is offered.
        ...(pickup ? {} : { shipping_address_collection: { allowed_countries: [destination.country as AllowedCountry] } }),
        expires_at: expiresAtSeconds,
        success_url: `${e.APP_ORIGIN}/orders/${orderId}?paid=1&session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${e.APP_ORIGIN}/cart`,
      },
      { idempotencyKey: `checkout-session-${orderId}` },
    );
  } catch (err) {
    logger.error({ err: stripeErrorInfo(err) ?? err, orderId }, 'creating the checkout session failed; releasing the stock');
    await getDb().transaction((tx) => closePendingOrder(tx, orderId, 'cancelled'));
    throw new AppError(503, 'service_unavailable', 'Payment could not be started. Nothing was charged and the items are back in stock; please try again.');
  }
  await getDb().update(orders).set({ checkoutSessionId: session.id }).where(eq(orders.id, orderId));
  if (!session.url) throw new AppError(503, 'service_unavailable', 'The payment page is not available; please try again.');
  return { orderId, url: session.url };
}

/**
 * Ends an unpaid order (expired or cancelled) and gives its stock back. Only a 'pending_payment' order moves,
 * in one conditional update, so replays and concurrent sweepers do nothing. Returns true when it moved.
 */
export async function closePendingOrder(tx: Tx, orderId: string, state: 'expired' | 'cancelled'): Promise<boolean> {
  const [moved] = await tx
    .update(orders)
    .set({ state })
    .where(and(eq(orders.id, orderId), eq(orders.state, 'pending_payment')))
    .returning({ id: orders.id });
  if (!moved) return false;
  await tx
    .update(subOrders)
    .set({ state: state === 'expired' ? 'expired' : 'cancelled' })
    .where(and(eq(subOrders.orderId, orderId), eq(subOrders.state, 'pending_payment')));
  await releaseReservations(tx, orderId);
  return true;
}

/**
 * Expires a session at Stripe so it can no longer be paid. Returns what the session is afterwards:
 * 'expired', or 'complete' when the buyer paid first (then the payment wins and the caller must not expire the order).
 */
export async function expireStripeSession(sessionId: string): Promise<{ status: string; session?: Stripe.Checkout.Session }> {
  const stripe = getStripe();
  try {
    const session = await stripe.checkout.sessions.expire(sessionId);
    return { status: 'expired', session };
  } catch (err) {
    const info = stripeErrorInfo(err);
    if (!info || info.status === undefined || info.status >= 500) throw err;
    // Unknown at Stripe (another environment's id): nobody can pay it, so it counts as expired.
    if (info.status === 404) return { status: 'expired' };
    const session = await stripe.checkout.sessions.retrieve(sessionId);
    return { status: session.status ?? 'open', session };
  }
}

/** The buyer gives up an unpaid checkout (back to the cart): the session is expired and the stock released. */
export async function cancelPendingCheckout(user: SessionUser, orderId: string): Promise<{ state: string }> {
  return getDb().transaction(async (tx) => {
    // The order stays locked while Stripe expires the session, so the expiry webhook waits and then finds
    // the order already cancelled, and a payment racing in is seen by Stripe's answer.
    const [order] = await tx.select().from(orders).where(and(eq(orders.id, orderId), eq(orders.buyerId, user.id))).for('update');
    if (!order) throw notFound('Order');
    if (order.state !== 'pending_payment') throw invalidState(`This order is ${order.state.replaceAll('_', ' ')}; only an unpaid checkout can be cancelled.`);
    if (order.checkoutSessionId) {
      const outcome = await expireStripeSession(order.checkoutSessionId);
      if (outcome.status === 'complete') throw invalidState('This checkout was just paid; it cannot be cancelled any more.');
    }
    await closePendingOrder(tx, orderId, 'cancelled');
    return { state: 'cancelled' };
  });
}
