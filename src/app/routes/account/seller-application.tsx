import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useMySellerApplication } from '@/features/account/api/get-my-seller-application';
import { SellerApplicationForm } from '@/features/account/components/seller-application-form';
import { SellerApplicationStatus } from '@/features/account/components/seller-application-status';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { hasRole } from '@/lib/authorization';

export function SellerApplicationRoute() {
  const user = useSignedInUser();
  const mine = useMySellerApplication();
  const isSeller = hasRole(user, 'seller');

  return (
    <ContentLayout
      title="Sell on Drabyard"
      eyebrow="Seller application"
      description="Tell us who you are and what you hold. An administrator reviews every application before a seller can list."
    >
      <div className="max-w-3xl space-y-6">
        {mine.isPending ? (
          <PageSkeleton label="Loading your application" />
        ) : mine.isError ? (
          <Notice tone="danger" role="alert" title="We could not load your application">
            <p>{mine.error.message}</p>
            <button type="button" className={buttonClasses('secondary', 'sm', 'mt-3')} onClick={() => void mine.refetch()}>
              Try again
            </button>
          </Notice>
        ) : (
          <>
            {mine.data ? <SellerApplicationStatus application={mine.data} /> : null}
            {isSeller ? (
              <Notice tone="ok" title="You can sell on Drabyard">
                <Link to={paths.seller.getHref()} className={buttonClasses('secondary', 'sm', 'mt-2')}>
                  Open the seller desk
                </Link>
              </Notice>
            ) : !mine.data || mine.data.state === 'rejected' ? (
              <Card>
                <h2 className="mb-4 text-lg font-semibold text-ink">{mine.data ? 'Apply again' : 'Your details'}</h2>
                {!user.emailVerified ? (
                  <Notice tone="warn" className="mb-5" title="Verify your e-mail address first">
                    Open the link we e-mailed you; the review needs a verified address.
                  </Notice>
                ) : null}
                <SellerApplicationForm />
              </Card>
            ) : null}
          </>
        )}
      </div>
    </ContentLayout>
  );
}
