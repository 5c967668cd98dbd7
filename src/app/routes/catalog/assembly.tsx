import { useParams } from 'react-router-dom';
import { AssemblyView } from '@/features/catalog/components/assembly-view';

export function CatalogAssemblyRoute() {
  const { id = '' } = useParams();
  return <AssemblyView id={id} />;
}
