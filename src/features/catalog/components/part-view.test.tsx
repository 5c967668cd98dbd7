import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorResponse, jsonResponse, meHandler, mockApi, renderApp } from '@/testing/test-utils';
import { PART_EARLY, partReply } from '../testing/catalog-fixtures';

describe('part page', () => {
  it('when a brake part opens, then its numbers are grouped by kind with copy buttons, the cautions show and the listings are linked', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null), [`GET /api/parts/${PART_EARLY}`]: jsonResponse(200, partReply()) });
    const { user } = renderApp(`/catalog/parts/${PART_EARLY}`);

    expect(await screen.findByRole('heading', { name: 'Master cylinder, early' })).toBeInTheDocument();
    const numbers = screen.getByRole('heading', { name: 'Numbers' }).closest('section')!;
    expect(within(numbers).getByText("Maker's number")).toBeInTheDocument();
    expect(within(numbers).getByText('National Stock Number')).toBeInTheDocument();
    expect(within(numbers).getByText(/FSC 2530/)).toBeInTheDocument();

    await user.click(within(numbers).getByRole('button', { name: 'Copy 2530-00-252-5858' }));
    expect(await navigator.clipboard.readText()).toBe('2530-00-252-5858');

    const cautions = screen.getByRole('complementary', { name: 'Safety cautions' });
    expect(cautions).toHaveTextContent('Brakes stop the vehicle');
    expect(cautions).toHaveTextContent('qualified mechanic');

    expect(screen.getByRole('link', { name: '3 live listings' })).toHaveAttribute('href', `/search?part=${PART_EARLY}`);
    expect(screen.getByRole('list', { name: 'Supersession steps' })).toHaveTextContent('is replaced by FV-26602');
    expect(screen.getByText('Bore (in)')).toBeInTheDocument();
  });

  it('when a part with no safety class opens, then no caution box shows', async () => {
    const reply = partReply();
    mockApi({
      'GET /api/auth/me': meHandler(null),
      [`GET /api/parts/${PART_EARLY}`]: jsonResponse(200, { ...reply, part: { ...reply.part, safetyClass: 'none' }, cautions: [] }),
    });
    renderApp(`/catalog/parts/${PART_EARLY}`);
    expect(await screen.findByRole('heading', { name: 'Master cylinder, early' })).toBeInTheDocument();
    expect(screen.queryByRole('complementary', { name: 'Safety cautions' })).not.toBeInTheDocument();
  });

  it('when the part does not exist, then a plain "not found" shows', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null), [`GET /api/parts/${PART_EARLY}`]: errorResponse(404, 'not_found', 'Part not found') });
    renderApp(`/catalog/parts/${PART_EARLY}`);
    expect(await screen.findByText('We could not find that part')).toBeInTheDocument();
  });
});
