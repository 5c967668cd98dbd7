import { randomUUID } from 'node:crypto';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Destination, OrderDto, OrderSummary, RefundInput, SellerSubOrderDto, ShipInput, ShipTo, SubOrderDto } from '../../shared/schemas/orders';
import type { SessionUser } from '../auth/require-role';
import { getDb } from '../db/client';
import { orderLines, orders, refunds, sellerProfiles, subOrders, transfers, users } from '../db/schema/index';
import { allocateProportionally } from '../domain/fees';
import { loadEnv } from '../env';
import { AppError, invalidState, notFound } from '../errors';
import { audit } from '../lib/audit';
import { logger } from '../lib/logger';
import { composeMail, sendMail } from '../lib/mailer';
import { feeReturnedOnRefund } from './statements';
import { restockUnits } from './stock';
import { getStripe, stripeErrorInfo } from './stripe-client';
import { reverseOverpaidTransfers } from './payouts';

/*
 * Orders after checkout: what buyers and sellers see, shipping and delivery by the seller, refunds by an
 * administrator (through Stripe, whole or partial, restocking when asked), and the e-mails at each step.
 */

type OrderRow = typeof orders.$inferSelect;
type SubOrderRow = typeof subOrders.$inferSelect;
type LineRow = typeof orderLines.$inferSelect;

const iso = (d: Date | null) => (d ? d.toISOString() : null);
const money = (cents: number) => `$${(cents / 100).toFixed(2)}`;
const VISIBLE_TO_SELLER = ['paid', 'shipped', 'delivered', 'refunded'] as const;

function lineDto(l: LineRow) {
  return {
    id: l.id,
    listingId: l.listingId,
    title: l.title,
    quantity: l.quantity,
    refundedQuantity: l.refundedQuantity,
    unitPriceCents: l.unitPriceCents,
    lineCents: l.quantity * l.unitPriceCents,
  };
}

function subOrderDto(s: SubOrderRow, sellerName: string, lines: LineRow[]): SubOrderDto {
  return {
    id: s.id,
    orderId: s.orderId,
    seller: { id: s.sellerId, name: sellerName },
    state: s.state,
    itemsCents: s.itemsCents,
    shippingCents: s.shippingCents,
    refundedCents: s.refundedCents,
    shippingExplanation: s.shippingExplanation,
    pickup: s.pickup,
    carrier: s.carrier,
    tracking: s.tracking,
    shippedAt: iso(s.shippedAt),
    deliveredAt: iso(s.deliveredAt),
    lines: lines.filter((l) => l.subOrderId === s.id).map(lineDto),
  };
}

async function subOrdersWithSellers(orderIds: string[]) {
  if (!orderIds.length) return [];
  return getDb()
    .select({ s: subOrders, sellerName: sql<string>`coalesce(${sellerProfiles.shopName}, ${users.displayName})` })
    .from(subOrders)
    .innerJoin(users, eq(users.id, subOrders.sellerId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, subOrders.sellerId))
    .where(inArray(subOrders.orderId, orderIds))
    .orderBy(asc(subOrders.createdAt), asc(subOrders.id));
}

async function linesOf(subOrderIds: string[]) {
  if (!subOrderIds.length) return [];
  return getDb().select().from(orderLines).where(inArray(orderLines.subOrderId, subOrderIds)).orderBy(asc(orderLines.id));
}

async function orderDto(order: OrderRow): Promise<OrderDto> {
  const subs = await subOrdersWithSellers([order.id]);
  const lines = await linesOf(subs.map((s) => s.s.id));
  const refundRows = await getDb().select().from(refunds).where(eq(refunds.orderId, order.id)).orderBy(asc(refunds.createdAt));
  return {
    id: order.id,
    state: order.state,
    itemsCents: order.itemsCents,
    shippingCents: order.shippingCents,
    totalCents: order.totalCents,
    refundedCents: order.refundedCents,
    destination: order.destination as Destination,
    shipTo: (order.shipTo as ShipTo | null) ?? null,
    createdAt: order.createdAt.toISOString(),
    paidAt: iso(order.paidAt),
    expiresAt: order.expiresAt.toISOString(),
    subOrders: subs.map((s) => subOrderDto(s.s, s.sellerName, lines)),
    refunds: refundRows.map((r) => ({ id: r.id, subOrderId: r.subOrderId, amountCents: r.amountCents, restock: r.restock, reason: r.reason, createdAt: r.createdAt.toISOString() })),
  };
}

