import type { z } from 'zod';
import type { createLineInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function createLine(input: z.input<typeof createLineInput>) {
  return api.post(apiPaths.adminCatalog.lines, input);
}

export const useCreateLine = () => useCatalogMutation(createLine);
