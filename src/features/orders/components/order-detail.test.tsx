import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { OrderDto, SubOrderDto } from '@shared/schemas/orders';
import { jsonResponse, makeUser, meHandler, mockApi, renderApp, renderWithProviders } from '@/testing/test-utils';
import { OrderDetail } from './order-detail';

const ORDER_ID = 'c7a1e3a0-1111-4000-8000-000000000001';

function sub(overrides: Partial<SubOrderDto>): SubOrderDto {
  return {
    id: 'd1a1e3a0-1111-4000-8000-000000000001',
    orderId: ORDER_ID,
    seller: { id: 'seller-a', name: 'Tin Kettle Salvage' },
    state: 'paid',
    itemsCents: 6200,
    shippingCents: 900,
    refundedCents: 0,
    shippingExplanation: 'Weight band up to 2 kg',
    pickup: false,
    carrier: null,
    tracking: null,
    shippedAt: null,
    deliveredAt: null,
    lines: [{ id: 'l1', listingId: '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0001', title: 'Wheel cylinder, rear, 7/8 in', quantity: 2, refundedQuantity: 0, unitPriceCents: 3100, lineCents: 6200 }],
    ...overrides,
  };
}

function order(overrides: Partial<OrderDto> = {}): OrderDto {
  return {
    id: ORDER_ID,
    state: 'paid',
    itemsCents: 8650,
    shippingCents: 2500,
    totalCents: 11150,
    refundedCents: 0,
    destination: { country: 'US' },
    shipTo: { name: 'Wren Halloway', line1: '14 Quarry Lane', line2: null, city: 'Marrow Bend', state: 'OH', postalCode: '45999', country: 'US' },
    createdAt: '2026-03-01T09:00:00Z',
    paidAt: '2026-03-01T09:02:00Z',
    expiresAt: '2026-03-01T09:35:00Z',
    subOrders: [
      sub({ state: 'shipped', carrier: 'UPS', tracking: '1Z999AA10123456784', shippedAt: '2026-03-02T10:00:00Z' }),
      sub({
        id: 'd1a1e3a0-1111-4000-8000-000000000002',
        seller: { id: 'seller-b', name: 'Marsh Lane Repro' },
        state: 'refunded',
        itemsCents: 2450,
        shippingCents: 1600,
        refundedCents: 4050,
        lines: [{ id: 'l2', listingId: '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0003', title: 'Hose clamp set', quantity: 1, refundedQuantity: 1, unitPriceCents: 2450, lineCents: 2450 }],
      }),
    ],
    refunds: [{ id: 'r1', subOrderId: 'd1a1e3a0-1111-4000-8000-000000000002', amountCents: 4050, restock: true, reason: 'Arrived cracked', createdAt: '2026-03-04T12:00:00Z' }],
    ...overrides,
  };
}

describe('order state display', () => {
  it('when one seller shipped and the other was refunded, then each part shows its own state and steps', () => {
    mockApi({});
    renderWithProviders(<OrderDetail order={order({ state: 'partially_refunded', refundedCents: 4050 })} />);

    const shipped = screen.getByRole('region', { name: 'Tin Kettle Salvage' });
    expect(within(shipped).getByText('Shipped', { selector: 'span.uppercase' })).toBeInTheDocument();
    const steps = within(shipped).getByRole('list', { name: 'Progress of the part from Tin Kettle Salvage' });
    const current = within(steps).getAllByRole('listitem').find((li) => li.getAttribute('aria-current') === 'step');
    expect(current).toHaveAttribute('data-step', 'shipped');
    expect(within(shipped).getByText('1Z999AA10123456784')).toBeInTheDocument();
    expect(shipped).toHaveTextContent('On its way with UPS');

    const refunded = screen.getByRole('region', { name: 'Marsh Lane Repro' });
    const stop = within(within(refunded).getByRole('list')).getAllByRole('listitem').at(-1);
    expect(stop).toHaveAttribute('data-status', 'stopped');
    expect(stop).toHaveTextContent('Refunded');
    expect(within(refunded).getByText('1 refunded')).toBeInTheDocument();

    expect(screen.getByText('Partly refunded')).toBeInTheDocument();
    expect(screen.getByTestId('order-total')).toHaveTextContent('$111.50');
    expect(screen.getByText(/Arrived cracked/)).toBeInTheDocument();
  });

  it('when the order ships, then the address given on the payment page shows; for pickup it does not', () => {
    mockApi({});
    const { unmount } = renderWithProviders(<OrderDetail order={order()} />);
    expect(screen.getByText('14 Quarry Lane')).toBeInTheDocument();
    expect(screen.getByText('Marrow Bend, OH 45999')).toBeInTheDocument();
    unmount();
    renderWithProviders(<OrderDetail order={order({ destination: { pickup: true }, shipTo: null })} />);
    expect(screen.queryByText('14 Quarry Lane')).toBeNull();
    expect(screen.getByText(/Pickup from each seller/)).toBeInTheDocument();
  });

  it('when back from the payment page before the payment is recorded, then it says it is confirming, and thanks once it is paid', async () => {
    let state: OrderDto['state'] = 'pending_payment';
    mockApi({
      'GET /api/auth/me': meHandler(makeUser()),
      [`GET /api/orders/${ORDER_ID}`]: () => {
        const reply = jsonResponse(200, { order: order({ state, paidAt: state === 'paid' ? '2026-03-01T09:02:00Z' : null }) });
        state = 'paid';
        return reply;
      },
    });
    renderApp(`/orders/${ORDER_ID}?paid=1`);

    expect(await screen.findByText('Confirming your payment…')).toBeInTheDocument();
    expect(await screen.findByText('Thank you: your payment is in', {}, { timeout: 4000 })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Order C7A1E3A0' })).toBeInTheDocument();
  });

  it('when an unpaid checkout is opened later, then it can be cancelled', async () => {
    const { calls } = mockApi({
      [`POST /api/orders/${ORDER_ID}/cancel`]: jsonResponse(200, { order: order({ state: 'cancelled', paidAt: null, subOrders: [sub({ state: 'cancelled' })], refunds: [] }) }),
      'GET /api/orders': jsonResponse(200, { orders: [] }),
    });
    const { user } = renderWithProviders(<OrderDetail order={order({ state: 'pending_payment', paidAt: null, subOrders: [sub({ state: 'pending_payment' })], refunds: [] })} />);
    expect(screen.getByText('This order is not paid yet')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Cancel this checkout' }));
    expect(calls.some((c) => c.path === `/api/orders/${ORDER_ID}/cancel`)).toBe(true);
  });
});
