import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { needsList, VEHICLE_ID } from '../testing/garage-fixtures';
import { NeedsTable } from './needs-table';

describe('needs list table', () => {
  it('when needs come from the checklist and from wants, then each row shows the part, condition, where it came from and the count', () => {
    renderWithProviders(<NeedsTable vehicleId={VEHICLE_ID} list={needsList()} />);
    expect(screen.getByText(/unit/).closest('p')).toHaveTextContent('5 units of 2 parts to find for serial KV4-2044.');
    const cap = screen.getByRole('row', { name: /KV-7740/ });
    expect(within(cap).getByText('Originals only')).toBeInTheDocument();
    expect(within(cap).getByText(/Master cylinder #9: replace, 3/)).toBeInTheDocument();
    expect(within(cap).getAllByRole('cell')[4]).toHaveTextContent('3');
    expect(within(screen.getByRole('row', { name: /KV-7801/ })).getByText(/Added by hand, 2/)).toBeInTheDocument();
  });

  it('when a want is removed or a need watched, then the right calls go out', async () => {
    const { calls } = mockApi({
      [`DELETE /api/garage/vehicles/${VEHICLE_ID}/wants/want-1`]: jsonResponse(204),
      'POST /api/alerts': jsonResponse(201, {
        alert: { id: 'a1', part: { id: 'p-cap', name: 'Cap', primaryNumber: 'KV-7740' }, number: 'KV-7740', policy: 'originals_only', maxPriceCents: null, active: true, hits: 0, createdAt: '2025-03-06T08:00:00.000Z' },
      }),
    });
    const { user } = renderWithProviders(<NeedsTable vehicleId={VEHICLE_ID} list={needsList()} />);
    await user.click(screen.getByRole('button', { name: 'Remove the want for KV-7801' }));
    await user.click(screen.getByRole('button', { name: 'Watch KV-7740' }));
    await waitFor(() => expect(calls).toHaveLength(2));
    expect(calls[0]).toMatchObject({ method: 'DELETE', path: `/api/garage/vehicles/${VEHICLE_ID}/wants/want-1` });
    expect(calls[1]).toMatchObject({ method: 'POST', path: '/api/alerts', body: { partId: 'p-cap', policy: 'originals_only' } });
  });
});
