import type { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { vi } from 'vitest';
import type { User } from '@shared/schemas/auth';
import { AppProvider } from '@/app/provider';
import { createRoutes } from '@/app/router';
import { createQueryClient } from '@/lib/react-query';

/** A fresh client per test: no retries, so a failing request fails the test at once. */
export function createTestQueryClient(): QueryClient {
  return createQueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false } } });
}

export function jsonResponse(status: number, body?: unknown): Response {
  if (body === undefined) return new Response(null, { status });
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

export function errorResponse(status: number, code: string, message: string, details?: unknown): Response {
  return jsonResponse(status, { error: { code, message, ...(details === undefined ? {} : { details }) } });
}

type Handler = (request: { method: string; url: URL; body: unknown }) => Response | Promise<Response>;

/**
 * Stubs global fetch with a table of handlers keyed "METHOD /path" (query string ignored). An unlisted
 * request fails the test loudly rather than hanging.
 */
export function mockApi(handlers: Record<string, Handler | Response>) {
  const calls: Array<{ method: string; path: string; body: unknown }> = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
    calls.push({ method, path: url.pathname, body });
    const handler = handlers[`${method} ${url.pathname}`];
    if (!handler) throw new Error(`Unexpected request in test: ${method} ${url.pathname}`);
    return handler instanceof Response ? handler.clone() : handler({ method, url, body });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, calls };
}

export function makeUser(overrides: Partial<User> = {}): User {
  return {
    id: 'usr_test_1',
    email: 'wren.halloway@example.test',
    displayName: 'Wren Halloway',
    roles: ['buyer'],
    emailVerified: true,
    ...overrides,
  };
}

/** Replies for GET /api/auth/me: the given user, or 401 for an anonymous visitor. */
export function meHandler(user: User | null): Handler {
  return () => (user ? jsonResponse(200, { user }) : errorResponse(401, 'unauthenticated', 'Please sign in.'));
}

/** Renders the whole app (layout, routes, providers) at `url` in a memory router. */
export function renderApp(url: string, { queryClient = createTestQueryClient() }: { queryClient?: QueryClient } = {}) {
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [url] });
  const user = userEvent.setup();
  const utils = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...utils, router, user, queryClient };
}

/** Renders one component inside the providers and a memory router. */
export function renderWithProviders(ui: ReactNode, { url = '/', queryClient = createTestQueryClient() }: { url?: string; queryClient?: QueryClient } = {}) {
  const router = createMemoryRouter([{ path: '*', element: ui }], { initialEntries: [url] });
  const user = userEvent.setup();
  const utils = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...utils, router, user, queryClient };
}
