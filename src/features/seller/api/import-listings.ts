import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportMapping } from '@shared/schemas/listings';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerKeys } from './seller-keys';
import type { ImportPreview, ImportResult } from './seller-types';

export const importTemplateHref = apiPaths.listings.importTemplate;

export function previewImport(input: { csv: string; mapping?: ImportMapping }): Promise<ImportPreview> {
  return api.post<ImportPreview>(apiPaths.listings.importPreview, input);
}

export function commitImport(input: { csv: string; mapping: ImportMapping; as: 'draft' | 'submitted'; skipInvalid: boolean }): Promise<ImportResult> {
  return api.post<ImportResult>(apiPaths.listings.importCommit, input);
}

export function usePreviewImport() {
  return useMutation({ mutationFn: previewImport });
}

export function useCommitImport() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: commitImport, onSettled: () => queryClient.invalidateQueries({ queryKey: sellerKeys.listings() }) });
}
