import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeUser, meHandler, mockApi, renderApp } from '@/testing/test-utils';

async function mainNav() {
  // Wait for the session to load: the account area shows Sign in or the user's menu.
  return within(await screen.findByRole('navigation', { name: 'Main' }));
}

function linkNames(nav: ReturnType<typeof within>) {
  return nav.getAllByRole('link').map((link: HTMLElement) => link.textContent);
}

describe('site header', () => {
  it('when a buyer is signed in, then Garage, Cart and Orders show and Admin and Seller desk do not', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(makeUser({ roles: ['buyer'] })) });
    renderApp('/');

    const nav = await mainNav();
    expect(linkNames(nav)).toEqual(['Catalog', 'Search', 'Garage', 'Cart', 'Orders']);
    expect(nav.queryByRole('link', { name: 'Admin' })).not.toBeInTheDocument();
    expect(nav.queryByRole('link', { name: 'Seller desk' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: /Wren Halloway/ })).toBeInTheDocument();
  });

  it('when an admin is signed in, then the Admin link shows', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(makeUser({ displayName: 'Ottilie Brask', roles: ['buyer', 'admin'] })) });
    renderApp('/');

    const nav = await mainNav();
    expect(nav.getByRole('link', { name: 'Admin' })).toHaveAttribute('href', '/admin');
    expect(linkNames(nav)).toEqual(['Catalog', 'Search', 'Garage', 'Cart', 'Orders', 'Admin']);
  });

  it('when a seller is signed in, then the Seller desk link shows', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(makeUser({ roles: ['buyer', 'seller'] })) });
    renderApp('/');

    const nav = await mainNav();
    expect(nav.getByRole('link', { name: 'Seller desk' })).toHaveAttribute('href', '/seller');
    expect(nav.queryByRole('link', { name: 'Admin' })).not.toBeInTheDocument();
  });

  it('when nobody is signed in, then only Catalog and Search show, with Sign in and Register', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null) });
    renderApp('/');

    const nav = await mainNav();
    expect(linkNames(nav)).toEqual(['Catalog', 'Search']);
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    expect(screen.getByRole('link', { name: 'Register' })).toHaveAttribute('href', '/register');
  });

  it('when the page renders, then it has a skip link, a labelled search landmark and the footer lines', async () => {
    mockApi({ 'GET /api/auth/me': meHandler(null) });
    renderApp('/');
    await mainNav();

    expect(screen.getByRole('link', { name: 'Skip to content' })).toHaveAttribute('href', '#main');
    const search = screen.getByRole('search');
    expect(within(search).getByLabelText('Search parts and numbers')).toHaveAttribute('name', 'q');
    expect(screen.getByRole('main')).toHaveAttribute('id', 'main');
    const footer = screen.getByRole('contentinfo');
    expect(footer).toHaveTextContent('Demo data in this build is fictional.');
    expect(footer).toHaveTextContent(/Brake, steering and suspension work can injure/);
  });

  it('when the account menu is opened and Sign out chosen, then the session ends and the header shows Sign in', async () => {
    let signedIn = true;
    const { calls } = mockApi({
      'GET /api/auth/me': () => meHandler(signedIn ? makeUser() : null)({} as never),
      'POST /api/auth/logout': () => {
        signedIn = false;
        return new Response(null, { status: 204 });
      },
    });
    const { user, router } = renderApp('/account');

    const menuButton = await screen.findByRole('button', { name: /Wren Halloway/ });
    expect(menuButton).toHaveAttribute('aria-expanded', 'false');
    await user.click(menuButton);
    expect(menuButton).toHaveAttribute('aria-expanded', 'true');

    // Escape closes the menu and returns focus to its button.
    await user.keyboard('{Escape}');
    expect(menuButton).toHaveAttribute('aria-expanded', 'false');
    expect(menuButton).toHaveFocus();

    await user.click(menuButton);
    await user.click(screen.getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('link', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
    expect(calls.some((c) => c.method === 'POST' && c.path === '/api/auth/logout')).toBe(true);
  });
});
