import type { z } from 'zod';
import type { updateAssemblyInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function updateAssembly({ id, changes }: { id: string; changes: z.input<typeof updateAssemblyInput> }) {
  return api.patch(apiPaths.adminCatalog.assembly(id), changes);
}

export const useUpdateAssembly = () => useCatalogMutation(updateAssembly);
