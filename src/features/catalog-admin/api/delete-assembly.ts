import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function deleteAssembly(id: string) {
  return api.delete(apiPaths.adminCatalog.assembly(id));
}

export const useDeleteAssembly = () => useCatalogMutation(deleteAssembly);
