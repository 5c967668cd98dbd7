import { useParams } from 'react-router-dom';
import { PartView } from '@/features/catalog/components/part-view';

export function CatalogPartRoute() {
  const { id = '' } = useParams();
  // Keyed by id: moving along the chain to another part starts that page afresh.
  return <PartView key={id} id={id} />;
}
