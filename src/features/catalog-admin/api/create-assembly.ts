import type { z } from 'zod';
import type { createAssemblyInput } from '@shared/schemas/catalog';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { createdAssemblyReply } from './admin-catalog-schemas';
import { useCatalogMutation } from './use-catalog-mutation';

export async function createAssembly(input: z.input<typeof createAssemblyInput>) {
  return (await api.post(apiPaths.adminCatalog.assemblies, input, { schema: createdAssemblyReply })).assembly;
}

export const useCreateAssembly = () => useCatalogMutation(createAssembly);
