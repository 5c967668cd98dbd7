import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { CartReply } from '@shared/schemas/orders';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { CartPage } from './cart-page';

const LISTING = '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0009';

function cartWith(quantity: number, available: number): CartReply {
  const lineCents = quantity * 1200;
  return {
    groups: [
      {
        seller: { id: 'seller-a', name: 'Tin Kettle Salvage' },
        items: [{ listingId: LISTING, title: 'Clevis pin, 3/8 in', quantity, available, unitPriceCents: 1200, priceCentsAtAdd: 1200, priceChanged: false, lineCents, thumbnailUrl: null }],
        itemsCents: lineCents,
        shipping: { ok: true, amountCents: 900, explanation: 'Weight band up to 500 g' },
      },
    ],
    destination: { country: 'US' },
    itemsCents: lineCents,
    shippingCents: 900,
    totalCents: lineCents + 900,
    canCheckout: quantity <= available,
    warnings: [],
  };
}

function renderCart() {
  return renderWithProviders(<CartPage userId={null} destination={{ country: 'US' }} onDestinationChange={() => {}} signInHref="/sign-in" />);
}

describe('cart quantities, capped by stock', () => {
  it('when the quantity reaches what is in stock, then "one more" is disabled', async () => {
    mockApi({ 'GET /api/cart': jsonResponse(200, cartWith(3, 3)) });
    renderCart();
    expect(await screen.findByRole('button', { name: 'One more: Clevis pin, 3/8 in' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'One fewer: Clevis pin, 3/8 in' })).toBeEnabled();
    expect(screen.getByText('3 available')).toBeInTheDocument();
  });

  it('when the buyer types more than is in stock, then it is brought down to the stock, said why, and the capped number is sent', async () => {
    const { calls } = mockApi({
      'GET /api/cart': jsonResponse(200, cartWith(1, 3)),
      [`PATCH /api/cart/items/${LISTING}`]: ({ body }) => jsonResponse(200, cartWith((body as { quantity: number }).quantity, 3)),
    });
    const { user } = renderCart();

    const input = await screen.findByRole('spinbutton', { name: 'Quantity: Clevis pin, 3/8 in' });
    await user.clear(input);
    await user.type(input, '9{Enter}');

    await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ quantity: 3 }));
    expect(calls.find((c) => c.method === 'PATCH')?.path).toBe(`/api/cart/items/${LISTING}`);
    expect(await screen.findByText('Only 3 available')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByRole('spinbutton', { name: 'Quantity: Clevis pin, 3/8 in' })).toHaveValue(3));
    expect(screen.getByTestId('cart-total')).toHaveTextContent('$45.00');
  });

  it('when stock fell below what the cart holds, then the line says so and "Keep 2" lowers it', async () => {
    const { calls } = mockApi({
      'GET /api/cart': jsonResponse(200, cartWith(5, 2)),
      [`PATCH /api/cart/items/${LISTING}`]: ({ body }) => jsonResponse(200, cartWith((body as { quantity: number }).quantity, 2)),
    });
    const { user } = renderCart();

    expect(await screen.findByText(/Only 2 left, you have 5/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Keep 2' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ quantity: 2 }));
    await waitFor(() => expect(screen.queryByText(/Only 2 left/)).not.toBeInTheDocument());
  });

  it('when a listing is no longer available, then only Remove is offered', async () => {
    const { calls } = mockApi({
      'GET /api/cart': jsonResponse(200, cartWith(1, 0)),
      [`DELETE /api/cart/items/${LISTING}`]: jsonResponse(200, { ...cartWith(1, 0), groups: [], itemsCents: 0, shippingCents: 0, totalCents: 0, canCheckout: false }),
    });
    const { user } = renderCart();
    expect(await screen.findByText(/No longer available/)).toBeInTheDocument();
    expect(screen.queryByRole('spinbutton')).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove Clevis pin, 3/8 in' }));
    expect(await screen.findByRole('heading', { name: 'Your cart is empty' })).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'DELETE')).toBe(true);
  });
});
