import { ContentLayout } from '@/components/layouts/content-layout';
import { CatalogAdminNav } from '@/features/catalog-admin/components/catalog-admin-nav';
import { DataQualityReport } from '@/features/catalog-admin/components/data-quality-report';

export function AdminCatalogQualityRoute() {
  return (
    <ContentLayout title="Catalog data quality" eyebrow="Admin · Catalog editor" description="Checks run over the whole catalog each time this page opens.">
      <CatalogAdminNav />
      <DataQualityReport />
    </ContentLayout>
  );
}
