import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function deletePartNumber({ partId, numberId }: { partId: string; numberId: string }) {
  return api.delete(apiPaths.adminCatalog.partNumber(partId, numberId));
}

export const useDeletePartNumber = () => useCatalogMutation(deletePartNumber);
