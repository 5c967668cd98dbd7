import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import type { QueueListing } from '../api/moderation-types';
import { ReviewQueue } from './review-queue';

// Fictional queue entries.
function entry(n: number, over: Partial<QueueListing> = {}): QueueListing {
  return {
    id: `6666666${n}-6666-4666-8666-666666666666`,
    state: 'submitted',
    sellerId: `7777777${n % 2}-7777-4777-8777-777777777777`,
    part: { id: 'p', name: 'Brake hose (fictional)', primaryNumber: `FX-30${n}`, safetyClass: 'brake' },
    title: `Brake hose lot ${n}`,
    conditionLabel: 'Reproduction',
    rubberUse: 'serviceable',
    makersMarks: false,
    quantity: 2,
    priceCents: 2400,
    currency: 'USD',
    description: '',
    descriptionHtml: '<p>New hose.</p>',
    photos: [
      { id: `p${n}a`, width: 800, height: 600, placeholderColor: '#444', urls: { thumb: `/media/${n}a-t.webp`, medium: `/media/${n}a-m.webp`, large: `/media/${n}a-l.webp` } },
      { id: `p${n}b`, width: 800, height: 600, placeholderColor: '#444', urls: { thumb: `/media/${n}b-t.webp`, medium: `/media/${n}b-m.webp`, large: `/media/${n}b-l.webp` } },
    ],
    flags: [],
    seller: { id: `7777777${n % 2}-7777-4777-8777-777777777777`, displayName: `Shop ${n % 2}`, email: 's@example.test', shopName: `Yard ${n % 2} (fictional)` },
    waitingHours: 30,
    submittedAt: '2025-03-01T10:00:00.000Z',
    ...over,
  };
}

const flagged = entry(3, { flags: [{ code: 'rubber_brake_serviceable', severity: 'block', message: 'Old hydraulic brake rubber cannot be offered for use.' }] });
const queue = [entry(1), entry(2), flagged];

describe('review queue', () => {
  it('when all unflagged are selected and approved, then only those ids are sent and the result is told', async () => {
    const { calls } = mockApi({
      'GET /api/admin/listings': jsonResponse(200, { listings: queue }),
      'POST /api/admin/listings/approve': ({ body }) => jsonResponse(200, { approved: (body as { ids: string[] }).ids, skipped: [] }),
    });
    const { user } = renderWithProviders(<ReviewQueue />, { url: '/admin/listings' });

    await screen.findByText('Brake hose lot 1');
    expect(screen.getByRole('checkbox', { name: 'Select Brake hose lot 3' })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: 'Select all unflagged (2)' }));
    await user.click(screen.getByRole('button', { name: 'Approve 2 selected' }));

    await waitFor(() => expect(calls.find((c) => c.path === '/api/admin/listings/approve')?.body).toEqual({ ids: [queue[0].id, queue[1].id] }));
    expect(await screen.findByText('2 listings approved')).toBeInTheDocument();
  });

  it('when the flag and age filters change, then the queue is asked again with them', async () => {
    const { calls } = mockApi({ 'GET /api/admin/listings': jsonResponse(200, { listings: queue }) });
    const { user, router } = renderWithProviders(<ReviewQueue />, { url: '/admin/listings' });
    await screen.findByText('Brake hose lot 1');

    await user.selectOptions(screen.getByLabelText('Flag'), 'none');
    await user.selectOptions(screen.getByLabelText('Age'), '72');
    await user.selectOptions(screen.getByLabelText('Seller'), 'Yard 1 (fictional)');

    await waitFor(() => expect(calls.at(-1)?.path).toBe('/api/admin/listings'));
    expect(router.state.location.search).toContain('flag=none');
    const gets = calls.filter((c) => c.path === '/api/admin/listings');
    expect(gets.length).toBe(4);
  });

  it('when a flagged listing is opened, then its photos show side by side, approval is blocked and a rejection needs a reason', async () => {
    const { calls } = mockApi({
      'GET /api/admin/listings': jsonResponse(200, { listings: queue }),
      [`POST /api/admin/listings/${flagged.id}/decision`]: jsonResponse(200, { listing: { id: flagged.id, state: 'rejected', title: flagged.title } }),
    });
    const { user } = renderWithProviders(<ReviewQueue />, { url: '/admin/listings' });

    await user.click(await screen.findByRole('button', { name: `Review ${flagged.title}` }));
    const photos = screen.getByRole('list', { name: `Photos of ${flagged.title}` });
    expect(within(photos).getAllByRole('img').map((i) => i.getAttribute('src'))).toEqual(['/media/3a-m.webp', '/media/3b-m.webp']);
    expect(screen.getByText('Old hydraulic brake rubber cannot be offered for use.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Approve' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Reject' }));
    await user.click(screen.getByRole('button', { name: 'Reject listing' }));
    expect(await screen.findByText('Give the seller the reason for rejecting')).toBeInTheDocument();
    expect(calls.some((c) => c.path.endsWith('/decision'))).toBe(false);

    await user.type(screen.getByLabelText(/Reason for rejecting/), 'Old brake hose offered for use on a vehicle.');
    await user.click(screen.getByRole('button', { name: 'Reject listing' }));
    await waitFor(() => expect(calls.find((c) => c.path.endsWith('/decision'))?.body).toEqual({ decision: 'reject', message: 'Old brake hose offered for use on a vehicle.' }));
  });

  it('when an unflagged listing is approved from its panel, then the decision is sent', async () => {
    const { calls } = mockApi({
      'GET /api/admin/listings': jsonResponse(200, { listings: queue }),
      [`POST /api/admin/listings/${queue[0].id}/decision`]: jsonResponse(200, { listing: { id: queue[0].id, state: 'approved', title: queue[0].title } }),
    });
    const { user } = renderWithProviders(<ReviewQueue />, { url: '/admin/listings' });
    await user.click(await screen.findByRole('button', { name: `Review ${queue[0].title}` }));
    await user.click(screen.getByRole('button', { name: 'Request changes' }));
    await user.click(screen.getByRole('button', { name: 'Send back to the seller' }));
    expect(await screen.findByText('Tell the seller what to change')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Approve' }));
    await waitFor(() => expect(calls.find((c) => c.path.endsWith('/decision'))?.body).toEqual({ decision: 'approve' }));
  });
});
