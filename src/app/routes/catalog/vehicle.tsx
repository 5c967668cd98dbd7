import { useParams } from 'react-router-dom';
import { VehicleSystems } from '@/features/catalog/components/vehicle-systems';

export function CatalogVehicleRoute() {
  const { slug = '' } = useParams();
  return <VehicleSystems slug={slug} />;
}
