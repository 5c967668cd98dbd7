import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeNext } from '@/lib/safe-next';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const destination = safeNext(params.get('next'));

  // Already signed in (or just signed in): go where the visitor was headed.
  if (me.data) return <Navigate to={destination} replace />;

  return (
    <AuthLayout
      title="Sign in"
      description="Welcome back to the yard."
      footer={
        <>
          <p>
            <TextLink to={paths.auth.forgotPassword.getHref()}>Forgot your password?</TextLink>
          </p>
          <p>
            New here? <TextLink to={paths.auth.register.getHref()}>Create an account</TextLink>
          </p>
        </>
      }
    >
      <SignInForm onSuccess={() => navigate(destination, { replace: true })} />
    </AuthLayout>
  );
}
