import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function deletePart(id: string) {
  return api.delete(apiPaths.adminCatalog.part(id));
}

export const useDeletePart = () => useCatalogMutation(deletePart);
