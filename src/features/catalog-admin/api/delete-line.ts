import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function deleteLine(id: string) {
  return api.delete(apiPaths.adminCatalog.line(id));
}

export const useDeleteLine = () => useCatalogMutation(deleteLine);
