import { AuthLayout } from '@/components/layouts/auth-layout';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return (
    <AuthLayout
      title="Forgot password"
      description="Enter the address you signed up with and we will e-mail you a link to set a new password."
      footer={
        <p>
          Remembered it? <TextLink to={paths.auth.signIn.getHref()}>Sign in</TextLink>
        </p>
      }
    >
      <ForgotPasswordForm />
    </AuthLayout>
  );
}
