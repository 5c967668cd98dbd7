import { ContentLayout } from '@/components/layouts/content-layout';
import { VehicleList } from '@/features/catalog/components/vehicle-list';

export function CatalogRoute() {
  return (
    <ContentLayout
      title="Catalog"
      eyebrow="Vehicle · system · assembly"
      description="Pick a vehicle model, then a system and an assembly, down to each line of its parts list."
    >
      <VehicleList />
    </ContentLayout>
  );
}