// ---------- buyer ----------

export async function listBuyerOrders(buyerId: string): Promise<OrderSummary[]> {
  const rows = await getDb().select().from(orders).where(eq(orders.buyerId, buyerId)).orderBy(desc(orders.createdAt)).limit(200);
  const subs = await subOrdersWithSellers(rows.map((o) => o.id));
  const lines = await linesOf(subs.map((s) => s.s.id));
  return rows.map((o) => {
    const mine = subs.filter((s) => s.s.orderId === o.id);
    const ids = new Set(mine.map((s) => s.s.id));
    return {
      id: o.id,
      state: o.state,
      itemsCents: o.itemsCents,
      shippingCents: o.shippingCents,
      totalCents: o.totalCents,
      refundedCents: o.refundedCents,
      destination: o.destination as Destination,
      createdAt: o.createdAt.toISOString(),
      paidAt: iso(o.paidAt),
      expiresAt: o.expiresAt.toISOString(),
      sellerCount: mine.length,
      itemCount: lines.filter((l) => ids.has(l.subOrderId)).reduce((a, l) => a + l.quantity, 0),
    };
  });
}

/** The buyer's own order, or any order for an administrator; anyone else gets a 404 (ids are not confirmed). */
export async function getOrderFor(user: SessionUser, orderId: string): Promise<OrderDto> {
  const [order] = await getDb().select().from(orders).where(eq(orders.id, orderId));
  if (!order || (order.buyerId !== user.id && !user.roles.includes('admin'))) throw notFound('Order');
  return orderDto(order);
}

// ---------- seller ----------

function sellerDto(
  row: { s: SubOrderRow; sellerName: string; buyerName: string; buyerEmail: string; destination: unknown; shipTo: unknown; paidAt: Date | null; transferState: string | null; transferCents: number | null },
  lines: LineRow[],
): SellerSubOrderDto {
  return {
    ...subOrderDto(row.s, row.sellerName, lines),
    buyer: { name: row.buyerName, email: row.buyerEmail },
    destination: row.destination as Destination,
    shipTo: (row.shipTo as ShipTo | null) ?? null,
    feeCents: row.s.feeCents,
    shareCents: row.s.shareCents,
    paidAt: iso(row.paidAt),
    transfer: row.transferState ? { state: row.transferState as NonNullable<SellerSubOrderDto['transfer']>['state'], amountCents: row.transferCents ?? 0 } : null,
  };
}

function sellerQuery() {
  return getDb()
    .select({
      s: subOrders,
      sellerName: sql<string>`coalesce(${sellerProfiles.shopName}, 'Your shop')`,
      buyerName: users.displayName,
      buyerEmail: users.email,
      destination: orders.destination,
      shipTo: orders.shipTo,
      paidAt: orders.paidAt,
      transferState: transfers.state,
      transferCents: transfers.amountCents,
    })
    .from(subOrders)
    .innerJoin(orders, eq(orders.id, subOrders.orderId))
    .innerJoin(users, eq(users.id, orders.buyerId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, subOrders.sellerId))
    .leftJoin(transfers, eq(transfers.subOrderId, subOrders.id));
}

/** The seller's paid sub-orders, newest first; unpaid checkouts are not theirs to act on and are not shown. */
export async function listSellerSubOrders(sellerId: string, state?: SubOrderRow['state']): Promise<SellerSubOrderDto[]> {
  const states = state ? [state] : [...VISIBLE_TO_SELLER];
  const rows = await sellerQuery()
    .where(and(eq(subOrders.sellerId, sellerId), inArray(subOrders.state, states)))
    .orderBy(desc(orders.paidAt), desc(subOrders.id))
    .limit(500);
  const lines = await linesOf(rows.map((r) => r.s.id));
  return rows.map((r) => sellerDto(r, lines));
}

