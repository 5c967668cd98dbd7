import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SellerSubOrderDto } from '@shared/schemas/orders';
import { errorResponse, jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { SellerOrderDetail } from './seller-order-detail';

const ID = 'd1a1e3a0-1111-4000-8000-000000000001';

function subOrder(overrides: Partial<SellerSubOrderDto> = {}): SellerSubOrderDto {
  return {
    id: ID,
    orderId: 'c7a1e3a0-1111-4000-8000-000000000001',
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
    lines: [{ id: 'l1', listingId: 'x', title: 'Wheel cylinder, rear, 7/8 in', quantity: 2, refundedQuantity: 0, unitPriceCents: 3100, lineCents: 6200 }],
    buyer: { name: 'Wren Halloway', email: 'wren.halloway@example.test' },
    destination: { country: 'US' },
    shipTo: { name: 'Wren Halloway', line1: '14 Quarry Lane', line2: null, city: 'Marrow Bend', state: 'OH', postalCode: '45999', country: 'US' },
    feeCents: 568,
    shareCents: 6532,
    paidAt: '2026-03-01T09:02:00Z',
    transfer: { state: 'waiting_for_onboarding', amountCents: 6532 },
    ...overrides,
  };
}

describe('seller order detail', () => {
  it('when a paid order is shipped with carrier and tracking, then both are sent to the server', async () => {
    const { calls } = mockApi({
      [`POST /api/seller/orders/${ID}/ship`]: ({ body }) => jsonResponse(200, { subOrder: subOrder({ state: 'shipped', ...(body as object), shippedAt: '2026-03-02T10:00:00Z' }) }),
      'GET /api/seller/orders': jsonResponse(200, { subOrders: [] }),
    });
    const { user } = renderWithProviders(<SellerOrderDetail subOrder={subOrder()} />);
    expect(screen.getByText('Waiting for payout setup ($65.32)', { exact: false })).toBeInTheDocument();

    await user.type(screen.getByLabelText('Carrier'), 'UPS');
    await user.type(screen.getByLabelText('Tracking number'), '1Z999AA10123456784');
    await user.click(screen.getByRole('button', { name: 'Mark as shipped' }));

    await waitFor(() => expect(calls.find((c) => c.path.endsWith('/ship'))?.body).toEqual({ carrier: 'UPS', tracking: '1Z999AA10123456784' }));
  });

  it('when the buyer gave a shipping address, then the seller sees it to write the label', () => {
    mockApi({});
    renderWithProviders(<SellerOrderDetail subOrder={subOrder()} />);
    expect(screen.getByText('Ship to')).toBeInTheDocument();
    expect(screen.getByText('14 Quarry Lane')).toBeInTheDocument();
    expect(screen.getByText('Marrow Bend, OH 45999')).toBeInTheDocument();
  });

  it('when the tracking number has odd characters, then the shared schema stops it before sending', async () => {
    const { calls } = mockApi({});
    const { user } = renderWithProviders(<SellerOrderDetail subOrder={subOrder()} />);
    await user.type(screen.getByLabelText('Carrier'), 'UPS');
    await user.type(screen.getByLabelText('Tracking number'), '1Z#99');
    await user.click(screen.getByRole('button', { name: 'Mark as shipped' }));
    expect(await screen.findByText('Use letters, digits, spaces and hyphens only')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });

  it('when a shipped order is marked delivered and the server refuses, then its reason shows', async () => {
    mockApi({ [`POST /api/seller/orders/${ID}/deliver`]: errorResponse(409, 'invalid_state', 'This order is refunded; it cannot be marked delivered now.') });
    const { user } = renderWithProviders(<SellerOrderDetail subOrder={subOrder({ state: 'shipped', carrier: 'UPS', tracking: '1Z9' })} />);
    await user.click(screen.getByRole('button', { name: 'Mark as delivered' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('cannot be marked delivered');
  });
});
