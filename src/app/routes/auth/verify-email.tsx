import { useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { VerifyEmailStatus } from '@/features/auth/components/verify-email-status';

export function VerifyEmailRoute() {
  const [params] = useSearchParams();
  return (
    <AuthLayout title="Verify e-mail">
      <VerifyEmailStatus token={params.get('token')} />
    </AuthLayout>
  );
}