export async function getSellerSubOrder(sellerId: string, subOrderId: string): Promise<SellerSubOrderDto> {
  const [row] = await sellerQuery().where(
    and(eq(subOrders.id, subOrderId), eq(subOrders.sellerId, sellerId), inArray(subOrders.state, [...VISIBLE_TO_SELLER])),
  );
  if (!row) throw notFound('Order');
  return sellerDto(row, await linesOf([row.s.id]));
}

async function explainRefusedMove(sellerId: string, subOrderId: string, action: string): Promise<never> {
  const [s] = await getDb().select({ state: subOrders.state, pickup: subOrders.pickup }).from(subOrders).where(and(eq(subOrders.id, subOrderId), eq(subOrders.sellerId, sellerId)));
  if (!s || !(VISIBLE_TO_SELLER as readonly string[]).includes(s.state)) throw notFound('Order');
  if (action === 'ship' && s.pickup) throw invalidState('This order is collected at pickup; mark it delivered when it is handed over.');
  throw invalidState(`This order is ${s.state}; it cannot be marked ${action === 'ship' ? 'shipped' : 'delivered'} now.`);
}

/** paid -> shipped, with carrier and tracking; the buyer gets an e-mail. */
export async function markShipped(seller: SessionUser, subOrderId: string, input: ShipInput): Promise<SellerSubOrderDto> {
  const moved = await getDb().transaction(async (tx) => {
    const [row] = await tx
      .update(subOrders)
      .set({ state: 'shipped', carrier: input.carrier, tracking: input.tracking, shippedAt: new Date() })
      .where(and(eq(subOrders.id, subOrderId), eq(subOrders.sellerId, seller.id), eq(subOrders.state, 'paid'), eq(subOrders.pickup, false)))
      .returning();
    if (row) await audit(tx, { actorId: seller.id, action: 'sub_order.shipped', entityType: 'sub_order', entityId: subOrderId, after: { carrier: input.carrier, tracking: input.tracking } });
    return row;
  });
  if (!moved) await explainRefusedMove(seller.id, subOrderId, 'ship');
  void sendShippedMail(subOrderId);
  return getSellerSubOrder(seller.id, subOrderId);
}

/** shipped -> delivered, or paid -> delivered for a pickup handed over. */
export async function markDelivered(seller: SessionUser, subOrderId: string): Promise<SellerSubOrderDto> {
  const [moved] = await getDb()
    .update(subOrders)
    .set({ state: 'delivered', deliveredAt: new Date() })
    .where(
      and(
        eq(subOrders.id, subOrderId),
        eq(subOrders.sellerId, seller.id),
        sql`(${subOrders.state} = 'shipped' or (${subOrders.state} = 'paid' and ${subOrders.pickup}))`,
      ),
    )
    .returning({ id: subOrders.id });
  if (!moved) await explainRefusedMove(seller.id, subOrderId, 'deliver');
  return getSellerSubOrder(seller.id, subOrderId);
}

// ---------- refunds ----------

interface RefundTarget {
  subOrderId: string;
  amountCents: number;
  lines: Array<{ lineId: string; quantity: number; listingId: string }>;
}

const remainingOf = (s: SubOrderRow) => s.itemsCents + s.shippingCents - s.refundedCents;

