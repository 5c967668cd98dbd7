import type { z } from 'zod';
import type { partNumberInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function addPartNumber({ partId, number }: { partId: string; number: z.input<typeof partNumberInput> }) {
  return api.post(apiPaths.adminCatalog.partNumbers(partId), number);
}

export const useAddPartNumber = () => useCatalogMutation(addPartNumber);
