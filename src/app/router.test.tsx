import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SellerApplication } from '@shared/schemas/auth';
import { errorResponse, jsonResponse, makeUser, meHandler, mockApi, renderApp } from '@/testing/test-utils';

const application: SellerApplication = {
  id: 'app_1',
  userId: 'usr_9',
  userEmail: 'stores@fictional-depot.example.test',
  businessName: 'Fictional Depot Spares',
  location: 'Lowmarsh, Exampleland',
  whatTheySell: 'Brake and steering parts, new old stock and used originals (fictional demo data).',
  state: 'pending',
  decisionNote: null,
  createdAt: '2025-03-04T10:00:00.000Z',
};

describe('routes', () => {
  it('when an anonymous visitor opens a signed-in page, then they are sent to sign-in with next set', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null) });
    const { router } = renderApp('/garage?vehicle=3');

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe('/garage?vehicle=3');
  });

  it('when a buyer opens an admin page, then a clear "not allowed" shows', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(makeUser({ roles: ['buyer'] })) });
    renderApp('/admin/seller-applications');

    expect(await screen.findByRole('heading', { name: 'Not allowed' })).toBeInTheDocument();
    expect(screen.getByText('This page is for administrators.')).toBeInTheDocument();
  });

  it('when the address matches no page, then the 404 page shows inside the layout', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null) });
    renderApp('/no/such/bin');

    expect(await screen.findByRole('heading', { name: 'We could not find that page' })).toBeInTheDocument();
    expect(await screen.findByRole('navigation', { name: 'Main' })).toBeInTheDocument();
  });

  it('when someone registers, then they are told to check their e-mail', async () => {
    const created = makeUser({ emailVerified: false });
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(null),
      'POST /api/auth/register': jsonResponse(201, { user: created }),
    });
    const { user } = renderApp('/register');

    await user.type(await screen.findByLabelText('Display name'), 'Wren Halloway');
    await user.type(screen.getByLabelText('E-mail'), 'wren.halloway@example.test');
    await user.type(screen.getByLabelText('Password'), 'a long enough passphrase');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Check your e-mail to verify your address')).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/api/auth/register')?.body).toEqual({
      displayName: 'Wren Halloway',
      email: 'wren.halloway@example.test',
      password: 'a long enough passphrase',
    });
  });

  it('when registration is refused with field errors, then they show on the fields', async () => {
    mockApi({
      'GET /api/auth/me': meHandler(null),
      'POST /api/auth/register': errorResponse(400, 'validation_failed', 'Check the fields.', {
        fieldErrors: { displayName: ['That name is reserved'] },
      }),
    });
    const { user } = renderApp('/register');

    await user.type(await screen.findByLabelText('Display name'), 'Administrator');
    await user.type(screen.getByLabelText('E-mail'), 'wren.halloway@example.test');
    await user.type(screen.getByLabelText('Password'), 'a long enough passphrase');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('That name is reserved')).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('when the verification link opens, then the token is sent once and success is shown', async () => {
    const token = 'tok_0123456789abcdef';
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(null),
      'POST /api/auth/verify-email': jsonResponse(200, { user: makeUser() }),
    });
    renderApp(`/verify-email?token=${token}`);

    expect(await screen.findByText('Your e-mail address is verified')).toBeInTheDocument();
    const sent = calls.filter((c) => c.path === '/api/auth/verify-email');
    expect(sent).toEqual([{ method: 'POST', path: '/api/auth/verify-email', body: { token } }]);
  });

  it('when an admin rejects an application, then a note is asked for and sent with the decision', async () => {
    let pending = [application];
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(makeUser({ roles: ['buyer', 'admin'] })),
      'GET /api/admin/seller-applications': () => jsonResponse(200, { applications: pending }),
      'POST /api/admin/seller-applications/app_1/decision': ({ body }) => {
        pending = [];
        return jsonResponse(200, { application: { ...application, state: 'rejected', decisionNote: (body as { note: string }).note } });
      },
    });
    const { user } = renderApp('/admin/seller-applications');

    const row = (await screen.findByRole('rowheader', { name: /Fictional Depot Spares/ })).closest('tr')!;
    await user.click(within(row).getByRole('button', { name: 'Reject' }));

    const note = screen.getByLabelText('Note to the applicant');
    expect(note).toHaveFocus();
    await user.click(screen.getByRole('button', { name: 'Reject application' }));
    expect(await screen.findByText('Tell the applicant why, in a few words')).toBeInTheDocument();

    await user.type(note, 'Please add photos of maker’s marks.');
    await user.click(screen.getByRole('button', { name: 'Reject application' }));

    expect(await screen.findByText('No applications waiting')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ decision: 'reject', note: 'Please add photos of maker’s marks.' });
  });

  it('when an admin approves an application, then the decision is sent and the list refreshes', async () => {
    let pending = [application];
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(makeUser({ roles: ['admin'] })),
      'GET /api/admin/seller-applications': () => jsonResponse(200, { applications: pending }),
      'POST /api/admin/seller-applications/app_1/decision': () => {
        pending = [];
        return jsonResponse(200, { application: { ...application, state: 'approved' } });
      },
    });
    const { user } = renderApp('/admin/seller-applications');

    await user.click(await screen.findByRole('button', { name: 'Approve' }));

    expect(await screen.findByText('No applications waiting')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ decision: 'approve' });
    expect(calls.filter((c) => c.path === '/api/admin/seller-applications')).toHaveLength(2);
  });

  it('when a signed-in buyer without an application applies to sell, then the pending state shows', async () => {
    let mine: SellerApplication | null = null;
    mockApi({
      'GET /api/auth/me': meHandler(makeUser()),
      'GET /api/seller-applications/mine': () => jsonResponse(200, { application: mine }),
      'POST /api/seller-applications': ({ body }) => {
        mine = { ...application, ...(body as object), userId: 'usr_test_1', state: 'pending' };
        return jsonResponse(201, { application: mine });
      },
    });
    const { user } = renderApp('/account/seller-application');

    await user.type(await screen.findByLabelText('Business name'), 'Halloway Spares');
    await user.type(screen.getByLabelText('Location'), 'Eastbrook');
    await user.type(screen.getByLabelText('What you sell'), 'Used original clutch and brake parts.');
    await user.click(screen.getByRole('button', { name: 'Apply to sell' }));

    expect(await screen.findByText('Pending review')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Apply to sell' })).not.toBeInTheDocument();
  });
});
