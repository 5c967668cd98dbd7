import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorResponse, jsonResponse, makeUser, meHandler, mockApi, renderApp } from '@/testing/test-utils';

describe('sign-in form', () => {
  it('when submitted empty, then the shared zod schema’s messages show on the fields and nothing is sent', async () => {
    const { calls } = mockApi({ 'GET /api/auth/me': meHandler(null) });
    const { user } = renderApp('/sign-in');

    await user.click(await screen.findByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    const email = screen.getByLabelText('E-mail');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('Enter a valid e-mail address');
    expect(calls.filter((c) => c.path === '/api/auth/login')).toHaveLength(0);
  });

  it('when the server answers 401, then its message shows as an alert', async () => {
    const { calls } = mockApi({
      'GET /api/auth/me': meHandler(null),
      'POST /api/auth/login': errorResponse(401, 'unauthenticated', 'That e-mail and password do not match an account.'),
    });
    const { user } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), '  Wren.Halloway@Example.test ');
    await user.type(screen.getByLabelText('Password'), 'not-the-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('That e-mail and password do not match an account.');
    // The shared schema trims and lower-cases the address before it is sent.
    expect(calls.find((c) => c.path === '/api/auth/login')?.body).toEqual({
      email: 'wren.halloway@example.test',
      password: 'not-the-password',
    });
  });

  it('when the server answers 429, then the rate-limit message shows', async () => {
    mockApi({
      'GET /api/auth/me': meHandler(null),
      'POST /api/auth/login': errorResponse(429, 'rate_limited', 'Too many sign-in attempts. Try again in a few minutes.'),
    });
    const { user } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), 'wren@example.test');
    await user.type(screen.getByLabelText('Password'), 'whatever-it-is');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many sign-in attempts');
  });

  it('when sign-in succeeds with a same-site next, then the app goes there', async () => {
    let signedIn = false;
    mockApi({
      'GET /api/auth/me': () => meHandler(signedIn ? makeUser() : null)({} as never),
      'POST /api/auth/login': () => {
        signedIn = true;
        return jsonResponse(200, { user: makeUser() });
      },
    });
    const { user, router } = renderApp('/sign-in?next=%2Forders%3Fpage%3D2');

    await user.type(await screen.findByLabelText('E-mail'), 'wren.halloway@example.test');
    await user.type(screen.getByLabelText('Password'), 'correct horse battery');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Orders' })).toBeInTheDocument();
    expect(router.state.location.pathname + router.state.location.search).toBe('/orders?page=2');
  });

  it('when next points off-site, then sign-in lands on /account instead', async () => {
    let signedIn = false;
    mockApi({
      'GET /api/auth/me': () => meHandler(signedIn ? makeUser() : null)({} as never),
      'POST /api/auth/login': () => {
        signedIn = true;
        return jsonResponse(200, { user: makeUser() });
      },
    });
    const { user, router } = renderApp('/sign-in?next=%2F%2Fevil.example%2Fphish');

    await user.type(await screen.findByLabelText('E-mail'), 'wren.halloway@example.test');
    await user.type(screen.getByLabelText('Password'), 'correct horse battery');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Your account' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/account');
  });
});
