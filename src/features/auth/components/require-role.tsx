import type { ReactNode } from 'react';
import { Link, Outlet } from 'react-router-dom';
import type { Role } from '@shared/schemas/auth';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { hasRole } from '@/lib/authorization';
import { useMe } from '../api/get-me';

const roleNames: Record<Role, string> = { buyer: 'buyers', seller: 'sellers', admin: 'administrators' };

/** Shows a clear "not allowed" instead of the page when the role is missing (the server refuses anyway). */
export function RequireRole({ role, children }: { role: Role; children?: ReactNode }) {
  const me = useMe();
  if (me.isPending) return <PageSkeleton />;
  if (!hasRole(me.data, role)) {
    return (
      <div className="mx-auto max-w-lg">
        <title>Not allowed · Drabyard</title>
        <h1 className="mb-4 text-2xl font-bold text-ink">Not allowed</h1>
        <Notice tone="warn" title={`This page is for ${roleNames[role]}.`}>
          <p>Your account does not have that role.</p>
          {role === 'seller' ? (
            <p className="mt-2">
              <Link className={textLinkClasses} to={paths.account.sellerApplication.getHref()}>
                Apply to sell on Drabyard
              </Link>
            </p>
          ) : null}
        </Notice>
      </div>
    );
  }
  return children ?? <Outlet />;
}
