import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { ReviewQueue } from '@/features/moderation/components/review-queue';

export function AdminListingsRoute() {
  return (
    <ContentLayout
      title="Listing review"
      eyebrow="Admin"
      description="Listings waiting for review. Flags point at what to check; a blocking flag must be fixed before approval."
      actions={
        <Link to={paths.admin.root.getHref()} className={buttonClasses('ghost', 'sm')}>
          Back to admin
        </Link>
      }
    >
      <ReviewQueue />
    </ContentLayout>
  );
}
