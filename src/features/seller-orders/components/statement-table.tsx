import { Download } from 'lucide-react';
import type { Statement } from '@shared/schemas/orders';
import { buttonClasses } from '@/components/ui/button';
import { formatDate } from '@/lib/format';
import { statementCsvHref } from '../api/get-statement';
import { formatCents } from '@/lib/money';
import { monthLabel } from '../utils/month';
import { orderRef } from '../utils/seller-states';

// Money the seller gives up shows with a minus; a fee handed back on a refund shows with a plus.
const neg = (cents: number) => (cents === 0 ? formatCents(0) : `−${formatCents(cents)}`);
const fee = (cents: number) => (cents < 0 ? `+${formatCents(-cents)}` : neg(cents));

/**
 * A month's payout statement: each sale and refund with sales, shipping, fee, refund and net; the totals
 * row is the server's (lines and totals add up exactly there, in cents).
 */
export function StatementTable({ statement }: { statement: Statement }) {
  const { totals } = statement;
  const label = monthLabel(statement.month);
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-lg font-semibold text-ink">
          Statement for {label} <span className="font-normal text-ink-muted">· {statement.shopName}</span>
        </h2>
        <a href={statementCsvHref(statement.month)} download={`drabyard-statement-${statement.month}.csv`} className={buttonClasses('secondary', 'sm')}>
          <Download aria-hidden="true" className="size-4" /> Download CSV
        </a>
      </div>
      <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
        <table className="w-full min-w-[46rem] border-collapse text-left text-sm">
          <caption className="sr-only">Payout statement for {label}</caption>
          <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
            <tr>
              <th scope="col" className="px-4 py-2.5">Date</th>
              <th scope="col" className="px-4 py-2.5">Order</th>
              <th scope="col" className="px-4 py-2.5">Kind</th>
              <th scope="col" className="px-4 py-2.5 text-right">Sales</th>
              <th scope="col" className="px-4 py-2.5 text-right">Shipping</th>
              <th scope="col" className="px-4 py-2.5 text-right">Fees</th>
              <th scope="col" className="px-4 py-2.5 text-right">Refunds</th>
              <th scope="col" className="px-4 py-2.5 text-right">Net</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {statement.lines.length === 0 ? (
              <tr>
                <td colSpan={8} className="px-4 py-8 text-center text-ink-muted">
                  No sales or refunds in {label}.
                </td>
              </tr>
            ) : (
              statement.lines.map((l, i) => (
                <tr key={`${l.kind}-${l.subOrderId}-${i}`}>
                  <td className="px-4 py-2.5 whitespace-nowrap">{formatDate(l.date)}</td>
                  <td className="px-4 py-2.5 font-mono">{orderRef(l.orderId)}</td>
                  <td className="px-4 py-2.5">{l.kind === 'sale' ? 'Sale' : 'Refund'}</td>
                  <td className="px-4 py-2.5 text-right tabular-nums">{formatCents(l.salesCents)}</td>
                  <td className="px-4 py-2.5 text-right tabular-nums">{formatCents(l.shippingCents)}</td>
                  <td className="px-4 py-2.5 text-right tabular-nums">{fee(l.feeCents)}</td>
                  <td className="px-4 py-2.5 text-right tabular-nums">{neg(l.refundCents)}</td>
                  <td className="px-4 py-2.5 text-right font-medium tabular-nums">{formatCents(l.netCents)}</td>
                </tr>
              ))
            )}
          </tbody>
          <tfoot className="border-t-2 border-rule-strong bg-paper-sunk/60 font-semibold">
            <tr>
              <th scope="row" colSpan={3} className="px-4 py-2.5 text-left">
                Totals
              </th>
              <td className="px-4 py-2.5 text-right tabular-nums">{formatCents(totals.salesCents)}</td>
              <td className="px-4 py-2.5 text-right tabular-nums">{formatCents(totals.shippingCents)}</td>
              <td className="px-4 py-2.5 text-right tabular-nums">{fee(totals.feeCents)}</td>
              <td className="px-4 py-2.5 text-right tabular-nums">{neg(totals.refundCents)}</td>
              <td className="px-4 py-2.5 text-right tabular-nums" data-testid="statement-net">
                {formatCents(totals.netCents)}
              </td>
            </tr>
          </tfoot>
        </table>
      </div>
      <p className="text-xs text-ink-muted">
        Months run in UTC. Net = sales + shipping − fees − refunds. Sent to your payout account this month: {formatCents(statement.transferredCents)}.
      </p>
    </div>
  );
}
