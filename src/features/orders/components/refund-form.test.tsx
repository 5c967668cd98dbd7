import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { OrderDto, SubOrderDto } from '@shared/schemas/orders';
import { errorResponse, jsonResponse, makeUser, meHandler, mockApi, renderWithProviders } from '@/testing/test-utils';
import { dollarsToCents } from '../utils/money';
import { OrderDetail } from './order-detail';

// A fictional paid order with two sellers.
const ORDER_ID = 'c7a1e3a0-2222-4000-8000-000000000001';
const SUB_A = 'd1a1e3a0-2222-4000-8000-000000000001';
const SUB_B = 'd1a1e3a0-2222-4000-8000-000000000002';
const LINE_1 = 'e1a1e3a0-2222-4000-8000-000000000001';
const LINE_2 = 'e1a1e3a0-2222-4000-8000-000000000002';

function sub(overrides: Partial<SubOrderDto>): SubOrderDto {
  return {
    id: SUB_A,
    orderId: ORDER_ID,
    seller: { id: 'seller-a', name: 'Tin Kettle Salvage' },
    state: 'delivered',
    itemsCents: 8000,
    shippingCents: 900,
    refundedCents: 0,
    shippingExplanation: 'Weight band up to 2 kg',
    pickup: false,
    carrier: null,
    tracking: null,
    shippedAt: null,
    deliveredAt: '2026-03-03T10:00:00Z',
    lines: [
      { id: LINE_1, listingId: 'l-1', title: 'Wheel cylinder, rear', quantity: 3, refundedQuantity: 1, unitPriceCents: 2000, lineCents: 6000 },
      { id: LINE_2, listingId: 'l-2', title: 'Bleeder screw', quantity: 2, refundedQuantity: 0, unitPriceCents: 1000, lineCents: 2000 },
    ],
    ...overrides,
  };
}

const order: OrderDto = {
  id: ORDER_ID,
  state: 'paid',
  itemsCents: 10450,
  shippingCents: 2500,
  totalCents: 12950,
  refundedCents: 0,
  destination: { country: 'US' },
  shipTo: null,
  createdAt: '2026-03-01T09:00:00Z',
  paidAt: '2026-03-01T09:02:00Z',
  expiresAt: '2026-03-01T09:35:00Z',
  subOrders: [
    sub({}),
    sub({ id: SUB_B, seller: { id: 'seller-b', name: 'Marsh Lane Repro' }, itemsCents: 2450, shippingCents: 1600, lines: [{ id: 'e1a1e3a0-2222-4000-8000-000000000003', listingId: 'l-3', title: 'Hose clamp set', quantity: 1, refundedQuantity: 0, unitPriceCents: 2450, lineCents: 2450 }] }),
  ],
  refunds: [],
};

const refundPath = `/api/admin/orders/${ORDER_ID}/refund`;

describe('refund from the order page', () => {
  it('when a buyer (not an admin) reads the order, then no refund form is shown', async () => {
    const { fetchMock } = mockApi({ 'GET /api/auth/me': meHandler(makeUser()) });
    renderWithProviders(<OrderDetail order={order} />);
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    // Let the session reply settle before checking that nothing appeared.
    await new Promise((r) => setTimeout(r, 50));
    expect(screen.getByRole('region', { name: 'Tin Kettle Salvage' })).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: /Refund the part/ })).not.toBeInTheDocument();
  });

  it('when an admin refunds dollars with a reason, then cents for that sub-order are sent; with restock, every remaining unit is named', async () => {
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(makeUser({ roles: ['admin'] })),
      [`POST ${refundPath}`]: jsonResponse(200, { order: { ...order, state: 'partially_refunded', refundedCents: 1250 } }),
      'GET /api/orders': jsonResponse(200, { orders: [] }),
    });
    const { user } = renderWithProviders(<OrderDetail order={order} />);
    const form = await screen.findByRole('form', { name: 'Refund the part from Tin Kettle Salvage' });
    expect(screen.getByRole('form', { name: 'Refund the part from Marsh Lane Repro' })).toBeInTheDocument();

    // The reason is required before anything is sent.
    await user.type(within(form).getByLabelText('Amount in dollars'), '12.5');
    await user.click(within(form).getByRole('button', { name: 'Refund' }));
    expect(await within(form).findByText('Give a reason of at least 3 characters')).toBeInTheDocument();
    expect(calls.some((c) => c.path === refundPath)).toBe(false);

    await user.type(within(form).getByLabelText('Reason'), 'Arrived cracked');
    await user.click(within(form).getByRole('button', { name: 'Refund' }));
    await waitFor(() => expect(calls.filter((c) => c.path === refundPath).at(-1)?.body).toEqual({ subOrderId: SUB_A, amountCents: 1250, restock: false, reason: 'Arrived cracked' }));

    await user.click(within(form).getByLabelText('Put the items back in stock'));
    expect(within(form).getByLabelText('Amount in dollars')).toBeDisabled();
    await user.type(within(form).getByLabelText('Reason'), 'Returned unused');
    await user.click(within(form).getByRole('button', { name: 'Refund' }));
    await waitFor(() =>
      expect(calls.filter((c) => c.path === refundPath).at(-1)?.body).toEqual({
        subOrderId: SUB_A,
        lines: [
          { lineId: LINE_1, quantity: 2 },
          { lineId: LINE_2, quantity: 2 },
        ],
        restock: true,
        reason: 'Returned unused',
      }),
    );
  });

  it('when the server refuses the refund, then its message shows in the form', async () => {
    mockApi({
      'GET /api/auth/me': meHandler(makeUser({ roles: ['admin'] })),
      [`POST ${refundPath}`]: errorResponse(409, 'conflict', 'The payment processor refused the refund.'),
    });
    const { user } = renderWithProviders(<OrderDetail order={order} />);
    const form = await screen.findByRole('form', { name: 'Refund the part from Marsh Lane Repro' });
    await user.type(within(form).getByLabelText('Reason'), 'Never shipped');
    await user.click(within(form).getByRole('button', { name: 'Refund' }));
    expect(await within(form).findByRole('alert')).toHaveTextContent('The payment processor refused the refund.');
  });

  it('when dollars are typed, then they become whole cents without float error', () => {
    expect(dollarsToCents('0.29')).toBe(29);
    expect(dollarsToCents('$1,234.5')).toBe(123450);
    expect(dollarsToCents('12')).toBe(1200);
    expect(dollarsToCents('1.234')).toBeNull();
    expect(dollarsToCents('-3')).toBeNull();
  });
});
