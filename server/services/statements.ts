import { and, asc, eq, gte, inArray, lt } from 'drizzle-orm';
import type { Statement, StatementLine } from '../../shared/schemas/orders';
import { getDb } from '../db/client';
import { orders, refunds, sellerProfiles, subOrders, transfers } from '../db/schema/index';
import { notFound } from '../errors';

/*
 * The monthly payout statement of a seller: each sale paid in the month (items, shipping, platform fee) and
 * each refund made in the month, with the net the seller earns. Months run in UTC. Lines add up exactly:
 * net = sales + shipping - fee - refund, per line and in total.
 */

/**
 * The platform fee handed back to the seller when part of a sale is refunded: the fee is returned in
 * proportion to the share of the sale refunded, rounded half up on the running total, so the returns of
 * several partial refunds add up to the whole fee once everything is refunded (our rule).
 */
export function feeReturnedOnRefund(feeCents: number, saleTotalCents: number, refundedBefore: number, refundedAfter: number): number {
  if (saleTotalCents <= 0) return 0;
  const returned = (refunded: number) => {
    const r = BigInt(Math.min(Math.max(refunded, 0), saleTotalCents));
    // round half up of fee * r / total
    return Number((2n * BigInt(feeCents) * r + BigInt(saleTotalCents)) / (2n * BigInt(saleTotalCents)));
  };
  return returned(refundedAfter) - returned(refundedBefore);
}

function monthRange(month: string): { start: Date; end: Date } {
  const [y, m] = month.split('-').map(Number);
  return { start: new Date(Date.UTC(y, m - 1, 1)), end: new Date(Date.UTC(y, m, 1)) };
}

export async function monthlyStatement(sellerId: string, month: string): Promise<Statement> {
  const db = getDb();
  const { start, end } = monthRange(month);
  const [profile] = await db.select({ shopName: sellerProfiles.shopName }).from(sellerProfiles).where(eq(sellerProfiles.userId, sellerId));
  if (!profile) throw notFound('Shop');

  const sales = await db
    .select({ s: subOrders, paidAt: orders.paidAt })
    .from(subOrders)
    .innerJoin(orders, eq(orders.id, subOrders.orderId))
    .where(
      and(
        eq(subOrders.sellerId, sellerId),
        inArray(subOrders.state, ['paid', 'shipped', 'delivered', 'refunded']),
        gte(orders.paidAt, start),
        lt(orders.paidAt, end),
      ),
    )
    .orderBy(asc(orders.paidAt), asc(subOrders.id));

  const monthRefunds = await db
    .select({ r: refunds, s: subOrders })
    .from(refunds)
    .innerJoin(subOrders, eq(subOrders.id, refunds.subOrderId))
    .where(and(eq(subOrders.sellerId, sellerId), gte(refunds.createdAt, start), lt(refunds.createdAt, end)));
  // The fee returned by a refund depends on what was refunded before it, in any month.
  const affected = [...new Set(monthRefunds.map((x) => x.s.id))];
  const history = affected.length
    ? await db.select().from(refunds).where(inArray(refunds.subOrderId, affected)).orderBy(asc(refunds.createdAt), asc(refunds.id))
    : [];
  const refundedBefore = new Map<string, number>();
  {
    const running = new Map<string, number>();
    for (const r of history) {
      const sub = r.subOrderId as string;
      refundedBefore.set(r.id, running.get(sub) ?? 0);
      running.set(sub, (running.get(sub) ?? 0) + r.amountCents);
    }
  }

  const lines: StatementLine[] = [
    ...sales.map(({ s, paidAt }) => ({
      date: (paidAt as Date).toISOString(),
      kind: 'sale' as const,
      orderId: s.orderId,
      subOrderId: s.id,
      salesCents: s.itemsCents,
      shippingCents: s.shippingCents,
      feeCents: s.feeCents,
      refundCents: 0,
      netCents: s.itemsCents + s.shippingCents - s.feeCents,
    })),
    ...monthRefunds.map(({ r, s }) => {
      const before = refundedBefore.get(r.id) ?? 0;
      const feeBack = feeReturnedOnRefund(s.feeCents, s.itemsCents + s.shippingCents, before, before + r.amountCents);
      return {
        date: r.createdAt.toISOString(),
        kind: 'refund' as const,
        orderId: s.orderId,
        subOrderId: s.id,
        salesCents: 0,
        shippingCents: 0,
        feeCents: -feeBack,
        refundCents: r.amountCents,
        netCents: feeBack - r.amountCents,
      };
    }),
  ].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : a.kind === 'sale' ? -1 : 1));

  const sum = (pick: (l: StatementLine) => number) => lines.reduce((a, l) => a + pick(l), 0);
  const paidTransfers = await db
    .select({ amountCents: transfers.amountCents })
    .from(transfers)
    .where(and(eq(transfers.sellerId, sellerId), eq(transfers.state, 'paid'), gte(transfers.createdAt, start), lt(transfers.createdAt, end)));
  return {
    month,
    sellerId,
    shopName: profile.shopName,
    lines,
    totals: {
      salesCents: sum((l) => l.salesCents),
      shippingCents: sum((l) => l.shippingCents),
      feeCents: sum((l) => l.feeCents),
      refundCents: sum((l) => l.refundCents),
      netCents: sum((l) => l.netCents),
    },
    transferredCents: paidTransfers.reduce((a, t) => a + t.amountCents, 0),
  };
}

const dollars = (cents: number) => `${cents < 0 ? '-' : ''}${Math.floor(Math.abs(cents) / 100)}.${String(Math.abs(cents) % 100).padStart(2, '0')}`;

/** The statement as CSV (amounts in dollars with two decimals, one line per sale or refund, then the totals). */
export function statementCsv(st: Statement): string {
  const rows = [
    ['date', 'kind', 'order_id', 'sub_order_id', 'sales', 'shipping', 'fee', 'refund', 'net'],
    ...st.lines.map((l) => [l.date.slice(0, 10), l.kind, l.orderId, l.subOrderId, dollars(l.salesCents), dollars(l.shippingCents), dollars(l.feeCents), dollars(l.refundCents), dollars(l.netCents)]),
    ['', 'total', '', '', dollars(st.totals.salesCents), dollars(st.totals.shippingCents), dollars(st.totals.feeCents), dollars(st.totals.refundCents), dollars(st.totals.netCents)],
  ];
  // No field can hold a comma, quote or newline (ids, dates, numbers, fixed words), so no quoting is needed.
  return `${rows.map((r) => r.join(',')).join('\r\n')}\r\n`;
}
