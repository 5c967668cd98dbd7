import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Statement } from '@shared/schemas/orders';
import { mockApi, renderWithProviders } from '@/testing/test-utils';
import { StatementTable } from './statement-table';

// A sale of $62.00 + $9.00 shipping with a $5.68 fee, then a $20.00 refund that hands back $1.60 of the fee.
const statement: Statement = {
  month: '2026-03',
  sellerId: 'seller-a',
  shopName: 'Tin Kettle Salvage',
  lines: [
    { date: '2026-03-01T09:02:00Z', kind: 'sale', orderId: 'c7a1e3a0-1111-4000-8000-000000000001', subOrderId: 's1', salesCents: 6200, shippingCents: 900, feeCents: 568, refundCents: 0, netCents: 6532 },
    { date: '2026-03-04T12:00:00Z', kind: 'refund', orderId: 'c7a1e3a0-1111-4000-8000-000000000001', subOrderId: 's1', salesCents: 0, shippingCents: 0, feeCents: -160, refundCents: 2000, netCents: -1840 },
  ],
  totals: { salesCents: 6200, shippingCents: 900, feeCents: 408, refundCents: 2000, netCents: 4692 },
  transferredCents: 4692,
};

describe('statement table', () => {
  it('when a month has a sale and a refund, then each is a row with sales, shipping, fee, refund and net, and the totals row adds up', () => {
    mockApi({});
    renderWithProviders(<StatementTable statement={statement} />);

    const table = screen.getByRole('table', { name: 'Payout statement for March 2026' });
    const [head, sale, refund, total] = within(table).getAllByRole('row');
    expect(within(head).getAllByRole('columnheader').map((c) => c.textContent)).toEqual(['Date', 'Order', 'Kind', 'Sales', 'Shipping', 'Fees', 'Refunds', 'Net']);
    expect(within(sale).getAllByRole('cell').map((c) => c.textContent)).toEqual(['1 Mar 2026', 'C7A1E3A0', 'Sale', '$62.00', '$9.00', '−$5.68', '$0.00', '$65.32']);
    expect(within(refund).getAllByRole('cell').map((c) => c.textContent)).toEqual(['4 Mar 2026', 'C7A1E3A0', 'Refund', '$0.00', '$0.00', '+$1.60', '−$20.00', '-$18.40']);
    expect(within(total).getByRole('rowheader')).toHaveTextContent('Totals');
    expect(within(total).getAllByRole('cell').map((c) => c.textContent)).toEqual(['$62.00', '$9.00', '−$4.08', '−$20.00', '$46.92']);
  });

  it('when shown, then the CSV download points at the month’s CSV', () => {
    mockApi({});
    renderWithProviders(<StatementTable statement={statement} />);
    const link = screen.getByRole('link', { name: 'Download CSV' });
    expect(link).toHaveAttribute('href', '/api/seller/statements?month=2026-03&format=csv');
    expect(link).toHaveAttribute('download', 'drabyard-statement-2026-03.csv');
  });

  it('when a month has nothing, then it says so and the totals are zero', () => {
    mockApi({});
    renderWithProviders(<StatementTable statement={{ ...statement, lines: [], totals: { salesCents: 0, shippingCents: 0, feeCents: 0, refundCents: 0, netCents: 0 }, transferredCents: 0 }} />);
    expect(screen.getByText('No sales or refunds in March 2026.')).toBeInTheDocument();
    expect(screen.getByTestId('statement-net')).toHaveTextContent('$0.00');
  });
});