/** Works out which sub-orders give back how much, from whole-order, sub-order, amount or line requests. */
function planRefund(subs: SubOrderRow[], lines: LineRow[], input: RefundInput): RefundTarget[] {
  const bad = (message: string) => new AppError(400, 'validation_failed', message);
  const scope = input.subOrderId ? subs.filter((s) => s.id === input.subOrderId) : subs;
  if (input.subOrderId && !scope.length) throw bad('That sub-order is not part of this order.');
  const refundable = scope.filter((s) => remainingOf(s) > 0);
  if (!refundable.length) throw invalidState('Nothing is left to refund here.');

  if (input.lines) {
    const byId = new Map(lines.map((l) => [l.id, l]));
    const targets = new Map<string, RefundTarget>();
    for (const want of input.lines) {
      const line = byId.get(want.lineId);
      if (!line || !scope.some((s) => s.id === line.subOrderId)) throw bad('A line to refund is not part of this order.');
      const left = line.quantity - line.refundedQuantity;
      if (want.quantity > left) throw bad(`"${line.title}": only ${left} unit(s) are left to refund.`);
      const t = targets.get(line.subOrderId) ?? { subOrderId: line.subOrderId, amountCents: 0, lines: [] };
      t.amountCents += want.quantity * line.unitPriceCents;
      t.lines.push({ lineId: line.id, quantity: want.quantity, listingId: line.listingId });
      targets.set(line.subOrderId, t);
    }
    for (const t of targets.values()) {
      const s = subs.find((x) => x.id === t.subOrderId) as SubOrderRow;
      if (t.amountCents > remainingOf(s)) throw bad(`That is more than is left to refund on this seller's part (${money(remainingOf(s))}).`);
    }
    return [...targets.values()];
  }

  if (input.amountCents !== undefined) {
    const left = refundable.reduce((a, s) => a + remainingOf(s), 0);
    if (input.amountCents > left) throw bad(`At most ${money(left)} is left to refund.`);
    const shares = allocateProportionally(input.amountCents, refundable.map(remainingOf));
    return refundable.map((s, i) => ({ subOrderId: s.id, amountCents: shares[i], lines: [] })).filter((t) => t.amountCents > 0);
  }

  // Everything that is left: every unit not yet refunded comes back (restocked when asked).
  return refundable.map((s) => ({
    subOrderId: s.id,
    amountCents: remainingOf(s),
    lines: lines
      .filter((l) => l.subOrderId === s.id && l.quantity > l.refundedQuantity)
      .map((l) => ({ lineId: l.id, quantity: l.quantity - l.refundedQuantity, listingId: l.listingId })),
  }));
}

/**
 * An administrator refunds all or part of a paid order through Stripe. Each sub-order's part is its own
 * Stripe refund, made while that order row is locked and recorded in the same transaction, so two admins
 * clicking at once cannot refund more than was paid. The charge.refunded webhook later agrees with the totals.
 */
