import type { z } from 'zod';
import type { createPartInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { createdPartReply } from './admin-catalog-schemas';
import { useCatalogMutation } from './use-catalog-mutation';

export async function createPart(input: z.input<typeof createPartInput>) {
  return (await api.post(apiPaths.adminCatalog.parts, input, { schema: createdPartReply })).part;
}

export const useCreatePart = () => useCatalogMutation(createPart);
