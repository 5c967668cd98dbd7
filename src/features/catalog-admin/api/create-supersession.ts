import type { z } from 'zod';
import type { createSupersessionInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useCatalogMutation } from './use-catalog-mutation';

export function createSupersession(input: z.input<typeof createSupersessionInput>) {
  return api.post(apiPaths.adminCatalog.supersessions, input);
}

export const useCreateSupersession = () => useCatalogMutation(createSupersession);
