import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { CartGroup, CartItem, CartReply } from '@shared/schemas/orders';
import { errorResponse, jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { CartPage } from './cart-page';

// Fictional shops and parts.
function item(overrides: Partial<CartItem> = {}): CartItem {
  return {
    listingId: '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0001',
    title: 'Brake hose, front, reproduction',
    quantity: 1,
    available: 4,
    unitPriceCents: 2450,
    priceCentsAtAdd: 2450,
    priceChanged: false,
    lineCents: 2450,
    thumbnailUrl: null,
    ...overrides,
  };
}

function group(id: string, name: string, items: CartItem[], shippingCents = 900): CartGroup {
  return {
    seller: { id, name },
    items,
    itemsCents: items.reduce((a, i) => a + i.lineCents, 0),
    shipping: { ok: true, amountCents: shippingCents, explanation: 'Weight band up to 2 kg' },
  };
}

function cart(groups: CartGroup[], overrides: Partial<CartReply> = {}): CartReply {
  const itemsCents = groups.reduce((a, g) => a + g.itemsCents, 0);
  const shippingCents = groups.reduce((a, g) => a + (g.shipping.ok ? g.shipping.amountCents : 0), 0);
  return { groups, destination: { country: 'US' }, itemsCents, shippingCents, totalCents: itemsCents + shippingCents, canCheckout: true, warnings: [], ...overrides };
}

const twoSellers = cart([
  group('seller-a', 'Tin Kettle Salvage', [
    item({ listingId: '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0001', title: 'Wheel cylinder, rear, 7/8 in', quantity: 2, unitPriceCents: 3100, priceCentsAtAdd: 2800, priceChanged: true, lineCents: 6200 }),
    item({ listingId: '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0002', title: 'Shoe, brake, lined', quantity: 1, lineCents: 1800, unitPriceCents: 1800, priceCentsAtAdd: 1800 }),
  ]),
  group('seller-b', 'Marsh Lane Repro', [item({ listingId: '0b6f0c52-6c61-4d3a-9a53-6f1d2b1e0003', title: 'Hose clamp set' })], 1600),
]);

const signedIn = (extra = {}) => ({ 'GET /api/orders': jsonResponse(200, { orders: [] }), ...extra });

function renderCart(props: Partial<Parameters<typeof CartPage>[0]> = {}) {
  return renderWithProviders(
    <CartPage userId="usr_test_1" destination={{ country: 'US' }} onDestinationChange={() => {}} signInHref="/sign-in?next=%2Fcart" {...props} />,
  );
}

describe('cart page', () => {
  it('when the cart holds items from two sellers, then each seller is a group with its own subtotal and shipping, and the totals are the server’s', async () => {
    mockApi(signedIn({ 'GET /api/cart': jsonResponse(200, twoSellers) }));
    renderCart();

    const a = await screen.findByRole('region', { name: 'Tin Kettle Salvage' });
    const b = screen.getByRole('region', { name: 'Marsh Lane Repro' });
    expect(within(a).getAllByRole('listitem')).toHaveLength(2);
    expect(within(b).getAllByRole('listitem')).toHaveLength(1);
    expect(within(a).getByText('Items from Tin Kettle Salvage').nextElementSibling).toHaveTextContent('$80.00');
    expect(within(a).getByText('Shipping').nextElementSibling).toHaveTextContent('$9.00');
    expect(within(b).getByText('Shipping').nextElementSibling).toHaveTextContent('$16.00');
    // 80.00 + 24.50 items, 9.00 + 16.00 shipping: shown as the server sent it.
    expect(screen.getByTestId('cart-total')).toHaveTextContent('$129.50');
    expect(screen.getByText('Shipping (2 sellers)')).toBeInTheDocument();
  });

  it('when a price changed since the item was added, then the line says so with the old price struck through', async () => {
    mockApi(signedIn({ 'GET /api/cart': jsonResponse(200, twoSellers) }));
    renderCart();

    const line = (await screen.findByRole('link', { name: 'Wheel cylinder, rear, 7/8 in' })).closest('li') as HTMLElement;
    expect(within(line).getByText('Price went up')).toBeInTheDocument();
    expect(within(line).getByText('$28.00').tagName).toBe('S');
    expect(line).toHaveTextContent('now $31.00');
    const unchanged = screen.getByRole('link', { name: 'Shoe, brake, lined' }).closest('li') as HTMLElement;
    expect(within(unchanged).queryByText(/Price went/)).not.toBeInTheDocument();
  });

  it('when the server reports warnings, then they are listed above the groups', async () => {
    const withWarning = { ...twoSellers, warnings: [{ code: 'price_changed' as const, listingId: 'x', message: '"Wheel cylinder, rear, 7/8 in" now costs $31.00 (was $28.00 when you added it).' }] };
    mockApi(signedIn({ 'GET /api/cart': jsonResponse(200, withWarning) }));
    renderCart();
    const notice = (await screen.findByText('Since you added these items')).closest('[role="status"]');
    expect(notice).toHaveTextContent('now costs $31.00 (was $28.00');
  });

  it('when a seller cannot ship to the destination, then the group explains it and checkout is disabled', async () => {
    const refused = cart([{ ...group('seller-b', 'Marsh Lane Repro', [item()]), shipping: { ok: false, reason: 'does_not_ship_to', explanation: 'This seller does not ship to NO.' } }], {
      canCheckout: false,
      destination: { country: 'NO' },
    });
    mockApi(signedIn({ 'GET /api/cart': jsonResponse(200, refused) }));
    renderCart({ destination: { country: 'NO' } });

    expect(await screen.findByText('This seller does not ship to NO.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Check out' })).toBeDisabled();
  });

  it('when signed out, then the cart shows and checkout asks to sign in first', async () => {
    mockApi({ 'GET /api/cart': jsonResponse(200, twoSellers) });
    renderCart({ userId: null });
    expect(await screen.findByRole('link', { name: 'Sign in to check out' })).toHaveAttribute('href', '/sign-in?next=%2Fcart');
    expect(screen.queryByRole('button', { name: 'Check out' })).not.toBeInTheDocument();
  });

  it('when Check out is pressed, then the destination is sent and the browser goes to the payment page', async () => {
    const redirect = vi.fn();
    const { calls } = mockApi(
      signedIn({
        'GET /api/cart': jsonResponse(200, twoSellers),
        'POST /api/checkout': jsonResponse(201, { orderId: 'c7a1e3a0-0000-4000-8000-000000000001', url: 'http://127.0.0.1:4999/pay/cs_test_1' }),
      }),
    );
    const { user } = renderCart({ redirect });

    await user.click(await screen.findByRole('button', { name: 'Check out' }));
    await waitFor(() => expect(redirect).toHaveBeenCalledWith('http://127.0.0.1:4999/pay/cs_test_1'));
    expect(calls.find((c) => c.path === '/api/checkout')?.body).toEqual({ destination: { country: 'US' } });
  });

  it('when checkout is refused for stock, then the server’s message shows', async () => {
    mockApi(
      signedIn({
        'GET /api/cart': jsonResponse(200, twoSellers),
        'POST /api/checkout': errorResponse(409, 'conflict', '"Hose clamp set": you asked for 1 but none are left.'),
      }),
    );
    const { user } = renderCart({ redirect: vi.fn() });
    await user.click(await screen.findByRole('button', { name: 'Check out' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('none are left');
  });

  it('when an unpaid checkout still holds the items, then the cart offers to release it', async () => {
    const open = { id: 'c7a1e3a0-0000-4000-8000-000000000002', state: 'pending_payment', itemsCents: 1000, shippingCents: 0, totalCents: 1000, refundedCents: 0, destination: { country: 'US' }, createdAt: new Date().toISOString(), paidAt: null, expiresAt: new Date(Date.now() + 20 * 60_000).toISOString(), sellerCount: 1, itemCount: 1 };
    const { calls } = mockApi({
      'GET /api/cart': jsonResponse(200, twoSellers),
      'GET /api/orders': jsonResponse(200, { orders: [open] }),
      'POST /api/orders/c7a1e3a0-0000-4000-8000-000000000002/cancel': jsonResponse(200, { order: {} }),
    });
    const { user } = renderCart();
    await user.click(await screen.findByRole('button', { name: 'Release the held items' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path.endsWith('/cancel'))).toBe(true));
  });

  it('when the cart is empty, then it says so and points to search and the catalog', async () => {
    mockApi(signedIn({ 'GET /api/cart': jsonResponse(200, cart([], { canCheckout: false })) }));
    renderCart();
    expect(await screen.findByRole('heading', { name: 'Your cart is empty' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Search parts' })).toBeInTheDocument();
  });
});
