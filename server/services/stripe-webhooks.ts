import { and, eq, sql } from 'drizzle-orm';
import Stripe from 'stripe';
import type { ShipTo } from '../../shared/schemas/orders';
import { getDb } from '../db/client';
import { orderLines, orders, refunds, stockReservations, stripeEvents, subOrders } from '../db/schema/index';
import { AppError } from '../errors';
import { logger } from '../lib/logger';
import { removeBoughtItems } from './cart';
import { closePendingOrder } from './checkout';
import { sendPaymentMails } from './orders';
import { applyAccountState, createTransferRows, payPendingTransfers } from './payouts';
import { commitReservations, reserveStock, type Tx } from './stock';
import { getStripe, stripeErrorInfo, webhookSecret } from './stripe-client';

/*
 * Stripe's webhooks: the signature is checked on the raw bytes, the event id is stored so each event is
 * processed once (a replay finds its id and does nothing), and each event is handled in one transaction
 * together with that id. What talks to the outside (e-mails, transfers, refunds) runs after the commit.
 * Handlers only move records forward from the state they expect, so out-of-order deliveries do no harm.
 */

type AfterCommit = () => Promise<unknown>;

export interface WebhookOutcome {
  received: true;
  duplicate: boolean;
  type: string;
}

/** Verifies and processes one delivery. A bad or stale signature is a 400 and changes nothing. */
export async function handleStripeWebhook(rawBody: unknown, signature: string | undefined): Promise<WebhookOutcome> {
  if (!Buffer.isBuffer(rawBody) || rawBody.length === 0) throw new AppError(400, 'validation_failed', 'Expected the raw event body.');
  if (!signature) throw new AppError(400, 'validation_failed', 'Missing Stripe-Signature header.');
  let event: Stripe.Event;
  try {
    // Default tolerance: 300 s (source: stripe-node Webhooks, via REFERENCES.md).
    event = getStripe().webhooks.constructEvent(rawBody, signature, webhookSecret());
  } catch (err) {
    logger.warn({ err: err instanceof Error ? err.message : err }, 'Stripe webhook refused: bad signature');
    throw new AppError(400, 'validation_failed', 'The webhook signature is not valid.');
  }

  // For account changes, the current account counts, not the snapshot: an older event arriving late
  // must not switch payouts off again. Fetched before the transaction so no lock waits on the network.
  let freshAccount: Stripe.Account | undefined;
  if (event.type === 'account.updated') {
    try {
      freshAccount = await getStripe().accounts.retrieve((event.data.object as Stripe.Account).id);
    } catch (err) {
      logger.error({ err: stripeErrorInfo(err) ?? err }, 'could not fetch the connected account; Stripe will retry');
      throw new AppError(503, 'service_unavailable', 'Could not confirm the account state; retry later.');
    }
  }

  const after: AfterCommit[] = [];
  const duplicate = await getDb().transaction(async (tx) => {
    const [fresh] = await tx.insert(stripeEvents).values({ id: event.id, type: event.type }).onConflictDoNothing().returning({ id: stripeEvents.id });
    if (!fresh) return true;
    switch (event.type) {
      case 'checkout.session.completed':
        await onSessionCompleted(tx, event.data.object, after);
        break;
      case 'checkout.session.expired':
        await onSessionExpired(tx, event.data.object);
        break;
      case 'charge.refunded':
        await onChargeRefunded(tx, event.data.object);
        break;
      case 'account.updated':
        await onAccountUpdated(tx, freshAccount as Stripe.Account, after);
        break;
      default:
        // Stripe may send types we do not use; recording the id is all.
        break;
    }
    return false;
  });
  for (const step of after) {
    await step().catch((err: unknown) => logger.error({ err, eventId: event.id }, 'after-commit step of a webhook failed'));
  }
  logger.info({ eventId: event.id, type: event.type, duplicate }, 'Stripe webhook processed');
  return { received: true, duplicate, type: event.type };
}

async function lockOrder(tx: Tx, orderId: string | undefined) {
  if (!orderId || !/^[0-9a-f-]{36}$/i.test(orderId)) return undefined;
  const [order] = await tx.select().from(orders).where(eq(orders.id, orderId)).for('update');
  return order;
}

const intentId = (v: string | { id: string } | null) => (typeof v === 'string' ? v : (v?.id ?? null));

/**
 * Payment is in. Normally the order is waiting with its stock held: commit the stock, mark everything paid,
 * empty the bought items from the cart and queue one transfer per seller. If the hold had already ended
 * (the buyer paid an abandoned checkout just as it closed), the stock is taken again when it is still there;
 * when it is not, the payment is refunded in full.
 */
