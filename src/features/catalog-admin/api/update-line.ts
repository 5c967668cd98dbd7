import type { z } from 'zod';
import type { updateLineInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function updateLine({ id, changes }: { id: string; changes: z.input<typeof updateLineInput> }) {
  return api.patch(apiPaths.adminCatalog.line(id), changes);
}

export const useUpdateLine = () => useCatalogMutation(updateLine);
