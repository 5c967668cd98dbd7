import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { ImportWizard } from '@/features/seller/components/import-wizard';

export function SellerImportRoute() {
  return (
    <ContentLayout
      title="Import listings"
      eyebrow="Seller desk"
      description="List many parts from a spreadsheet saved as CSV. Nothing is created until you confirm the checked rows."
      actions={
        <Link to={paths.seller.getHref()} className={buttonClasses('ghost', 'sm')}>
          Back to the desk
        </Link>
      }
    >
      <ImportWizard />
    </ContentLayout>
  );
}
