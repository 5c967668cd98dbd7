import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const [done, setDone] = useState(false);

  if (done) {
    return (
      <AuthLayout title="Password set">
        <Notice tone="ok" role="status" title="Your new password is set">
          Sign in with it from now on.
        </Notice>
        <Link to={paths.auth.signIn.getHref()} className={buttonClasses('primary', 'md', 'mt-6')}>
          Sign in
        </Link>
      </AuthLayout>
    );
  }

  if (!token) {
    return (
      <AuthLayout title="Set a new password">
        <Notice tone="warn" role="alert" title="This reset link is incomplete">
          Open the link from the e-mail again, or ask for a new one.
        </Notice>
        <Link to={paths.auth.forgotPassword.getHref()} className={buttonClasses('secondary', 'md', 'mt-6')}>
          Ask for a new link
        </Link>
      </AuthLayout>
    );
  }

  return (
    <AuthLayout title="Set a new password" description="Choose a password you do not use anywhere else.">
      <ResetPasswordForm token={token} onSuccess={() => setDone(true)} />
    </AuthLayout>
  );
}
