// Every URL the client knows: app routes (`paths`) and API endpoints (`apiPaths`).

function withQuery(path: string, query: Record<string, string | undefined | null>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, value);
  }
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

export const paths = {
  home: { path: '/', getHref: () => '/' },
  catalog: { path: '/catalog', getHref: () => '/catalog' },
  search: { path: '/search', getHref: (q?: string) => withQuery('/search', { q }) },
  garage: { path: '/garage', getHref: () => '/garage' },
  cart: { path: '/cart', getHref: () => '/cart' },
  orders: { path: '/orders', getHref: () => '/orders' },
  seller: { path: '/seller', getHref: () => '/seller' },
  auth: {
    signIn: { path: '/sign-in', getHref: (next?: string | null) => withQuery('/sign-in', { next }) },
    register: { path: '/register', getHref: () => '/register' },
    verifyEmail: { path: '/verify-email', getHref: (token?: string) => withQuery('/verify-email', { token }) },
    forgotPassword: { path: '/forgot-password', getHref: () => '/forgot-password' },
    resetPassword: { path: '/reset-password', getHref: (token?: string) => withQuery('/reset-password', { token }) },
  },
  account: {
    root: { path: '/account', getHref: () => '/account' },
    sellerApplication: { path: '/account/seller-application', getHref: () => '/account/seller-application' },
  },
  admin: {
    root: { path: '/admin', getHref: () => '/admin' },
    sellerApplications: { path: '/admin/seller-applications', getHref: () => '/admin/seller-applications' },
  },
} as const;

export const apiPaths = {
  auth: {
    register: '/api/auth/register',
    login: '/api/auth/login',
    logout: '/api/auth/logout',
    me: '/api/auth/me',
    verifyEmail: '/api/auth/verify-email',
    resendVerification: '/api/auth/resend-verification',
    forgotPassword: '/api/auth/forgot-password',
    resetPassword: '/api/auth/reset-password',
  },
  sellerApplications: {
    create: '/api/seller-applications',
    mine: '/api/seller-applications/mine',
  },
  admin: {
    sellerApplications: (state?: string) => withQuery('/api/admin/seller-applications', { state }),
    sellerApplicationDecision: (id: string) => `/api/admin/seller-applications/${encodeURIComponent(id)}/decision`,
  },
} as const;
