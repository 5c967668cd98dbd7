import type { z } from 'zod';
import type { updatePartInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function updatePart({ id, changes }: { id: string; changes: z.input<typeof updatePartInput> }) {
  return api.patch(apiPaths.adminCatalog.part(id), changes);
}

export const useUpdatePart = () => useCatalogMutation(updatePart);
