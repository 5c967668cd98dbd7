import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, makeUser, meHandler, mockApi, renderApp } from '@/testing/test-utils';
import { deskListing, deskReply } from '../testing/desk-fixtures';

const seller = makeUser({ roles: ['buyer', 'seller'] });

describe('seller desk', () => {
  it('when the desk opens, then counts by state show and a count filters the table by state', async () => {
    const states: string[] = [];
    mockApi({
      'GET /api/auth/me': meHandler(seller),
      'GET /api/me/listings': ({ url }) => {
        states.push(url.searchParams.get('state') ?? '');
        return jsonResponse(200, deskReply([deskListing(1), deskListing(2)]));
      },
    });
    const { user, router } = renderApp('/seller');

    const counts = await screen.findByRole('list', { name: 'Listings by state' });
    expect(within(counts).getByRole('button', { name: /6\s*All/ })).toHaveAttribute('aria-pressed', 'true');
    // A header row and two listings.
    expect(screen.getAllByRole('row')).toHaveLength(3);

    await user.click(within(counts).getByRole('button', { name: /2\s*In review/ }));
    await waitFor(() => expect(states.at(-1)).toBe('submitted'));
    expect(states[0]).toBe('');
    expect(new URLSearchParams(router.state.location.search).get('state')).toBe('submitted');
    expect(within(counts).getByRole('button', { name: /2\s*In review/ })).toHaveAttribute('aria-pressed', 'true');
  });

  it('when a column header is clicked, then the server is asked to sort by it, and a second click turns the direction', async () => {
    const seen: string[] = [];
    mockApi({
      'GET /api/auth/me': meHandler(seller),
      'GET /api/me/listings': ({ url }) => {
        seen.push(url.searchParams.get('sort') ?? '');
        return jsonResponse(200, deskReply([deskListing(1), deskListing(2)]));
      },
    });
    const { user } = renderApp('/seller');

    await user.click(await screen.findByRole('button', { name: /^Price/ }));
    // Numbers sort highest first on the first click (the table library's habit for numeric columns).
    await waitFor(() => expect(seen.at(-1)).toBe('-price'));
    expect(screen.getByRole('columnheader', { name: /Price/ })).toHaveAttribute('aria-sort', 'descending');
    await user.click(screen.getByRole('button', { name: /^Price/ }));
    await waitFor(() => expect(seen.at(-1)).toBe('price'));
    expect(seen[0]).toBe('-updated');
    expect(screen.getByRole('columnheader', { name: /Price/ })).toHaveAttribute('aria-sort', 'ascending');
  });

  it('when quantity and price are quick-edited, then only the changed fields are sent, price in cents', async () => {
    const l = deskListing(3);
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(seller),
      'GET /api/me/listings': jsonResponse(200, deskReply([l])),
      [`PATCH /api/listings/${l.id}`]: ({ body }) => jsonResponse(200, { listing: { ...l, ...(body as object) } }),
    });
    const { user } = renderApp('/seller');

    await user.click(await screen.findByRole('button', { name: `Quick edit ${l.title}` }));
    expect(screen.getByText('Stays live')).toBeInTheDocument();
    const price = screen.getByLabelText('Price (US$)');
    await user.clear(price);
    await user.type(price, '12.5{Enter}');

    await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ priceCents: 1250 }));
    expect(await screen.findByRole('button', { name: `Quick edit ${l.title}` })).toBeInTheDocument();
  });

  it('when a quick edit is not a number, then it is refused without a request', async () => {
    const l = deskListing(1);
    const { calls } = mockApi({ 'GET /api/auth/me': meHandler(seller), 'GET /api/me/listings': jsonResponse(200, deskReply([l])) });
    const { user } = renderApp('/seller');

    await user.click(await screen.findByRole('button', { name: `Quick edit ${l.title}` }));
    const qty = screen.getByLabelText('Quantity');
    await user.clear(qty);
    await user.type(qty, 'lots');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(screen.getByRole('alert')).toHaveTextContent('Give a whole quantity from 0 to 9999');
    expect(calls.some((c) => c.method === 'PATCH')).toBe(false);
  });
});
