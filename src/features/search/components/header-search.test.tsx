import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Suggestion } from '@shared/schemas/search';
import { jsonResponse, meHandler, mockApi, renderApp } from '@/testing/test-utils';
import { makeReply, PART_NEW, PART_OLD } from '../testing/search-fixtures';

const SUGGESTIONS: Suggestion[] = [
  { type: 'number', partId: PART_OLD, number: 'FV-20417', name: 'Master cylinder assembly, early', matchedBy: 'number_prefix' },
  { type: 'number', partId: PART_NEW, number: 'FV-26602', name: 'Master cylinder assembly, late', matchedBy: 'number_prefix' },
  { type: 'part', partId: PART_NEW, number: null, name: 'Master cylinder boot', matchedBy: 'name' },
];

function setup(url = '/') {
  const api = mockApi({
    'GET /api/auth/me': meHandler(null),
    'GET /api/search/suggest': () => jsonResponse(200, { suggestions: SUGGESTIONS }),
    'GET /api/search': () => jsonResponse(200, makeReply()),
  });
  const app = renderApp(url);
  const suggestCalls = () => api.calls.filter((c) => c.path === '/api/search/suggest');
  return { ...app, ...api, suggestCalls };
}

const box = () => screen.findByRole('combobox', { name: 'Search parts and numbers' });

// The page loads lazily; load its module once up front so the first test does not time out on a cold start.
beforeAll(async () => {
  await import('@/app/routes/search/search');
}, 30_000);

describe('header search box', () => {
  it('when a number is typed, then suggestions are asked once after the pause and the arrows move through them, wrapping', async () => {
    const { user, fetchMock, suggestCalls } = setup();
    const input = await box();
    await user.type(input, 'FV-2');

    const listbox = await screen.findByRole('listbox', { name: 'Suggestions' });
    expect(input).toHaveAttribute('aria-expanded', 'true');
    expect(input).toHaveAttribute('aria-controls', listbox.id);
    // Debounced: the keystrokes came faster than the pause, so only the whole prefix was asked.
    expect(suggestCalls()).toHaveLength(1);
    const asked = fetchMock.mock.calls.map(([u]) => String(u)).filter((u) => u.includes('/suggest'));
    expect(asked).toEqual(['/api/search/suggest?q=FV-2']);

    const options = within(listbox).getAllByRole('option');
    expect(options.map((o) => o.textContent)).toEqual(['FV-20417Master cylinder assembly, early', 'FV-26602Master cylinder assembly, late', 'Master cylinder boot']);
    expect(input).not.toHaveAttribute('aria-activedescendant');

    await user.keyboard('{ArrowDown}');
    expect(input).toHaveAttribute('aria-activedescendant', options[0].id);
    expect(options[0]).toHaveAttribute('aria-selected', 'true');
    await user.keyboard('{ArrowDown}');
    expect(input).toHaveAttribute('aria-activedescendant', options[1].id);
    expect(options[0]).toHaveAttribute('aria-selected', 'false');
    await user.keyboard('{ArrowUp}{ArrowUp}');
    expect(input).toHaveAttribute('aria-activedescendant', options[2].id);
    await user.keyboard('{ArrowDown}');
    expect(input).toHaveAttribute('aria-activedescendant', options[0].id);
    // Focus never left the input.
    expect(input).toHaveFocus();
  });

  it('when a suggestion is chosen with Enter, then the search for its number opens and the list closes', async () => {
    const { user, router } = setup();
    const input = await box();
    await user.type(input, 'fv20');
    await screen.findByRole('listbox', { name: 'Suggestions' });
    await user.keyboard('{ArrowDown}{ArrowDown}{Enter}');

    await waitFor(() => expect(router.state.location.pathname).toBe('/search'));
    expect(router.state.location.search).toBe('?q=FV-26602');
    expect(input).toHaveValue('FV-26602');
    expect(input).toHaveAttribute('aria-expanded', 'false');
    expect(await screen.findByRole('heading', { name: 'Results for “FV-26602”' })).toBeInTheDocument();
  });

  it('when Escape is pressed, then the list closes first and the box clears next', async () => {
    const { user } = setup();
    const input = await box();
    await user.type(input, 'FV-2');
    await screen.findByRole('listbox', { name: 'Suggestions' });
    await user.keyboard('{ArrowDown}{Escape}');
    expect(input).toHaveAttribute('aria-expanded', 'false');
    expect(input).not.toHaveAttribute('aria-activedescendant');
    expect(input).toHaveValue('FV-2');
    await user.keyboard('{Escape}');
    expect(input).toHaveValue('');
  });

  it('when Enter is pressed with no suggestion chosen, then the typed words are searched', async () => {
    const { user, router } = setup();
    const input = await box();
    await user.type(input, 'brake hose');
    await screen.findByRole('listbox', { name: 'Suggestions' });
    await user.keyboard('{Enter}');
    await waitFor(() => expect(router.state.location.search).toBe('?q=brake+hose'));
    expect(router.state.location.pathname).toBe('/search');
  });

  it('when a suggestion without a number is clicked, then its name is searched', async () => {
    const { user, router } = setup();
    const input = await box();
    await user.type(input, 'boot');
    await user.click(await screen.findByRole('option', { name: 'Master cylinder boot' }));
    await waitFor(() => expect(router.state.location.search).toBe('?q=Master+cylinder+boot'));
  });

  it('when fewer than two characters are typed, then nothing is asked', async () => {
    const { user, suggestCalls } = setup();
    const input = await box();
    await user.type(input, 'F');
    await new Promise((r) => setTimeout(r, 300));
    expect(suggestCalls()).toHaveLength(0);
    expect(screen.queryByRole('listbox')).not.toBeInTheDocument();
  });
});
