import type { QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link, Outlet, redirect, useLocation, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { meQueryOptions, useMe } from '../api/get-me';

/** Route loader for signed-in areas: anonymous visitors go to /sign-in?next=<where they were going>. */
export function requireUserLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.fetchQuery(meQueryOptions());
    if (!user) {
      const url = new URL(request.url);
      throw redirect(paths.auth.signIn.getHref(`${url.pathname}${url.search}`));
    }
    return null;
  };
}

/**
 * Layout route for signed-in areas. The loader has already redirected anonymous visitors; this covers the
 * session ending while the page is open (e.g. signing out in another tab).
 */
export function RequireAuth({ children }: { children?: ReactNode }) {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <PageSkeleton />;
  if (!me.data) {
    return (
      <div className="mx-auto max-w-lg">
        <title>Sign in needed · Drabyard</title>
        <Notice tone="info" title="You are signed out">
          <p>Sign in to see this page.</p>
          <Link
            className={buttonClasses('primary', 'sm', 'mt-3')}
            to={paths.auth.signIn.getHref(`${location.pathname}${location.search}`)}
          >
            Sign in
          </Link>
        </Notice>
      </div>
    );
  }
  return children ?? <Outlet />;
}
