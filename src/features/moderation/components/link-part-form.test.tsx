import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import type { QueueListing } from '../api/moderation-types';
import { ReviewQueue } from './review-queue';

// A fictional unidentified listing and fictional catalog parts.
const LISTING_ID = '66666669-6666-4666-8666-666666666666';
const PART_A = '11111111-aaaa-4aaa-8aaa-111111111111';
const PART_B = '22222222-bbbb-4bbb-8bbb-222222222222';

const unidentified: QueueListing = {
  id: LISTING_ID,
  state: 'submitted',
  sellerId: 's1',
  part: null,
  title: 'Mystery bracket with stamped number',
  conditionLabel: 'Used',
  rubberUse: null,
  makersMarks: true,
  quantity: 1,
  priceCents: 1800,
  currency: 'USD',
  description: '',
  descriptionHtml: '',
  photos: [],
  flags: [],
  seller: { id: 's1', displayName: 'Shop', email: 's@example.test', shopName: 'Gravel Pit Spares (fictional)' },
  waitingHours: 5,
  submittedAt: '2025-03-01T10:00:00.000Z',
};

describe('link an unidentified listing to a catalog part', () => {
  it('when a number is found and a candidate is linked, then the link is sent and the queue is asked again', async () => {
    const { calls } = mockApi({
      'GET /api/admin/listings': jsonResponse(200, { listings: [unidentified] }),
      'GET /api/parts/resolve': jsonResponse(200, {
        query: 'FX-7781',
        matches: [
          { partId: PART_A, number: 'FX-7781', matchedBy: 'exact', depth: 0 },
          { partId: PART_B, number: 'FX-7781A', matchedBy: 'supersession', depth: 1 },
        ],
        parts: [
          { id: PART_A, name: 'Spring hanger bracket (fictional)', primaryNumber: 'FX-7781' },
          { id: PART_B, name: 'Spring hanger bracket, late (fictional)', primaryNumber: 'FX-7781A' },
        ],
      }),
      [`POST /api/admin/listings/${LISTING_ID}/part`]: jsonResponse(200, { listing: { id: LISTING_ID } }),
    });
    const { user } = renderWithProviders(<ReviewQueue />, { url: '/admin/listings' });

    await user.click(await screen.findByRole('button', { name: `Review ${unidentified.title}` }));
    const form = screen.getByRole('region', { name: 'Link to catalog part' });
    await user.type(within(form).getByLabelText('Part number'), ' FX-7781 ');
    await user.click(within(form).getByRole('button', { name: 'Find' }));

    const candidates = await within(form).findByRole('list', { name: 'Candidate parts' });
    expect(within(candidates).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      expect.stringContaining('Spring hanger bracket (fictional)FX-7781'),
      expect.stringContaining('FX-7781A'),
    ]);
    const resolveCall = calls.find((c) => c.path === '/api/parts/resolve');
    expect(resolveCall).toBeDefined();

    const queueGets = () => calls.filter((c) => c.method === 'GET' && c.path === '/api/admin/listings').length;
    const before = queueGets();
    await user.click(within(candidates).getByRole('button', { name: 'Link Spring hanger bracket, late (fictional)' }));
    await waitFor(() => expect(calls.find((c) => c.path.endsWith('/part'))?.body).toEqual({ partId: PART_B }));
    await waitFor(() => expect(queueGets()).toBeGreaterThan(before));
  });

  it('when the listing already has a part, then no link form is shown', async () => {
    mockApi({ 'GET /api/admin/listings': jsonResponse(200, { listings: [{ ...unidentified, part: { id: PART_A, name: 'Bracket', primaryNumber: 'FX-1', safetyClass: 'none' } }] }) });
    const { user } = renderWithProviders(<ReviewQueue />, { url: '/admin/listings' });
    await user.click(await screen.findByRole('button', { name: `Review ${unidentified.title}` }));
    expect(screen.queryByRole('region', { name: 'Link to catalog part' })).not.toBeInTheDocument();
  });
});
