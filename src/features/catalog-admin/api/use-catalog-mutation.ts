import { useMutation, useQueryClient } from '@tanstack/react-query';
import { adminCatalogKeys, publicCatalogKey } from './admin-catalog-keys';

/** A catalog edit: after it succeeds, the editor's and the public catalog's cached replies are refetched. */
export function useCatalogMutation<TInput, TResult>(mutationFn: (input: TInput) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: adminCatalogKeys.all }),
        queryClient.invalidateQueries({ queryKey: publicCatalogKey }),
      ]),
  });
}
