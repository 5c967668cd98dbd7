import { ContentLayout } from '@/components/layouts/content-layout';
import { CatalogAdminNav } from '@/features/catalog-admin/components/catalog-admin-nav';
import { PartsWorkbench } from '@/features/catalog-admin/components/parts-workbench';

export function AdminCatalogRoute() {
  return (
    <ContentLayout title="Catalog editor" eyebrow="Admin" description="Parts, their numbers and supersessions. Every change is recorded in the audit log.">
      <CatalogAdminNav />
      <PartsWorkbench />
    </ContentLayout>
  );
}