export async function refundOrder(admin: SessionUser, orderId: string, input: RefundInput): Promise<OrderDto> {
  const db = getDb();
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId));
  if (!order) throw notFound('Order');
  if (order.state !== 'paid' && order.state !== 'partially_refunded') throw invalidState(`This order is ${order.state.replaceAll('_', ' ')}; only a paid order can be refunded.`);
  if (!order.paymentIntentId) throw invalidState('This order has no payment to refund.');
  const subs = await db.select().from(subOrders).where(eq(subOrders.orderId, orderId));
  const targets = planRefund(subs, await linesOf(subs.map((s) => s.id)), input);

  const done: Array<{ subOrderId: string; amountCents: number }> = [];
  for (const target of targets) {
    await db.transaction(async (tx) => {
      const [locked] = await tx.select().from(orders).where(eq(orders.id, orderId)).for('update');
      const [sub] = await tx.select().from(subOrders).where(eq(subOrders.id, target.subOrderId)).for('update');
      if (target.amountCents > remainingOf(sub)) throw invalidState('Someone refunded part of this order meanwhile; reload and try again.');
      for (const l of target.lines) {
        const [line] = await tx.select().from(orderLines).where(eq(orderLines.id, l.lineId)).for('update');
        if (l.quantity > line.quantity - line.refundedQuantity) throw invalidState('Someone refunded these units meanwhile; reload and try again.');
      }
      const refundId = randomUUID();
      let stripeRefundId: string;
      try {
        const r = await getStripe().refunds.create(
          { payment_intent: locked.paymentIntentId as string, amount: target.amountCents, reason: 'requested_by_customer', metadata: { orderId, subOrderId: sub.id, refundId } },
          { idempotencyKey: `refund-${refundId}` },
        );
        stripeRefundId = r.id;
      } catch (err) {
        const info = stripeErrorInfo(err);
        logger.error({ err: info ?? err, orderId }, 'Stripe refund failed');
        throw new AppError(info && info.status && info.status < 500 ? 409 : 503, info && info.status && info.status < 500 ? 'conflict' : 'service_unavailable', `The payment processor refused the refund${info ? `: ${info.message}` : ''}.`);
      }
      await tx.insert(refunds).values({
        id: refundId,
        orderId,
        subOrderId: sub.id,
        stripeRefundId,
        amountCents: target.amountCents,
        restock: input.restock,
        reason: input.reason,
        createdBy: admin.id,
      });
      const refundedAfter = sub.refundedCents + target.amountCents;
      const subTotal = sub.itemsCents + sub.shippingCents;
      await tx
        .update(subOrders)
        .set({ refundedCents: refundedAfter, ...(refundedAfter >= subTotal ? { state: 'refunded' as const } : {}) })
        .where(eq(subOrders.id, sub.id));
      for (const l of target.lines) {
        await tx.update(orderLines).set({ refundedQuantity: sql`${orderLines.refundedQuantity} + ${l.quantity}` }).where(eq(orderLines.id, l.lineId));
        if (input.restock) await restockUnits(tx, l.listingId, l.quantity);
      }
      // What the seller is owed shrinks by what the seller gives back (the refund less the fee we return): money
      // not yet sent is sent less, money already sent is taken back by a transfer reversal after commit.
      const sellerDebit = target.amountCents - feeReturnedOnRefund(sub.feeCents, subTotal, sub.refundedCents, refundedAfter);
      await tx
        .update(transfers)
        .set({ amountCents: sql`greatest(${transfers.amountCents} - ${sellerDebit}, 0)` })
        .where(and(eq(transfers.subOrderId, sub.id), inArray(transfers.state, ['pending', 'waiting_for_onboarding', 'paid'])));
      const orderRefunded = locked.refundedCents + target.amountCents;
      await tx
        .update(orders)
        .set({ refundedCents: sql`${orders.refundedCents} + ${target.amountCents}`, state: orderRefunded >= locked.totalCents ? 'refunded' : 'partially_refunded' })
        .where(eq(orders.id, orderId));
      await audit(tx, { actorId: admin.id, action: 'order.refund', entityType: 'order', entityId: orderId, after: { subOrderId: sub.id, amountCents: target.amountCents, restock: input.restock, reason: input.reason, lines: target.lines } });
    });
    done.push({ subOrderId: target.subOrderId, amountCents: target.amountCents });
  }
  await reverseOverpaidTransfers({ orderId }).catch((err: unknown) => logger.error({ err, orderId }, 'transfer reversals after a refund failed; the sweeper retries'));
  void sendRefundMails(orderId, done, input.reason);
  return getOrderFor(admin, orderId);
}

// ---------- e-mails (sent after commit; a mail failure never undoes the business step) ----------

async function orderPeople(orderId: string) {
  const [order] = await getDb().select({ o: orders, buyerEmail: users.email, buyerName: users.displayName }).from(orders).innerJoin(users, eq(users.id, orders.buyerId)).where(eq(orders.id, orderId));
  const subs = await getDb()
    .select({ s: subOrders, email: users.email, name: users.displayName, shop: sellerProfiles.shopName })
    .from(subOrders)
    .innerJoin(users, eq(users.id, subOrders.sellerId))
    .leftJoin(sellerProfiles, eq(sellerProfiles.userId, subOrders.sellerId))
    .where(eq(subOrders.orderId, orderId));
  const lines = await linesOf(subs.map((s) => s.s.id));
  return { order, subs, lines };
}

async function safeSend(what: string, send: () => Promise<void>) {
  try {
    await send();
  } catch (err) {
    logger.error({ err, what }, 'order e-mail failed');
  }
}

const lineText = (l: LineRow) => `${l.quantity} x ${l.title} at ${money(l.unitPriceCents)}`;

