import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, meHandler, mockApi, renderApp, renderWithProviders } from '@/testing/test-utils';
import { LISTING_ID, makeListingPage, makePhoto } from '../testing/listing-fixtures';
import { ListingView } from './listing-view';

describe('listing page', () => {
  it('when a buyer opens a live listing, then the condition is explained, and the seller, part chain and cautions show', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null), [`GET /api/listings/${LISTING_ID}`]: jsonResponse(200, makeListingPage()) });
    renderApp(`/listings/${LISTING_ID}`);

    expect(await screen.findByRole('heading', { level: 1, name: 'Wheel cylinder, front, rebuilt' })).toBeInTheDocument();
    expect(screen.getByText('$42.50')).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'The condition: Used original' })).toBeInTheDocument();
    expect(screen.getByText('Grade 2 of 5: Honest')).toBeInTheDocument();
    const scale = screen.getByRole('list', { name: 'The Drabyard grade scale for used originals' });
    expect(within(scale).getByText('2. Honest')).toHaveAttribute('aria-current', 'true');
    expect(screen.getByRole('complementary', { name: 'Safety cautions' })).toHaveTextContent('Hydraulic brake rubber ages even unused.');
    expect(screen.getByRole('region', { name: 'Seller' })).toHaveTextContent('Fenwick Yard');
    expect(screen.getByRole('region', { name: 'Seller' })).toHaveTextContent('Ships to US, CA');
    expect(screen.getByRole('list', { name: 'Supersession chain' })).toHaveTextContent('FX-1001 Wheel cylinder, front (fictional)is replaced byFX-1002');
    expect(screen.queryByRole('link', { name: /Edit listing/ })).toBeNull();
  });

  it('when the gallery has photos, then arrow keys move between them and the zoom view opens, zooms and closes with Escape', async () => {
    mockApi({});
    const page = makeListingPage({}, { photos: [makePhoto(1), makePhoto(2), makePhoto(3)] });
    const { user } = renderWithProviders(<ListingView page={page} />);

    const main = screen.getByRole('button', { name: 'Zoom photo 1 of 3' });
    main.focus();
    await user.keyboard('{ArrowRight}');
    expect(screen.getByRole('button', { name: 'Zoom photo 2 of 3' })).toBeInTheDocument();
    await user.keyboard('{End}');
    expect(screen.getByRole('img', { name: 'Wheel cylinder, front, rebuilt, photo 3 of 3' })).toHaveAttribute('src', '/media/m3.webp');
    await user.keyboard('{ArrowRight}');
    expect(screen.getByRole('button', { name: 'Zoom photo 1 of 3' })).toHaveFocus();

    await user.keyboard('{Enter}');
    const dialog = screen.getByRole('dialog');
    expect(dialog).toHaveAccessibleName(/photo 1 of 3, zoom 1×/);
    expect(within(dialog).getByRole('img')).toHaveAttribute('src', '/media/l1.webp');
    await user.keyboard('+');
    expect(dialog).toHaveAccessibleName(/zoom 2×/);
    await user.click(within(dialog).getByRole('button', { name: 'Zoom in' }));
    expect(dialog).toHaveAccessibleName(/zoom 3×/);
    await user.keyboard('{ArrowLeft}');
    expect(dialog).toHaveAccessibleName(/photo 3 of 3/);
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(screen.getByRole('button', { name: 'Zoom photo 3 of 3' })).toHaveFocus();
  });

  it('when the seller views their own listing in review, then its state and an edit link show', () => {
    mockApi({});
    renderWithProviders(<ListingView page={makeListingPage({ viewer: { isOwner: true, isAdmin: false, allowedActions: ['edit', 'withdraw'] } }, { state: 'submitted' })} />);
    expect(screen.getByText('In review')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /Edit listing/ })).toHaveAttribute('href', `/seller/listings/${LISTING_ID}/edit`);
  });
});
