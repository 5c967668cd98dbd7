import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { User } from '@shared/schemas/auth';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { RegisterForm } from '@/features/auth/components/register-form';

export function RegisterRoute() {
  const me = useMe();
  const [registered, setRegistered] = useState<User | null>(null);

  if (registered) {
    return (
      <AuthLayout title="Account created">
        <Notice tone="ok" role="status" title="Check your e-mail to verify your address">
          We sent a link to {registered.email}. Open it to finish setting up your account.
        </Notice>
        <div className="mt-6 flex flex-wrap gap-3">
          <Link to={paths.catalog.getHref()} className={buttonClasses('primary')}>
            Browse the catalog
          </Link>
          <Link to={paths.account.root.getHref()} className={buttonClasses('secondary')}>
            Your account
          </Link>
        </div>
      </AuthLayout>
    );
  }

  if (me.data) {
    return (
      <AuthLayout title="Create account">
        <Notice tone="info" title={`You are signed in as ${me.data.displayName}`}>
          Sign out first to create another account, or go to <TextLink to={paths.account.root.getHref()}>your account</TextLink>.
        </Notice>
      </AuthLayout>
    );
  }

  return (
    <AuthLayout
      title="Create account"
      description="Free for restorers. Sellers apply once signed in."
      footer={
        <p>
          Already have an account? <TextLink to={paths.auth.signIn.getHref()}>Sign in</TextLink>
        </p>
      }
    >
      <RegisterForm onSuccess={setRegistered} />
    </AuthLayout>
  );
}
