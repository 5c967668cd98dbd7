import { toast } from 'sonner';
import { ContentLayout } from '@/components/layouts/content-layout';
import { ProfileSummary } from '@/features/account/components/profile-summary';
import { useResendVerification } from '@/features/auth/api/resend-verification';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';

export function AccountRoute() {
  const user = useSignedInUser();
  const resend = useResendVerification();

  const onResendVerification = () =>
    resend.mutate(undefined, {
      onSuccess: () => toast.success(`We sent a new verification link to ${user.email}.`),
      onError: (error) => toast.error(error.message),
    });

  return (
    <ContentLayout title="Your account" eyebrow="Account" description={`Signed in as ${user.email}`}>
      <ProfileSummary user={user} onResendVerification={onResendVerification} isResending={resend.isPending} />
    </ContentLayout>
  );
}