export async function onSessionCompleted(tx: Tx, session: Stripe.Checkout.Session, after: AfterCommit[]): Promise<void> {
  if (session.payment_status !== 'paid') return;
  const order = await lockOrder(tx, session.metadata?.orderId);
  if (!order) {
    logger.warn({ sessionId: session.id }, 'checkout.session.completed for an unknown order');
    return;
  }
  if (order.checkoutSessionId && order.checkoutSessionId !== session.id) {
    logger.warn({ sessionId: session.id, orderId: order.id }, 'completed session does not belong to this order');
    return;
  }
  if (!['pending_payment', 'expired', 'cancelled'].includes(order.state)) return; // already paid: replay or late duplicate
  if (session.amount_total !== order.totalCents) {
    logger.error({ orderId: order.id, paid: session.amount_total, expected: order.totalCents }, 'paid amount differs from the order total');
  }
  const paymentIntentId = intentId(session.payment_intent);

  if (order.state !== 'pending_payment') {
    const lines = await tx
      .select({ listingId: orderLines.listingId, quantity: orderLines.quantity, title: orderLines.title })
      .from(orderLines)
      .innerJoin(subOrders, eq(subOrders.id, orderLines.subOrderId))
      .where(eq(subOrders.orderId, order.id));
    const retaken = await tx
      .transaction(async (sp) => {
        await sp.delete(stockReservations).where(and(eq(stockReservations.orderId, order.id), eq(stockReservations.state, 'released')));
        await reserveStock(sp, order.id, lines);
        return true;
      })
      .catch(() => false);
    if (!retaken) {
      await refundOversold(tx, order, paymentIntentId, after);
      return;
    }
  }

  await commitReservations(tx, order.id);
  await tx
    .update(orders)
    .set({ state: 'paid', paidAt: new Date(), paymentIntentId, checkoutSessionId: session.id, shipTo: shipToOf(session) })
    .where(eq(orders.id, order.id));
  await tx.update(subOrders).set({ state: 'paid' }).where(eq(subOrders.orderId, order.id));
  const bought = await tx
    .select({ listingId: orderLines.listingId })
    .from(orderLines)
    .innerJoin(subOrders, eq(subOrders.id, orderLines.subOrderId))
    .where(eq(subOrders.orderId, order.id));
  await removeBoughtItems(tx, order.buyerId, [...new Set(bought.map((b) => b.listingId))]);
  await createTransferRows(tx, order.id);
  after.push(() => payPendingTransfers({ orderId: order.id }));
  after.push(() => sendPaymentMails(order.id));
}

/** The shipping address the buyer gave on the payment page, in our shape; null when none was collected. */
export function shipToOf(session: Stripe.Checkout.Session): ShipTo | null {
  const d = session.collected_information?.shipping_details;
  const line1 = d?.address.line1;
  const country = d?.address.country;
  if (!d || !line1 || !country) return null;
  const a = d.address;
  return { name: d.name, line1, line2: a.line2 || null, city: a.city ?? '', state: a.state || null, postalCode: a.postal_code || null, country };
}

async function refundOversold(tx: Tx, order: typeof orders.$inferSelect, paymentIntentId: string | null, after: AfterCommit[]) {
  logger.error({ orderId: order.id }, 'paid after the hold ended and the stock is gone: refunding in full');
  await tx
    .update(orders)
    .set({ state: 'refunded', paidAt: new Date(), paymentIntentId, refundedCents: order.totalCents })
    .where(eq(orders.id, order.id));
  await tx
    .update(subOrders)
    .set({ state: 'refunded', refundedCents: sql`${subOrders.itemsCents} + ${subOrders.shippingCents}` })
    .where(eq(subOrders.orderId, order.id));
  const [row] = await tx
    .insert(refunds)
    .values({ orderId: order.id, amountCents: order.totalCents, restock: false, reason: 'Sold out before the payment arrived' })
    .returning({ id: refunds.id });
  if (!paymentIntentId) return;
  after.push(async () => {
    const r = await getStripe().refunds.create(
      { payment_intent: paymentIntentId, reason: 'requested_by_customer', metadata: { orderId: order.id, refundId: row.id } },
      { idempotencyKey: `refund-${row.id}` },
    );
    await getDb().update(refunds).set({ stripeRefundId: r.id }).where(eq(refunds.id, row.id));
  });
}

/** The session ran out unpaid: the order expires and its stock goes back (only from 'pending_payment'). */
async function onSessionExpired(tx: Tx, session: Stripe.Checkout.Session): Promise<void> {
  const order = await lockOrder(tx, session.metadata?.orderId);
  if (!order || (order.checkoutSessionId && order.checkoutSessionId !== session.id)) return;
  await closePendingOrder(tx, order.id, 'expired');
}

/**
 * Refunds, whether made here or in Stripe's dashboard: the order's refunded total follows the charge's,
 * and never goes down (an older event arriving late changes nothing).
 */
async function onChargeRefunded(tx: Tx, charge: Stripe.Charge): Promise<void> {
  const pi = intentId(charge.payment_intent);
  let order = await lockOrder(tx, charge.metadata?.orderId);
  if (!order && pi) {
    const [byIntent] = await tx.select().from(orders).where(eq(orders.paymentIntentId, pi)).for('update');
    order = byIntent;
  }
  if (!order) return;
  if (order.state === 'pending_payment') {
    // The payment's own event has not been processed yet: fail so Stripe delivers this one again later.
    throw new AppError(503, 'service_unavailable', 'The payment of this order is not recorded yet; retry later.');
  }
  if (!['paid', 'partially_refunded', 'refunded'].includes(order.state)) return;
  const refunded = Math.max(order.refundedCents, charge.amount_refunded);
  if (refunded === order.refundedCents) return;
  await tx
    .update(orders)
    .set({ refundedCents: refunded, state: refunded >= order.totalCents ? 'refunded' : 'partially_refunded' })
    .where(eq(orders.id, order.id));
}

async function onAccountUpdated(tx: Tx, account: Stripe.Account, after: AfterCommit[]): Promise<void> {
  const sellerId = await applyAccountState(tx, account);
  if (sellerId) after.push(() => payPendingTransfers({ sellerId }));
}

/** For the sweeper: a session Stripe reports complete is processed as if its webhook had arrived. */
export async function processCompletedSession(session: Stripe.Checkout.Session): Promise<void> {
  const after: AfterCommit[] = [];
  await getDb().transaction((tx) => onSessionCompleted(tx, session, after));
  for (const step of after) await step().catch((err: unknown) => logger.error({ err }, 'after-commit step failed'));
}