export async function sendPaymentMails(orderId: string): Promise<void> {
  await safeSend('payment', async () => {
    const { order, subs, lines } = await orderPeople(orderId);
    if (!order) return;
    const origin = loadEnv(process.env).APP_ORIGIN;
    await sendMail(
      composeMail({
        to: order.buyerEmail,
        subject: `Drabyard order confirmed: ${money(order.o.totalCents)}`,
        greeting: `Hello ${order.buyerName},`,
        paragraphs: [
          `Thank you: your payment of ${money(order.o.totalCents)} is in. ${subs.length === 1 ? 'The seller has' : `Each of the ${subs.length} sellers has`} been told to send your parts.`,
          ...subs.map((s) => `${s.shop ?? s.name}: ${lines.filter((l) => l.subOrderId === s.s.id).map(lineText).join('; ')}; shipping ${money(s.s.shippingCents)}.`),
        ],
        action: { label: 'See your order', url: `${origin}/orders/${orderId}` },
      }),
    );
    for (const s of subs) {
      await sendMail(
        composeMail({
          to: s.email,
          subject: `New Drabyard order to ${s.s.pickup ? 'hand over at pickup' : 'ship'}`,
          greeting: `Hello ${s.name},`,
          paragraphs: [
            `${order.buyerName} paid for: ${lines.filter((l) => l.subOrderId === s.s.id).map(lineText).join('; ')}.`,
            s.s.pickup ? 'The buyer collects at pickup.' : `Shipping paid: ${money(s.s.shippingCents)}. The address to ship to is on the order page (it is not sent by mail); add the carrier and tracking number there when it is on its way.`,
            `Your share after the platform fee: ${money(s.s.shareCents)}.`,
          ],
          action: { label: 'Open the order', url: `${origin}/seller/orders/${s.s.id}` },
        }),
      );
    }
  });
}

export async function sendShippedMail(subOrderId: string): Promise<void> {
  await safeSend('shipped', async () => {
    const [row] = await getDb()
      .select({ s: subOrders, buyerEmail: users.email, buyerName: users.displayName, shop: sellerProfiles.shopName })
      .from(subOrders)
      .innerJoin(orders, eq(orders.id, subOrders.orderId))
      .innerJoin(users, eq(users.id, orders.buyerId))
      .leftJoin(sellerProfiles, eq(sellerProfiles.userId, subOrders.sellerId))
      .where(eq(subOrders.id, subOrderId));
    if (!row) return;
    await sendMail(
      composeMail({
        to: row.buyerEmail,
        subject: `Your parts from ${row.shop ?? 'your seller'} are on their way`,
        greeting: `Hello ${row.buyerName},`,
        paragraphs: [`${row.shop ?? 'The seller'} shipped your parts with ${row.s.carrier}, tracking number ${row.s.tracking}.`],
        action: { label: 'See your order', url: `${loadEnv(process.env).APP_ORIGIN}/orders/${row.s.orderId}` },
      }),
    );
  });
}

export async function sendRefundMails(orderId: string, parts: Array<{ subOrderId: string; amountCents: number }>, reason: string): Promise<void> {
  if (!parts.length) return;
  await safeSend('refund', async () => {
    const { order, subs } = await orderPeople(orderId);
    if (!order) return;
    const total = parts.reduce((a, p) => a + p.amountCents, 0);
    const origin = loadEnv(process.env).APP_ORIGIN;
    await sendMail(
      composeMail({
        to: order.buyerEmail,
        subject: `Drabyard refund of ${money(total)}`,
        greeting: `Hello ${order.buyerName},`,
        paragraphs: [`We refunded ${money(total)} to your card (${reason}). Card refunds usually show within 5 to 10 business days.`],
        action: { label: 'See your order', url: `${origin}/orders/${orderId}` },
      }),
    );
    for (const p of parts) {
      const s = subs.find((x) => x.s.id === p.subOrderId);
      if (!s) continue;
      await sendMail(
        composeMail({
          to: s.email,
          subject: `Refund on a Drabyard sale: ${money(p.amountCents)}`,
          greeting: `Hello ${s.name},`,
          paragraphs: [`${money(p.amountCents)} of your sale to ${order.buyerName} was refunded (${reason}). What you give back (the refund less the platform fee we return) comes off your payout, or is taken back from your Stripe balance when the payout already went out. Your monthly statement shows it.`],
          action: { label: 'Open the order', url: `${origin}/seller/orders/${s.s.id}` },
        }),
      );
    }
  });
}
