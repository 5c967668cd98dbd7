import { BadgeCheck, MailWarning } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { Role, User } from '@shared/schemas/auth';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { Button, buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';

const roleLabels: Record<Role, { label: string; tone: BadgeTone }> = {
  buyer: { label: 'Buyer', tone: 'drab' },
  seller: { label: 'Seller', tone: 'accent' },
  admin: { label: 'Administrator', tone: 'warn' },
};

export type ProfileSummaryProps = {
  user: User;
  onResendVerification: () => void;
  isResending: boolean;
};

export function ProfileSummary({ user, onResendVerification, isResending }: ProfileSummaryProps) {
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <Card>
        <h2 className="text-lg font-semibold text-ink">Profile</h2>
        <dl className="mt-4 grid gap-x-6 gap-y-4 sm:grid-cols-[10rem_1fr]">
          <dt className="text-sm font-medium text-ink-muted">Display name</dt>
          <dd className="text-ink">{user.displayName}</dd>
          <dt className="text-sm font-medium text-ink-muted">E-mail</dt>
          <dd className="space-y-2">
            <span className="block break-all text-ink">{user.email}</span>
            {user.emailVerified ? (
              <span className="inline-flex items-center gap-1.5 text-sm font-medium text-ok">
                <BadgeCheck aria-hidden="true" className="size-4" />
                Verified
              </span>
            ) : (
              <span className="block space-y-2">
                <span className="flex items-center gap-1.5 text-sm font-medium text-warn">
                  <MailWarning aria-hidden="true" className="size-4" />
                  Not verified yet: open the link we e-mailed you.
                </span>
                <Button variant="secondary" size="sm" onClick={onResendVerification} isLoading={isResending}>
                  Resend verification e-mail
                </Button>
              </span>
            )}
          </dd>
          <dt className="text-sm font-medium text-ink-muted">Roles</dt>
          <dd>
            <ul className="flex flex-wrap gap-2" aria-label="Roles">
              {user.roles.map((role) => (
                <li key={role}>
                  <Badge tone={roleLabels[role].tone}>{roleLabels[role].label}</Badge>
                </li>
              ))}
            </ul>
          </dd>
        </dl>
      </Card>
      <Card>
        <h2 className="text-lg font-semibold text-ink">Selling on Drabyard</h2>
        {user.roles.includes('seller') ? (
          <>
            <p className="mt-2 text-sm text-ink-soft">Your seller account is active. List stock and handle orders from the seller desk.</p>
            <Link to={paths.seller.getHref()} className={buttonClasses('secondary', 'sm', 'mt-4')}>
              Open the seller desk
            </Link>
          </>
        ) : (
          <>
            <p className="mt-2 text-sm text-ink-soft">
              Hold new old stock, pulled originals or reproductions? Tell us about your stock and an administrator will review it.
            </p>
            <Link to={paths.account.sellerApplication.getHref()} className={buttonClasses('secondary', 'sm', 'mt-4')}>
              Become a seller
            </Link>
          </>
        )}
      </Card>
    </div>
  );
}
