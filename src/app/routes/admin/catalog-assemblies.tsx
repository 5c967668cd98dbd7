import { ContentLayout } from '@/components/layouts/content-layout';
import { AssembliesWorkbench } from '@/features/catalog-admin/components/assemblies-workbench';
import { CatalogAdminNav } from '@/features/catalog-admin/components/catalog-admin-nav';

export function AdminCatalogAssembliesRoute() {
  return (
    <ContentLayout title="Assemblies and lines" eyebrow="Admin · Catalog editor" description="Assemblies of each vehicle and the lines of their parts lists.">
      <CatalogAdminNav />
      <AssembliesWorkbench />
    </ContentLayout>
  );
}
