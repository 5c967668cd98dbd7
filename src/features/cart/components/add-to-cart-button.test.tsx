import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorResponse, jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { AddToCartButton } from './add-to-cart-button';

const LISTING = '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0010';
const emptyish = { groups: [], destination: null, itemsCents: 0, shippingCents: 0, totalCents: 0, canCheckout: false, warnings: [] };

describe('add to cart button', () => {
  it('when pressed, then one unit is added and a link to the cart shows', async () => {
    const { calls } = mockApi({ 'POST /api/cart/items': jsonResponse(201, emptyish) });
    const { user } = renderWithProviders(<AddToCartButton listingId={LISTING} available={2} />);
    await user.click(screen.getByRole('button', { name: 'Add to cart' }));
    expect(await screen.findByRole('link', { name: 'View cart' })).toHaveAttribute('href', '/cart');
    expect(calls[0].body).toEqual({ listingId: LISTING, quantity: 1 });
  });

  it('when nothing is left, then it is a disabled "Sold out"', () => {
    mockApi({});
    renderWithProviders(<AddToCartButton listingId={LISTING} available={0} />);
    expect(screen.getByRole('button', { name: 'Sold out' })).toBeDisabled();
  });

  it('when the server refuses, then its message shows', async () => {
    mockApi({ 'POST /api/cart/items': errorResponse(409, 'conflict', 'This is your own listing; you cannot buy it.') });
    const { user } = renderWithProviders(<AddToCartButton listingId={LISTING} available={2} />);
    await user.click(screen.getByRole('button', { name: 'Add to cart' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('your own listing');
  });
});
