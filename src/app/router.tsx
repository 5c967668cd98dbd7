import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { AppSkeleton } from '@/components/layouts/page-skeleton';
import { paths } from '@/config/paths';
import { requireUserLoader, RequireAuth } from '@/features/auth/components/require-auth';
import { RequireRole } from '@/features/auth/components/require-role';
import { AppRoot } from './routes/app-root';
import { NotFoundRoute } from './routes/not-found';
import { RootErrorBoundary, RouteErrorBoundary } from './routes/route-error';

// Paths relative to '/', the root route.
const rel = (path: string) => path.replace(/^\//, '');

/**
 * The route tree. Pages load lazily, each from its own module under routes/, so a page can be replaced
 * without touching the others. Exported apart from the router so tests can mount it in a memory router.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: 'root',
      path: paths.home.path,
      Component: AppRoot,
      ErrorBoundary: RootErrorBoundary,
      HydrateFallback: AppSkeleton,
      children: [
        {
          // Page errors render inside the layout, so the header and navigation stay usable.
          ErrorBoundary: RouteErrorBoundary,
          children: [
            { index: true, lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })) },
            { path: rel(paths.catalog.path), lazy: () => import('./routes/catalog/catalog').then((m) => ({ Component: m.CatalogRoute })) },
            { path: rel(paths.catalogVehicle.path), lazy: () => import('./routes/catalog/vehicle').then((m) => ({ Component: m.CatalogVehicleRoute })) },
            { path: rel(paths.catalogAssembly.path), lazy: () => import('./routes/catalog/assembly').then((m) => ({ Component: m.CatalogAssemblyRoute })) },
            { path: rel(paths.catalogPart.path), lazy: () => import('./routes/catalog/part').then((m) => ({ Component: m.CatalogPartRoute })) },
            { path: rel(paths.search.path), lazy: () => import('./routes/search/search').then((m) => ({ Component: m.SearchRoute })) },
            { path: rel(paths.listing.path), lazy: () => import('./routes/listings/listing').then((m) => ({ Component: m.ListingRoute })) },
            // Public: an anonymous cart lives behind a cookie and merges into the account at sign-in.
            { path: rel(paths.cart.path), lazy: () => import('./routes/cart/cart').then((m) => ({ Component: m.CartRoute })) },
            { path: rel(paths.auth.signIn.path), lazy: () => import('./routes/auth/sign-in').then((m) => ({ Component: m.SignInRoute })) },
            { path: rel(paths.auth.register.path), lazy: () => import('./routes/auth/register').then((m) => ({ Component: m.RegisterRoute })) },
            { path: rel(paths.auth.verifyEmail.path), lazy: () => import('./routes/auth/verify-email').then((m) => ({ Component: m.VerifyEmailRoute })) },
            { path: rel(paths.auth.forgotPassword.path), lazy: () => import('./routes/auth/forgot-password').then((m) => ({ Component: m.ForgotPasswordRoute })) },
            { path: rel(paths.auth.resetPassword.path), lazy: () => import('./routes/auth/reset-password').then((m) => ({ Component: m.ResetPasswordRoute })) },
            {
              // Signed-in area: the loader sends anonymous visitors to /sign-in?next=...
              id: 'signed-in',
              loader: requireUserLoader(queryClient),
              Component: RequireAuth,
              children: [
                { path: rel(paths.account.root.path), lazy: () => import('./routes/account/account').then((m) => ({ Component: m.AccountRoute })) },
                {
                  path: rel(paths.account.sellerApplication.path),
                  lazy: () => import('./routes/account/seller-application').then((m) => ({ Component: m.SellerApplicationRoute })),
                },
                {
                  element: <RequireRole role="buyer" />,
                  children: [
                    { path: rel(paths.garage.path), lazy: () => import('./routes/garage/garage').then((m) => ({ Component: m.GarageRoute })) },
                    { path: rel(paths.garageVehicle.path), lazy: () => import('./routes/garage/vehicle').then((m) => ({ Component: m.GarageVehicleRoute })) },
                    { path: rel(paths.garageAssembly.path), lazy: () => import('./routes/garage/assembly').then((m) => ({ Component: m.GarageAssemblyRoute })) },
                    { path: rel(paths.garageNeeds.path), lazy: () => import('./routes/garage/needs').then((m) => ({ Component: m.GarageNeedsRoute })) },
                    { path: rel(paths.garagePlan.path), lazy: () => import('./routes/garage/plan').then((m) => ({ Component: m.GaragePlanRoute })) },
                    { path: rel(paths.garageAlerts.path), lazy: () => import('./routes/garage/alerts').then((m) => ({ Component: m.GarageAlertsRoute })) },
                    { path: rel(paths.garageNotices.path), lazy: () => import('./routes/garage/notices').then((m) => ({ Component: m.GarageNoticesRoute })) },
                    { path: rel(paths.orders.path), lazy: () => import('./routes/orders/orders').then((m) => ({ Component: m.OrdersRoute })) },
                    { path: rel(paths.order.path), lazy: () => import('./routes/orders/order').then((m) => ({ Component: m.OrderRoute })) },
                  ],
                },
                {
                  path: rel(paths.seller.path),
                  element: <RequireRole role="seller" />,
                  children: [
                    { index: true, lazy: () => import('./routes/seller/seller-desk').then((m) => ({ Component: m.SellerDeskRoute })) },
                    { path: 'listings/new', lazy: () => import('./routes/seller/listing-new').then((m) => ({ Component: m.SellerListingNewRoute })) },
                    { path: 'listings/:id/edit', lazy: () => import('./routes/seller/listing-edit').then((m) => ({ Component: m.SellerListingEditRoute })) },
                    { path: 'shop', lazy: () => import('./routes/seller/shop').then((m) => ({ Component: m.SellerShopRoute })) },
                    { path: 'import', lazy: () => import('./routes/seller/import').then((m) => ({ Component: m.SellerImportRoute })) },
                    { path: 'orders', lazy: () => import('./routes/seller-orders/seller-orders').then((m) => ({ Component: m.SellerOrdersRoute })) },
                    { path: 'orders/:id', lazy: () => import('./routes/seller-orders/seller-order').then((m) => ({ Component: m.SellerOrderRoute })) },
                    { path: 'payouts', lazy: () => import('./routes/seller-orders/payouts').then((m) => ({ Component: m.SellerPayoutsRoute })) },
                  ],
                },
                {
                  path: rel(paths.admin.root.path),
                  element: <RequireRole role="admin" />,
                  children: [
                    { index: true, lazy: () => import('./routes/admin/admin-index').then((m) => ({ Component: m.AdminIndexRoute })) },
                    {
                      path: 'seller-applications',
                      lazy: () => import('./routes/admin/seller-applications').then((m) => ({ Component: m.AdminSellerApplicationsRoute })),
                    },
                    { path: 'listings', lazy: () => import('./routes/admin/listings').then((m) => ({ Component: m.AdminListingsRoute })) },
                    { path: 'catalog', lazy: () => import('./routes/admin/catalog').then((m) => ({ Component: m.AdminCatalogRoute })) },
                    {
                      path: 'catalog/assemblies',
                      lazy: () => import('./routes/admin/catalog-assemblies').then((m) => ({ Component: m.AdminCatalogAssembliesRoute })),
                    },
                    { path: 'catalog/quality', lazy: () => import('./routes/admin/catalog-quality').then((m) => ({ Component: m.AdminCatalogQualityRoute })) },
                  ],
                },
              ],
            },
            { path: '*', Component: NotFoundRoute },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createRoutes(queryClient));
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const router = useMemo(() => createAppRouter(queryClient), [queryClient]);
  return <RouterProvider router={router} />;
}
