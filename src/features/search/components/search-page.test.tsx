import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { jsonResponse, meHandler, mockApi, renderApp } from '@/testing/test-utils';
import type { SearchReply } from '@shared/schemas/search';
import { LISTING_1, makeHit, makeReply, PART_NEW, PART_OLD } from '../testing/search-fixtures';

/** Answers GET /api/search with `reply(params)` and records every query string asked. */
function mockSearch(reply: (params: URLSearchParams) => SearchReply = () => makeReply(), extra: Parameters<typeof mockApi>[0] = {}) {
  const asked: string[] = [];
  const api = mockApi({
    ...extra,
    'GET /api/auth/me': meHandler(null),
    'GET /api/search': ({ url }) => {
      asked.push(url.searchParams.toString());
      return jsonResponse(200, reply(url.searchParams));
    },
  });
  return { ...api, asked };
}

// The page loads lazily; load its module once up front so the first test does not time out on a cold start.
beforeAll(async () => {
  await import('@/app/routes/search/search');
}, 30_000);

describe('search page', () => {
  it('when a number search finds a listing under its replacement, then the card shows the fit note, condition, price, seller and links', async () => {
    mockSearch();
    renderApp('/search?q=FV-20417');

    const results = await screen.findByRole('list', { name: 'Results' });
    const listing = within(results).getByRole('article', { name: 'Master cylinder assembly, late' });
    expect(listing).toHaveTextContent('Listed under replacement number FV-26602, two-way interchangeable');
    expect(listing).toHaveTextContent('New old stock (NOS)');
    expect(listing).toHaveTextContent('$189.50');
    expect(listing).toHaveTextContent('Fernhollow Surplus');
    expect(listing).toHaveTextContent('2 in stock');
    expect(within(listing).getByRole('link', { name: 'Master cylinder assembly, late' })).toHaveAttribute('href', `/listings/${LISTING_1}`);

    const part = within(results).getByRole('article', { name: 'Master cylinder assembly, early' });
    expect(part).toHaveTextContent('Catalog part');
    expect(part).not.toHaveTextContent('Fit note');
    expect(within(part).getByRole('link')).toHaveAttribute('href', `/catalog/parts/${PART_OLD}`);
    expect(screen.getByRole('heading', { level: 1 })).toHaveTextContent('Results for “FV-20417”');
    expect(screen.getByRole('status')).toHaveTextContent('2 results');
  });

  it('when a condition is ticked, then the URL and the API query carry it, and Back restores the previous filters', async () => {
    const { asked } = mockSearch();
    const { user, router } = renderApp('/search?q=FV-20417&condition=nos');

    const filters = await screen.findByRole('complementary', { name: 'Filters' });
    const nos = await within(filters).findByRole('checkbox', { name: /New old stock \(NOS\)/ });
    expect(nos).toBeChecked();
    expect(asked).toEqual(['q=FV-20417&condition=nos']);

    await user.click(within(filters).getByRole('checkbox', { name: /Used original/ }));
    await waitFor(() => expect(asked).toContain('q=FV-20417&condition=nos&condition=used_original'));
    expect(router.state.location.search).toBe('?q=FV-20417&condition=nos&condition=used_original');
    expect(screen.getByRole('list', { name: 'Active filters' })).toHaveTextContent('Condition: Used original');

    await user.click(within(filters).getByRole('checkbox', { name: /In stock/ }));
    await waitFor(() => expect(router.state.location.search).toBe('?q=FV-20417&condition=nos&condition=used_original&inStock=true'));

    // Back, twice: the URL is the state, and the checkboxes follow it.
    await router.navigate(-1);
    await waitFor(() => expect(within(filters).getByRole('checkbox', { name: /In stock/ })).not.toBeChecked());
    await router.navigate(-1);
    await waitFor(() => expect(within(filters).getByRole('checkbox', { name: /Used original/ })).not.toBeChecked());
    expect(within(filters).getByRole('checkbox', { name: /New old stock/ })).toBeChecked();
    expect(router.state.location.search).toBe('?q=FV-20417&condition=nos');
  });

  it('when an active filter chip is removed or the type switched, then the query drops it', async () => {
    const { asked } = mockSearch();
    const { user, router } = renderApp('/search?q=clamp&condition=nos&sort=price_asc');
    await user.click(await screen.findByRole('button', { name: 'Remove filter Condition: New old stock (NOS)' }));
    await waitFor(() => expect(router.state.location.search).toBe('?q=clamp&sort=price_asc'));

    await user.click(screen.getByRole('radio', { name: /Catalog parts/ }));
    // Parts carry no price, so the price sort gives way to best match.
    await waitFor(() => expect(asked.at(-1)).toBe('q=clamp&type=part'));
    expect(screen.getByRole('combobox', { name: 'Sort' })).toHaveValue('relevance');
    expect(screen.getByRole('option', { name: 'Price, low to high' })).toBeDisabled();
  });

  it('when a price range is typed in dollars, then the URL and the API get cents, and a bad figure is refused', async () => {
    const { asked } = mockSearch();
    const { user, router } = renderApp('/search?q=cylinder');
    const range = await screen.findByRole('form', { name: 'Price range' });
    await user.type(within(range).getByLabelText('Min $'), 'ten');
    await user.click(within(range).getByRole('button', { name: 'Apply' }));
    expect(within(range).getByText('Give prices in dollars, like 25 or 12.50.')).toBeInTheDocument();

    await user.clear(within(range).getByLabelText('Min $'));
    await user.type(within(range).getByLabelText('Min $'), '12.5');
    await user.type(within(range).getByLabelText('Max $'), '$1,200');
    await user.click(within(range).getByRole('button', { name: 'Apply' }));
    await waitFor(() => expect(asked.at(-1)).toBe('q=cylinder&priceMin=1250&priceMax=120000'));
    expect(router.state.location.search).toBe('?q=cylinder&priceMin=1250&priceMax=120000');
    expect(screen.getByRole('button', { name: 'Remove filter $12.50 to $1,200.00' })).toBeInTheDocument();
  });

  it('when there is a next page, then Next asks for its cursor and Previous goes back to page one', async () => {
    const { asked } = mockSearch((p) =>
      p.get('cursor') === 'page2.abc'
        ? makeReply({ hits: [makeHit({ id: 'page-two-listing', title: 'Wheel cylinder, front' })], nextCursor: null })
        : makeReply({ nextCursor: 'page2.abc' }),
    );
    const { user, router } = renderApp('/search?q=cylinder');
    await user.click(await screen.findByRole('button', { name: 'Next' }));
    expect(await screen.findByRole('article', { name: 'Wheel cylinder, front' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?q=cylinder&after=page2.abc');
    expect(asked.at(-1)).toBe('q=cylinder&cursor=page2.abc');
    expect(screen.getByText('Page 2')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Next' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Previous' }));
    expect(await screen.findByRole('article', { name: 'Master cylinder assembly, late' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?q=cylinder');
  });

  it('when nothing matches, then the empty state proposes close numbers that search for them', async () => {
    mockSearch((p) =>
      p.get('q') === 'FV-20471'
        ? makeReply({ total: 0, hits: [], didYouMean: [{ number: 'FV-20417', partId: PART_OLD }, { number: 'FV-20477', partId: PART_NEW }] })
        : makeReply(),
    );
    const { user, router } = renderApp('/search?q=FV-20471&condition=core');

    expect(await screen.findByRole('heading', { name: 'Nothing matches “FV-20471”' })).toBeInTheDocument();
    const close = screen.getByRole('list', { name: 'Close numbers' });
    expect(within(close).getAllByRole('link').map((a) => a.textContent)).toEqual(['FV-20417', 'FV-20477']);
    expect(screen.getByRole('button', { name: 'Clear all filters' })).toBeInTheDocument();

    await user.click(within(close).getByRole('link', { name: 'FV-20417' }));
    expect(await screen.findByRole('list', { name: 'Results' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?q=FV-20417');
    // The header box follows the query in force.
    expect(screen.getByRole('combobox', { name: 'Search parts and numbers' })).toHaveValue('FV-20417');
  });

  it('when the filters are folded on a small screen, then the toggle opens them', async () => {
    mockSearch();
    const { user } = renderApp('/search?q=FV-20417&condition=nos&inStock=true');
    const toggle = await screen.findByRole('button', { name: /Show filters/ });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    expect(toggle).toHaveTextContent('2');
    const panel = document.getElementById(toggle.getAttribute('aria-controls')!)!;
    expect(panel.className).toContain('hidden');
    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect(panel.className).not.toMatch(/(^| )hidden( |$)/);
  });
});

describe('listings of one part', () => {
  it('when the part page links with ?part=<id>, then the page searches its number for listings and Back skips the hop', async () => {
    const { asked } = mockSearch(undefined, {
      [`GET /api/parts/${PART_OLD}`]: jsonResponse(200, {
        part: { id: PART_OLD, name: 'Master cylinder assembly, early' },
        numbers: [{ kind: 'maker', numbers: [{ printed: 'FV-20417' }] }],
      }),
    });
    const { router } = renderApp(`/search?part=${PART_OLD}`);
    expect(await screen.findByRole('heading', { name: 'Results for “FV-20417”' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?q=FV-20417&type=listing');
    expect(asked).toEqual(['q=FV-20417&type=listing']);
    expect(router.state.historyAction).toBe('REPLACE');
  });
});
