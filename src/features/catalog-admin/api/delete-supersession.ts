import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function deleteSupersession(id: string) {
  return api.delete(apiPaths.adminCatalog.supersession(id));
}

export const useDeleteSupersession = () => useCatalogMutation(deleteSupersession);
