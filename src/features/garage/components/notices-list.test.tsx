import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { NoticesList } from './notices-list';

const notice = (id: string, read: boolean) => ({
  id,
  kind: 'wanted_alert',
  title: `Wanted part listed: KV-77${id}`,
  body: 'Filler cap, vented — used original, $8.00 from Hollow Creek Salvage.',
  link: `/listings/l-${id}`,
  read,
  readAt: read ? '2025-03-06T08:00:00.000Z' : null,
  createdAt: '2025-03-06T07:00:00.000Z',
});

describe('notices', () => {
  it('when there are unread notices, then the count shows and "Mark all read" posts read-all', async () => {
    let all = [notice('40', false), notice('41', true)];
    const { calls } = mockApi({
      'GET /api/notices': () => jsonResponse(200, { notices: all, unreadCount: all.filter((n) => !n.read).length }),
      'POST /api/notices/read-all': () => {
        all = all.map((n) => ({ ...n, read: true }));
        return jsonResponse(200, { marked: 1 });
      },
    });
    const { user } = renderWithProviders(<NoticesList />);
    expect(await screen.findByText('1 unread')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Wanted part listed: KV-7740' })).toHaveAttribute('href', '/listings/l-40');

    await user.click(screen.getByRole('button', { name: 'Mark all read' }));
    expect(await screen.findByText('All read')).toBeInTheDocument();
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/notices/read-all']));
  });
});
