import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { SubOrderDto } from '@shared/schemas/orders';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatCents } from '@/lib/money';

/**
 * The lines of one seller's part of an order: item, quantity, price each and amount, with units refunded
 * under the item. Buyers get links to the listings; `footer` adds rows (shipping, refunds) under the lines.
 */
export function OrderLinesTable({ lines, caption, linkToListings = false, footer }: { lines: SubOrderDto['lines']; caption: string; linkToListings?: boolean; footer?: ReactNode }) {
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead className="text-left text-label text-ink-muted uppercase">
        <tr>
          <th scope="col" className="pb-1.5 font-semibold">Item</th>
          <th scope="col" className="pb-1.5 text-right font-semibold">Qty</th>
          <th scope="col" className="pb-1.5 text-right font-semibold">Each</th>
          <th scope="col" className="pb-1.5 text-right font-semibold">Amount</th>
        </tr>
      </thead>
      <tbody className="divide-y divide-rule border-y border-rule">
        {lines.map((l) => (
          <tr key={l.id}>
            <td className="py-2 pr-3">
              {linkToListings ? (
                <Link to={paths.listing.getHref(l.listingId)} className={textLinkClasses}>
                  {l.title}
                </Link>
              ) : (
                l.title
              )}
              {l.refundedQuantity > 0 ? <span className="block text-xs text-danger">{l.refundedQuantity} refunded</span> : null}
            </td>
            <td className="py-2 text-right tabular-nums">{l.quantity}</td>
            <td className="py-2 text-right tabular-nums">{formatCents(l.unitPriceCents)}</td>
            <td className="py-2 text-right tabular-nums">{formatCents(l.lineCents)}</td>
          </tr>
        ))}
      </tbody>
      {footer ? <tfoot className="text-ink-soft">{footer}</tfoot> : null}
    </table>
  );
}
