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
  catalogVehicle: { path: '/catalog/:slug', getHref: (slug: string) => `/catalog/${encodeURIComponent(slug)}` },
  catalogAssembly: {
    path: '/catalog/assemblies/:id',
    getHref: (id: string, filter: { serial?: string | null } = {}) => withQuery(`/catalog/assemblies/${encodeURIComponent(id)}`, filter),
  },
  catalogPart: { path: '/catalog/parts/:id', getHref: (id: string) => `/catalog/parts/${encodeURIComponent(id)}` },
  // The search page lists live listings of one part with ?part=<id>.
  partListings: { path: '/search', getHref: (partId: string) => withQuery('/search', { part: partId }) },
  search: { path: '/search', getHref: (q?: string) => withQuery('/search', { q }) },
  garage: { path: '/garage', getHref: () => '/garage' },
  garageVehicle: { path: '/garage/vehicles/:id', getHref: (id: string) => `/garage/vehicles/${encodeURIComponent(id)}` },
  garageAssembly: {
    path: '/garage/vehicles/:id/assemblies/:assemblyId',
    getHref: (id: string, assemblyId: string) => `/garage/vehicles/${encodeURIComponent(id)}/assemblies/${encodeURIComponent(assemblyId)}`,
  },
  garageNeeds: { path: '/garage/vehicles/:id/needs', getHref: (id: string) => `/garage/vehicles/${encodeURIComponent(id)}/needs` },
  garagePlan: { path: '/garage/vehicles/:id/plan', getHref: (id: string) => `/garage/vehicles/${encodeURIComponent(id)}/plan` },
  garageAlerts: { path: '/garage/alerts', getHref: () => '/garage/alerts' },
  garageNotices: { path: '/garage/notices', getHref: () => '/garage/notices' },
  cart: { path: '/cart', getHref: () => '/cart' },
  orders: { path: '/orders', getHref: () => '/orders' },
  order: { path: '/orders/:id', getHref: (id: string) => `/orders/${encodeURIComponent(id)}` },
  sellerOrders: {
    list: { path: '/seller/orders', getHref: (state?: string) => withQuery('/seller/orders', { state }) },
    detail: { path: '/seller/orders/:id', getHref: (id: string) => `/seller/orders/${encodeURIComponent(id)}` },
    payouts: { path: '/seller/payouts', getHref: (month?: string) => withQuery('/seller/payouts', { month }) },
  },
  seller: { path: '/seller', getHref: () => '/seller' },
  sellerListings: {
    new: { path: '/seller/listings/new', getHref: () => '/seller/listings/new' },
    edit: { path: '/seller/listings/:id/edit', getHref: (id: string) => `/seller/listings/${encodeURIComponent(id)}/edit` },
    shop: { path: '/seller/shop', getHref: () => '/seller/shop' },
    import: { path: '/seller/import', getHref: () => '/seller/import' },
  },
  listing: { path: '/listings/:id', getHref: (id: string) => `/listings/${encodeURIComponent(id)}` },
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
    listings: { path: '/admin/listings', getHref: () => '/admin/listings' },
    catalog: { path: '/admin/catalog', getHref: (partId?: string) => withQuery('/admin/catalog', { part: partId }) },
    catalogAssemblies: {
      path: '/admin/catalog/assemblies',
      getHref: (q: { vehicle?: string; assembly?: string } = {}) => withQuery('/admin/catalog/assemblies', q),
    },
    catalogQuality: { path: '/admin/catalog/quality', getHref: () => '/admin/catalog/quality' },
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
  search: {
    // Multi-valued filters repeat (`condition=nos&condition=nors`), so the caller builds the params.
    results: (params: URLSearchParams) => (params.size > 0 ? `/api/search?${params.toString()}` : '/api/search'),
    suggest: (q: string) => withQuery('/api/search/suggest', { q }),
  },
  listings: {
    list: (partId: string) => withQuery('/api/listings', { partId }),
    create: '/api/listings',
    one: (id: string) => `/api/listings/${encodeURIComponent(id)}`,
    action: (id: string, action: 'submit' | 'withdraw' | 'reopen') => `/api/listings/${encodeURIComponent(id)}/${action}`,
    photos: (id: string) => `/api/listings/${encodeURIComponent(id)}/photos`,
    photoOrder: (id: string) => `/api/listings/${encodeURIComponent(id)}/photos/order`,
    photo: (id: string, photoId: string) => `/api/listings/${encodeURIComponent(id)}/photos/${encodeURIComponent(photoId)}`,
    mine: (q: Record<string, string | undefined> = {}) => withQuery('/api/me/listings', q),
    importTemplate: '/api/me/listings/import/template',
    importPreview: '/api/me/listings/import/preview',
    importCommit: '/api/me/listings/import',
    shop: '/api/me/shop',
    shippingProfiles: '/api/me/shipping-profiles',
    shippingProfile: (id: string) => `/api/me/shipping-profiles/${encodeURIComponent(id)}`,
    suggest: (q: string) => withQuery('/api/search/suggest', { q }),
  },
  adminListings: {
    queue: (q: Record<string, string | undefined> = {}) => withQuery('/api/admin/listings', q),
    decision: (id: string) => `/api/admin/listings/${encodeURIComponent(id)}/decision`,
    approveMany: '/api/admin/listings/approve',
  },
  garage: {
    vehicles: '/api/garage/vehicles',
    vehicle: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}`,
    checklist: (id: string, assemblyId: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/assemblies/${encodeURIComponent(assemblyId)}`,
    labels: (id: string, assemblyId: string, layout: string) =>
      withQuery(`/api/garage/vehicles/${encodeURIComponent(id)}/assemblies/${encodeURIComponent(assemblyId)}/labels.pdf`, { layout }),
    teardown: (id: string, bomLineId: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/teardown/${encodeURIComponent(bomLineId)}`,
    teardownPhotos: (id: string, bomLineId: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/teardown/${encodeURIComponent(bomLineId)}/photos`,
    log: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/log`,
    needs: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/needs`,
    needsCsv: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/needs?format=csv`,
    wants: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/wants`,
    want: (id: string, wantId: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/wants/${encodeURIComponent(wantId)}`,
    plan: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/plan`,
    planToCart: (id: string) => `/api/garage/vehicles/${encodeURIComponent(id)}/plan/to-cart`,
  },
  alerts: {
    list: '/api/alerts',
    one: (id: string) => `/api/alerts/${encodeURIComponent(id)}`,
  },
  notices: {
    list: (q: { unread?: boolean; limit?: number } = {}) => withQuery('/api/notices', { unread: q.unread ? '1' : undefined, limit: q.limit?.toString() }),
    read: (id: string) => `/api/notices/${encodeURIComponent(id)}/read`,
    readAll: '/api/notices/read-all',
  },
  cart: {
    // The reply prices shipping for the destination in the query, so every cart call carries it.
    view: (destination: { country?: string; pickup?: boolean } | null) =>
      withQuery('/api/cart', { country: destination?.country, pickup: destination?.pickup ? '1' : undefined }),
    items: (destination: { country?: string; pickup?: boolean } | null) =>
      withQuery('/api/cart/items', { country: destination?.country, pickup: destination?.pickup ? '1' : undefined }),
    item: (listingId: string, destination: { country?: string; pickup?: boolean } | null) =>
      withQuery(`/api/cart/items/${encodeURIComponent(listingId)}`, { country: destination?.country, pickup: destination?.pickup ? '1' : undefined }),
  },
  checkout: '/api/checkout',
  orders: {
    list: '/api/orders',
    one: (id: string) => `/api/orders/${encodeURIComponent(id)}`,
    cancel: (id: string) => `/api/orders/${encodeURIComponent(id)}/cancel`,
  },
  sellerOrders: {
    list: (state?: string) => withQuery('/api/seller/orders', { state }),
    one: (id: string) => `/api/seller/orders/${encodeURIComponent(id)}`,
    ship: (id: string) => `/api/seller/orders/${encodeURIComponent(id)}/ship`,
    deliver: (id: string) => `/api/seller/orders/${encodeURIComponent(id)}/deliver`,
    payouts: '/api/seller/payouts',
    onboarding: '/api/seller/payouts/onboarding',
    statement: (month: string, format?: 'csv') => withQuery('/api/seller/statements', { month, format }),
  },
  sellerApplications: {
    create: '/api/seller-applications',
    mine: '/api/seller-applications/mine',
  },
  catalog: {
    vehicles: '/api/vehicles',
    vehicle: (slug: string) => `/api/vehicles/${encodeURIComponent(slug)}`,
    assembly: (id: string, filter: { serial?: string | null } = {}) => withQuery(`/api/assemblies/${encodeURIComponent(id)}`, filter),
    part: (id: string) => `/api/parts/${encodeURIComponent(id)}`,
    resolve: (number: string) => withQuery('/api/parts/resolve', { number }),
  },
  adminCatalog: {
    parts: '/api/admin/parts',
    part: (id: string) => `/api/admin/parts/${encodeURIComponent(id)}`,
    partNumbers: (id: string) => `/api/admin/parts/${encodeURIComponent(id)}/numbers`,
    partNumber: (id: string, numberId: string) => `/api/admin/parts/${encodeURIComponent(id)}/numbers/${encodeURIComponent(numberId)}`,
    supersessions: '/api/admin/supersessions',
    supersession: (id: string) => `/api/admin/supersessions/${encodeURIComponent(id)}`,
    assemblies: '/api/admin/assemblies',
    assembly: (id: string) => `/api/admin/assemblies/${encodeURIComponent(id)}`,
    lines: '/api/admin/lines',
    line: (id: string) => `/api/admin/lines/${encodeURIComponent(id)}`,
    dataQuality: '/api/admin/data-quality',
  },
  admin: {
    sellerApplications: (state?: string) => withQuery('/api/admin/seller-applications', { state }),
    sellerApplicationDecision: (id: string) => `/api/admin/seller-applications/${encodeURIComponent(id)}/decision`,
  },
} as const;
