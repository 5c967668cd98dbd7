import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useSellerApplications } from '@/features/admin/api/get-seller-applications';
import { SellerApplicationsTable } from '@/features/admin/components/seller-applications-table';

export function AdminSellerApplicationsRoute() {
  const pending = useSellerApplications('pending');
  return (
    <ContentLayout
      title="Seller applications"
      eyebrow="Admin"
      description="Pending applications, oldest first. Approving gives the applicant the seller role."
      actions={
        <Link to={paths.admin.root.getHref()} className={buttonClasses('ghost', 'sm')}>
          Back to admin
        </Link>
      }
    >
      {pending.isPending ? (
        <PageSkeleton label="Loading applications" />
      ) : pending.isError ? (
        <Notice tone="danger" role="alert" title="We could not load the applications">
          <p>{pending.error.message}</p>
          <button type="button" className={buttonClasses('secondary', 'sm', 'mt-3')} onClick={() => void pending.refetch()}>
            Try again
          </button>
        </Notice>
      ) : pending.data.length === 0 ? (
        <Notice tone="info" role="status" title="No applications waiting">
          New applications show up here.
        </Notice>
      ) : (
        <SellerApplicationsTable applications={[...pending.data].sort((a, b) => a.createdAt.localeCompare(b.createdAt))} />
      )}
    </ContentLayout>
  );
}
